import { describe, it, expect } from "vitest";
import { snapAlongWall, snapToGrid } from "@/lib/client/tools/snap";

// Snap distances here are the editor's own choices (40 mm edge pull, grid step), not trade values.
const base = { widthMm: 600, wallLengthMm: 4000, neighbours: [], gridStepMm: 25.4, thresholdMm: 40, enabled: true };

describe("snapAlongWall", () => {
  it("pulls the left end onto the wall start when within the threshold", () => {
    expect(snapAlongWall({ ...base, offsetMm: 30 })).toEqual({ offsetMm: 0, target: "wall-start" });
  });

  it("pulls the right end onto the wall end", () => {
    // 4000 - 600 = 3400 is where the right end meets the wall end.
    expect(snapAlongWall({ ...base, offsetMm: 3375 })).toEqual({ offsetMm: 3400, target: "wall-end" });
  });

  it("butts against a neighbour on either side", () => {
    const neighbours = [{ startMm: 1000, endMm: 1600 }];
    expect(snapAlongWall({ ...base, neighbours, offsetMm: 1620 })).toEqual({ offsetMm: 1600, target: "neighbour" });
    expect(snapAlongWall({ ...base, neighbours, offsetMm: 390 })).toEqual({ offsetMm: 400, target: "neighbour" });
  });

  it("falls back to the grid step away from edges", () => {
    // 1 in grid: 500 mm rounds to 20 steps = 508 mm.
    const r = snapAlongWall({ ...base, offsetMm: 500 });
    expect(r.target).toBe("grid");
    expect(r.offsetMm).toBeCloseTo(508, 6);
  });

  it("keeps the fixture on the wall, and leaves the value alone when snapping is off", () => {
    expect(snapAlongWall({ ...base, offsetMm: -300 }).offsetMm).toBe(0);
    expect(snapAlongWall({ ...base, offsetMm: 9000 }).offsetMm).toBe(3400);
    expect(snapAlongWall({ ...base, enabled: false, offsetMm: 1234.5 })).toEqual({ offsetMm: 1234.5, target: "none" });
  });

  it("rounds to the grid", () => {
    expect(snapToGrid(37, 10)).toBe(40);
    expect(snapToGrid(37, 0)).toBe(37);
  });
});
