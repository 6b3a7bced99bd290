import { describe, it, expect } from "vitest";
import { solveRoom } from "@/lib/engine/room/solve";
import type { RoomMeasurements } from "@/lib/engine/room/solve";
import type { Vec2 } from "@/lib/engine/geometry/types";

const walls = (...lengths: number[]) => lengths.map((lengthMm, i) => ({ id: `w${i + 1}`, lengthMm }));
const near = (p: Vec2, x: number, y: number, digits = 6) => {
  expect(p.x).toBeCloseTo(x, digits);
  expect(p.y).toBeCloseTo(y, digits);
};

// Geometry by hand (plane trigonometry, law of cosines); no trade values in this file.
describe("solveRoom: four walls with diagonals", () => {
  it("a rectangle with equal diagonals has square corners and no diagonal difference", () => {
    // 6000 x 5000 mm: each diagonal is sqrt(6000^2 + 5000^2) = sqrt(61,000,000) = 7810.2497 mm.
    const d = Math.sqrt(61e6);
    const room = solveRoom({ walls: walls(6000, 5000, 6000, 5000), diagonals: [{ from: 0, to: 2, lengthMm: d }, { from: 1, to: 3, lengthMm: d }] });
    expect(room.report.method).toBe("diagonals");
    for (const a of room.report.cornerAnglesDeg) expect(a).toBeCloseTo(90, 6);
    for (const o of room.report.offSquareDeg) expect(o).toBeCloseTo(0, 6);
    expect(room.report.diagonalDifferenceMm).toBeCloseTo(0, 6);
    expect(room.report.closureErrorMm).toBe(0);
    near(room.corners[0], 0, 0);
    near(room.corners[1], 6000, 0);
    near(room.corners[2], 6000, 5000);
    near(room.corners[3], 0, 5000);
    expect(room.areaMm2).toBeCloseTo(30e6, 0);
  });

  it("one long diagonal: triangulates exactly and reports the difference with its sign and size", () => {
    // Worked by hand. Walls 6000, 5000, 6000, 5000; diagonal corner 0 to corner 2 measured 7830 mm.
    // Triangle c0 c1 c2, law of cosines at corner 1:
    //   cos(a1) = (6000^2 + 5000^2 - 7830^2) / (2 * 6000 * 5000) = (61,000,000 - 61,308,900) / 60,000,000 = -0.00514833
    //   a1 = 90.2950 deg (corner 1 and corner 3 open past square), so a0 = a2 = 89.7050 deg.
    // The other diagonal, across corner 0: d13^2 = 61,000,000 - 60,000,000 * 0.00514833 = 60,691,100, d13 = 7790.449 mm.
    // Difference 0-2 minus 1-3 = 7830 - 7790.449 = +39.551 mm (positive: the 0-2 diagonal is the longer one).
    const room = solveRoom({ walls: walls(6000, 5000, 6000, 5000), diagonals: [{ from: 0, to: 2, lengthMm: 7830 }] });
    const r = room.report;
    expect(r.method).toBe("diagonals");
    expect(r.cornerAnglesDeg[1]).toBeCloseTo(90.295, 3);
    expect(r.cornerAnglesDeg[3]).toBeCloseTo(90.295, 3);
    expect(r.cornerAnglesDeg[0]).toBeCloseTo(89.705, 3);
    expect(r.offSquareDeg[0]).toBeCloseTo(-0.295, 3);
    expect(r.diagonalDifferenceMm).toBeCloseTo(39.551, 2);
    expect(r.diagonals?.[1].measuredMm).toBeNull();
    expect(r.diagonals?.[1].solvedMm).toBeCloseTo(7790.449, 2);
    // Exact triangulation: every wall comes out at its measured length.
    for (const w of room.walls) expect(w.solvedLengthMm).toBeCloseTo(w.lengthMm, 6);
    expect(r.maxResidualMm).toBeLessThan(1e-6);
  });

  it("the same error measured on the other diagonal flips the sign", () => {
    const room = solveRoom({ walls: walls(6000, 5000, 6000, 5000), diagonals: [{ from: 1, to: 3, lengthMm: 7830 }] });
    expect(room.report.diagonalDifferenceMm).toBeCloseTo(-39.551, 2);
    expect(room.report.cornerAnglesDeg[0]).toBeCloseTo(90.295, 3);
  });

  it("both diagonals: least squares, measured difference reported, small residuals", () => {
    // Measured 7830 and 7790: the parallelogram above predicts 7790.449, so the fit has to absorb under 0.5 mm.
    const room = solveRoom({ walls: walls(6000, 5000, 6000, 5000), diagonals: [{ from: 0, to: 2, lengthMm: 7830 }, { from: 1, to: 3, lengthMm: 7790 }] });
    expect(room.report.diagonalDifferenceMm).toBe(40);
    expect(room.report.maxResidualMm).toBeGreaterThan(0);
    expect(room.report.maxResidualMm).toBeLessThan(0.5);
    expect(room.report.cornerAnglesDeg[1]).toBeCloseTo(90.3, 1);
  });

  it("a diagonal that cannot fit falls back to square corners and says so", () => {
    const room = solveRoom({ walls: walls(6000, 5000, 6000, 5000), diagonals: [{ from: 0, to: 2, lengthMm: 20000 }] });
    expect(room.report.method).toBe("assumed-square");
    expect(room.report.notes.join(" ")).toMatch(/cannot make two triangles/);
  });
});

describe("solveRoom: no diagonals", () => {
  it("assumes square corners and reports the closure error of an open loop", () => {
    // Walk with 90-degree turns: (0,0) -> (6000,0) -> (6000,5000) -> (10,5000) -> (10,0). The loop misses the start by 10 mm.
    const room = solveRoom({ walls: walls(6000, 5000, 5990, 5000) });
    expect(room.report.method).toBe("assumed-square");
    expect(room.report.closureErrorMm).toBeCloseTo(10, 9);
    expect(room.report.notes.join(" ")).toMatch(/10 mm/);
    // After spreading the gap the floor closes: corner 0 at the origin, wall 0 along +x.
    near(room.corners[0], 0, 0);
    expect(room.corners[1].y).toBeCloseTo(0, 9);
    expect(room.walls[3].end).toEqual(room.corners[0]);
    const sum = room.report.cornerAnglesDeg.reduce((s, a) => s + a, 0);
    expect(sum).toBeCloseTo(360, 9);
  });

  it("closure error combines both directions", () => {
    // Gaps of 10 mm in x and 8 mm in y: sqrt(10^2 + 8^2) = 12.806 mm.
    const room = solveRoom({ walls: walls(6000, 5000, 5990, 5008) });
    expect(room.report.closureErrorMm).toBeCloseTo(Math.hypot(10, 8), 9);
  });

  it("a true rectangle closes with no error", () => {
    const room = solveRoom({ walls: walls(6100, 6700, 6100, 6700) });
    expect(room.report.closureErrorMm).toBeCloseTo(0, 9);
    expect(room.report.notes).toEqual([]);
    near(room.corners[2], 6100, 6700);
  });

  it("one measured angle fixes a four-walled room exactly", () => {
    // The 90.295-degree corner 1 of the parallelogram above: law of cosines gives the 0-2 diagonal back as 7830 mm.
    const a1 = (Math.acos(-308900 / 60e6) * 180) / Math.PI;
    const room = solveRoom({ walls: walls(6000, 5000, 6000, 5000), cornerAnglesDeg: [null, a1, null, null] });
    expect(room.report.method).toBe("angles");
    expect(room.report.closureErrorMm).toBe(0);
    expect(room.report.diagonals?.[0].solvedMm).toBeCloseTo(7830, 6);
    expect(room.report.diagonalDifferenceMm).toBeCloseTo(39.551, 2);
  });
});

describe("solveRoom: five walls", () => {
  // A 6000 x 5000 mm room with the corner at (6000, 5000) cut off 1000 mm each way at 45 degrees:
  // corners (0,0) (6000,0) (6000,4000) (5000,5000) (0,5000); the cut wall is 1000 * sqrt(2) = 1414.214 mm.
  // Interior angles 90, 90, 135, 135, 90 add to (5 - 2) * 180 = 540.
  const five = walls(6000, 4000, 1000 * Math.SQRT2, 5000, 5000);
  const expectShape = (corners: Vec2[], digits = 6) => {
    near(corners[0], 0, 0, digits);
    near(corners[1], 6000, 0, digits);
    near(corners[2], 6000, 4000, digits);
    near(corners[3], 5000, 5000, digits);
    near(corners[4], 0, 5000, digits);
  };

  it("uses the two measured angles and takes the rest as square", () => {
    const room = solveRoom({ walls: five, cornerAnglesDeg: [null, null, 135, 135, null] });
    expect(room.report.method).toBe("mixed");
    expect(room.report.closureErrorMm).toBeCloseTo(0, 6);
    expectShape(room.corners);
    expect(room.report.diagonalDifferenceMm).toBeNull();
    // 30,000,000 - the cut triangle 1000 * 1000 / 2 = 29,500,000 mm^2.
    expect(room.areaMm2).toBeCloseTo(29.5e6, 0);
  });

  it("measured angles that do not add to 540 are evened out, with a note", () => {
    const room = solveRoom({ walls: five, cornerAnglesDeg: [90.5, 90, 135, 135, 90] });
    expect(room.report.method).toBe("angles");
    expect(room.report.notes.join(" ")).toMatch(/540\.5°/);
    // 0.1 degree comes off each corner, so wall headings drift by 0.1 to 0.4 degree (5000 mm * tan 0.4 deg = 35 mm
    // at worst) before the gap is spread: the corners stay within 25 mm of the true shape, and not exactly on it.
    const truth = [[0, 0], [6000, 0], [6000, 4000], [5000, 5000], [0, 5000]];
    room.corners.forEach((p, i) => expect(Math.hypot(p.x - truth[i][0], p.y - truth[i][1])).toBeLessThan(25));
    expect(Math.hypot(room.corners[3].x - 5000, room.corners[3].y - 5000)).toBeGreaterThan(1);
  });

  it("uses all angles when all are measured", () => {
    const room = solveRoom({ walls: five, cornerAnglesDeg: [90, 90, 135, 135, 90] });
    expect(room.report.method).toBe("angles");
    expectShape(room.corners);
  });

  it("fits two diagonals that fan from corner 0", () => {
    // 0-2: sqrt(6000^2 + 4000^2) = 7211.103 mm; 0-3: sqrt(2) * 5000 = 7071.068 mm.
    const room = solveRoom({
      walls: five,
      diagonals: [{ from: 0, to: 2, lengthMm: Math.hypot(6000, 4000) }, { from: 0, to: 3, lengthMm: Math.hypot(5000, 5000) }],
      cornerAnglesDeg: [null, null, 135, 135, null],
    });
    expect(room.report.method).toBe("diagonals");
    expectShape(room.corners, 3);
  });

  it("without angles, says the corners cannot all be square", () => {
    const room = solveRoom({ walls: five });
    expect(room.report.method).toBe("assumed-square");
    expect(room.report.notes.join(" ")).toMatch(/cannot all be square/);
    expect(room.report.cornerAnglesDeg.reduce((s, a) => s + a, 0)).toBeCloseTo(540, 6);
  });
});

describe("solveRoom: six walls", () => {
  it("an L-shaped room with its one inside corner measured at 270 degrees", () => {
    // Corners (0,0) (4000,0) (4000,2000) (2000,2000) (2000,4000) (0,4000); the other five corners are square (5 x 90 + 270 = 720).
    const room = solveRoom({ walls: walls(4000, 2000, 2000, 2000, 2000, 4000), cornerAnglesDeg: [null, null, null, 270, null, null] });
    expect(room.report.method).toBe("mixed");
    expect(room.report.closureErrorMm).toBeCloseTo(0, 6);
    near(room.corners[3], 2000, 2000);
    near(room.corners[4], 2000, 4000);
    expect(room.report.cornerAnglesDeg[3]).toBeCloseTo(270, 6);
    expect(room.areaMm2).toBeCloseTo(12e6, 0);
  });
});

describe("solveRoom: three walls and inputs", () => {
  it("a 3-4-5 triangle has a right angle at corner 1", () => {
    const room = solveRoom({ walls: walls(3000, 4000, 5000) });
    expect(room.report.method).toBe("lengths");
    expect(room.report.cornerAnglesDeg[1]).toBeCloseTo(90, 9);
    near(room.corners[2], 3000, 4000);
  });

  it("does not change its input and fills walls", () => {
    const input: RoomMeasurements = Object.freeze({ walls: Object.freeze(walls(4000, 3000, 4000, 3000).map((w) => Object.freeze(w))), ceilingHeightMm: 2400 });
    const room = solveRoom(input);
    expect(room.ceilingHeightMm).toBe(2400);
    expect(room.walls.map((w) => w.id)).toEqual(["w1", "w2", "w3", "w4"]);
    near(room.walls[1].dir, 0, 1);
    near(room.walls[1].inward, -1, 0);
  });

  it("refuses fewer than three walls", () => {
    expect(() => solveRoom({ walls: walls(1000, 1000) })).toThrow(/three walls/);
  });
});
