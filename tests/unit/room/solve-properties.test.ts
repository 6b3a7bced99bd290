import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { solveRoom } from "@/lib/engine/room/solve";
import type { Vec2 } from "@/lib/engine/geometry/types";
import { signedArea } from "@/lib/engine/geometry/polygon";

const dist = (a: Vec2, b: Vec2) => Math.hypot(a.x - b.x, a.y - b.y);

/** Put a polygon in the solver's frame: corner 0 at the origin, wall 0 along +x. */
function normalise(corners: Vec2[]): Vec2[] {
  const o = corners[0];
  const t = -Math.atan2(corners[1].y - o.y, corners[1].x - o.x);
  return corners.map((p) => ({ x: (p.x - o.x) * Math.cos(t) - (p.y - o.y) * Math.sin(t), y: (p.x - o.x) * Math.sin(t) + (p.y - o.y) * Math.cos(t) }));
}

/** A convex room: corners on an ellipse-like loop at increasing angles, counter-clockwise, 2-12 m across. */
const convexRoom = (n: number) =>
  fc
    .tuple(
      fc.array(fc.double({ min: 0.2, max: 1, noNaN: true }), { minLength: n, maxLength: n }),
      fc.double({ min: 2000, max: 6000, noNaN: true }),
      fc.double({ min: 2000, max: 6000, noNaN: true }),
    )
    .map(([steps, rx, ry]) => {
      const total = steps.reduce((s, x) => s + x, 0);
      let acc = 0;
      return steps.map((s) => {
        const a = (acc / total) * 2 * Math.PI;
        acc += s;
        return { x: rx * Math.cos(a), y: ry * Math.sin(a) };
      });
    })
    .filter((c) => c.every((p, i) => dist(p, c[(i + 1) % n]) > 300));

const wallsOf = (c: Vec2[]) => c.map((p, i) => ({ id: `w${i}`, lengthMm: dist(p, c[(i + 1) % c.length]) }));

// Invariants of plane geometry; no trade values here.
describe("solveRoom properties", () => {
  it("a four-walled room measured with both diagonals is recovered to 0.01 mm", () => {
    fc.assert(
      fc.property(convexRoom(4), (c) => {
        const room = solveRoom({ walls: wallsOf(c), diagonals: [{ from: 0, to: 2, lengthMm: dist(c[0], c[2]) }, { from: 1, to: 3, lengthMm: dist(c[1], c[3]) }] });
        const want = normalise(c);
        room.corners.forEach((p, i) => expect(dist(p, want[i])).toBeLessThan(0.01));
        expect(room.report.method).toBe("diagonals");
      }),
    );
  });

  it("a five-walled room with two diagonals fanning from corner 0 is recovered", () => {
    fc.assert(
      fc.property(convexRoom(5), (c) => {
        const room = solveRoom({ walls: wallsOf(c), diagonals: [2, 3].map((k) => ({ from: 0, to: k, lengthMm: dist(c[0], c[k]) })) });
        const want = normalise(c);
        room.corners.forEach((p, i) => expect(dist(p, want[i])).toBeLessThan(0.01));
      }),
    );
  });

  it("without diagonals the floor still closes, starts at the origin along +x, and its angles add up", () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: 500, max: 15000, noNaN: true }), { minLength: 4, maxLength: 4 }), (lengths) => {
        const room = solveRoom({ walls: lengths.map((lengthMm, i) => ({ id: `w${i}`, lengthMm })) });
        expect(room.corners[0]).toEqual({ x: 0, y: 0 });
        expect(room.corners[1].y).toBeCloseTo(0, 6);
        expect(room.corners[1].x).toBeGreaterThan(0);
        expect(room.report.cornerAnglesDeg.reduce((s, a) => s + a, 0)).toBeCloseTo(360, 6);
        // The gap of a square walk is the difference of opposite walls, combined.
        expect(room.report.closureErrorMm).toBeCloseTo(Math.hypot(lengths[0] - lengths[2], lengths[1] - lengths[3]), 6);
        if (room.report.closureErrorMm < 1000) expect(signedArea(room.corners)).toBeGreaterThan(0);
      }),
    );
  });
});
