import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { solveRoom } from "@/lib/engine/room/solve";
import { distanceToWallSegment, fromViewersLeft, nearestWall, wallFrame, wallHeading, wallToWorld, worldToWall } from "@/lib/engine/room/wall-frame";
import { pointInPolygon, polygonArea, polygonPerimeter, signedArea } from "@/lib/engine/geometry/polygon";

const room = solveRoom({ walls: [6000, 5000, 6000, 5000].map((lengthMm, i) => ({ id: `w${i + 1}`, lengthMm })) });

// Hand-worked positions in a 6000 x 5000 mm rectangle, corner 0 at the origin, counter-clockwise.
describe("wall frames", () => {
  it("maps a spot on the east wall into the room", () => {
    const f = wallFrame(room, "w2");
    expect(f).toBeDefined();
    if (!f) return;
    // Wall 2 runs from (6000, 0) to (6000, 5000); inward is -x. 1000 along and 600 out: (5400, 1000).
    const p = wallToWorld(f, 1000, 600);
    expect(p.x).toBeCloseTo(5400, 9);
    expect(p.y).toBeCloseTo(1000, 9);
    expect(wallHeading(f)).toBeCloseTo(Math.PI / 2, 12);
    expect(f.lengthMm).toBeCloseTo(5000, 9);
  });

  it("maps the north wall back the other way", () => {
    const f = wallFrame(room, "w3");
    if (!f) throw new Error("no wall");
    // Wall 3 runs from (6000, 5000) toward (0, 5000); 2000 along and 300 out is (4000, 4700).
    const p = wallToWorld(f, 2000, 300);
    expect(p.x).toBeCloseTo(4000, 9);
    expect(p.y).toBeCloseTo(4700, 9);
  });

  it("returns undefined for an unknown wall", () => {
    expect(wallFrame(room, "nope")).toBeUndefined();
  });

  it("worldToWall undoes wallToWorld", () => {
    fc.assert(
      fc.property(fc.constantFrom("w1", "w2", "w3", "w4"), fc.double({ min: -1e4, max: 1e4, noNaN: true }), fc.double({ min: -1e4, max: 1e4, noNaN: true }), (id, a, d) => {
        const f = wallFrame(room, id)!;
        const back = worldToWall(f, wallToWorld(f, a, d));
        expect(back.offsetAlongMm).toBeCloseTo(a, 6);
        expect(back.distanceFromWallMm).toBeCloseTo(d, 6);
      }),
    );
  });
});

describe("distances to walls and the viewer's left", () => {
  it("measures to the wall's segment, past its corners too", () => {
    const f = wallFrame(room, "w1")!;
    // Wall 1 runs (0,0) to (6000,0). In front of it: straight out; past its end: to the corner.
    expect(distanceToWallSegment(f, { x: 3000, y: 400 })).toBeCloseTo(400, 9);
    expect(distanceToWallSegment(f, { x: 6300, y: 400 })).toBeCloseTo(500, 9);
    expect(distanceToWallSegment(f, { x: -300, y: -400 })).toBeCloseTo(500, 9);
  });

  it("finds the nearest wall within reach, and none beyond it", () => {
    expect(nearestWall(room.walls, { x: 5900, y: 2500 })?.id).toBe("w2");
    expect(nearestWall(room.walls, { x: 3000, y: 4800 }, 350)?.id).toBe("w3");
    expect(nearestWall(room.walls, { x: 3000, y: 2500 }, 350)).toBeUndefined();
  });

  it("puts the wall's start corner on the right of a person facing it from the room", () => {
    const f = wallFrame(room, "w1")!;
    // Facing wall 1 (south) from inside, the person looks toward -y: their right is toward -x, where the start (0,0) is.
    expect(fromViewersLeft(f, 0)).toBeCloseTo(6000, 9);
    expect(fromViewersLeft(f, 6000)).toBeCloseTo(0, 9);
  });
});

describe("polygon helpers", () => {
  const rect = room.corners;
  it("area and perimeter of the rectangle", () => {
    expect(signedArea(rect)).toBeCloseTo(30e6, 3);
    expect(signedArea([...rect].reverse())).toBeCloseTo(-30e6, 3);
    expect(polygonArea([...rect].reverse())).toBeCloseTo(30e6, 3);
    expect(polygonPerimeter(rect)).toBeCloseTo(22000, 9);
  });
  it("point in polygon, with edges counted inside", () => {
    expect(pointInPolygon({ x: 3000, y: 2500 }, rect)).toBe(true);
    expect(pointInPolygon({ x: 6000, y: 2500 }, rect)).toBe(true);
    expect(pointInPolygon({ x: 6000.5, y: 2500 }, rect)).toBe(false);
    expect(pointInPolygon({ x: 6000.5, y: 2500 }, rect, 1)).toBe(true);
    expect(pointInPolygon({ x: -1, y: -1 }, rect)).toBe(false);
    // An L-shaped floor: the notch is outside.
    const ell = [{ x: 0, y: 0 }, { x: 4000, y: 0 }, { x: 4000, y: 2000 }, { x: 2000, y: 2000 }, { x: 2000, y: 4000 }, { x: 0, y: 4000 }];
    expect(pointInPolygon({ x: 3000, y: 3000 }, ell)).toBe(false);
    expect(pointInPolygon({ x: 1000, y: 3000 }, ell)).toBe(true);
    expect(polygonArea(ell)).toBeCloseTo(12e6, 6);
  });
});
