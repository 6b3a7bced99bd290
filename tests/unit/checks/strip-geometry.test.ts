import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { Vec2 } from "@/lib/engine/geometry/types";
import { firstHitConvex, makeStrip, toStrip, type Strip } from "@/lib/engine/checks/geom/strip";

type UV = { u: number; v: number };

/** Oracle: clip the polygon (Sutherland-Hodgman) by the band and u >= 0, then take the smallest u. */
function oracle(s: Strip, poly: Vec2[], shrink = 1): number {
  const clip = (pts: UV[], inside: (p: UV) => number): UV[] => {
    const out: UV[] = [];
    for (let i = 0; i < pts.length; i++) {
      const a = pts[i];
      const b = pts[(i + 1) % pts.length];
      const da = inside(a);
      const db = inside(b);
      if (da >= 0) out.push(a);
      if ((da >= 0) !== (db >= 0)) {
        const t = da / (da - db);
        out.push({ u: a.u + (b.u - a.u) * t, v: a.v + (b.v - a.v) * t });
      }
    }
    return out;
  };
  let pts = poly.map((p) => toStrip(s, p));
  pts = clip(pts, (p) => p.v - (s.vMin + shrink));
  pts = clip(pts, (p) => s.vMax - shrink - p.v);
  pts = clip(pts, (p) => p.u);
  return pts.length ? Math.min(...pts.map((p) => p.u)) : Infinity;
}

/** Convex hull (monotone chain), counter-clockwise. */
function hull(points: Vec2[]): Vec2[] {
  const p = [...points].sort((a, b) => a.x - b.x || a.y - b.y);
  const cross = (o: Vec2, a: Vec2, b: Vec2) => (a.x - o.x) * (b.y - o.y) - (a.y - o.y) * (b.x - o.x);
  const lower: Vec2[] = [];
  for (const q of p) {
    while (lower.length >= 2 && cross(lower[lower.length - 2], lower[lower.length - 1], q) <= 0) lower.pop();
    lower.push(q);
  }
  const upper: Vec2[] = [];
  for (const q of [...p].reverse()) {
    while (upper.length >= 2 && cross(upper[upper.length - 2], upper[upper.length - 1], q) <= 0) upper.pop();
    upper.push(q);
  }
  return lower.slice(0, -1).concat(upper.slice(0, -1));
}

const coord = fc.integer({ min: -3000, max: 3000 });
const point = fc.record({ x: coord, y: coord });

describe("first hit of a convex polygon along a strip", () => {
  it("equals clipping the polygon to the strip, for random polygons of either winding and random strips", () => {
    fc.assert(
      fc.property(
        fc.array(point, { minLength: 3, maxLength: 9 }),
        point,
        fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }),
        fc.integer({ min: 50, max: 2000 }),
        fc.boolean(),
        (pts, origin, angle, width, clockwise) => {
          let poly = hull(pts);
          if (poly.length < 3) return;
          if (clockwise) poly = [...poly].reverse();
          const s = makeStrip(origin, { x: Math.cos(angle), y: Math.sin(angle) }, width, 2438);
          const got = firstHitConvex(s, poly);
          const want = oracle(s, poly);
          if (want === Infinity) expect(got).toBe(Infinity);
          else expect(got).toBeCloseTo(want, 6);
        },
      ),
      { numRuns: 3000, seed: 7 },
    );
  });

  it("a cabinet straddling the strip's edge at 600 mm is hit at 600 mm; one behind the start is not", () => {
    const s = makeStrip({ x: 0, y: 0 }, { x: 1, y: 0 }, 400, 2438);
    const box = (x0: number, y0: number, x1: number, y1: number): Vec2[] => [{ x: x0, y: y0 }, { x: x1, y: y0 }, { x: x1, y: y1 }, { x: x0, y: y1 }];
    expect(firstHitConvex(s, box(600, 150, 1200, 700))).toBeCloseTo(600, 9);
    expect(firstHitConvex(s, box(-900, 150, -100, 700))).toBe(Infinity);
    // Straddling the start line and the band's edge: it covers the band's corner, so it blocks at once.
    expect(firstHitConvex(s, box(-300, 100, 300, 900))).toBe(0);
  });
});
