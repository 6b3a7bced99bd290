import { describe, it, expect } from "vitest";
import { ELBOW_TO_STATURE, elbowHeight, estimateElbowHeightMm } from "@/lib/engine/ergonomics/elbow";
import { assessWorkSurface, recommendedWorkSurfaces, tasksSuitedTo } from "@/lib/engine/ergonomics/work-surface";

const IN = 25.4; // NIST SP 811, App. B

describe("elbow height from stature", () => {
  // Pheasant, Bodyspace, 50th percentile (values from memory): men stature 1755 mm, elbow 1090 mm; women 1625 / 1005 mm.
  it("reproduces the 50th-percentile elbow heights within 5 mm", () => {
    expect(Math.abs(estimateElbowHeightMm(1755) - 1090)).toBeLessThanOrEqual(5);
    expect(Math.abs(estimateElbowHeightMm(1625) - 1005)).toBeLessThanOrEqual(5);
    expect(estimateElbowHeightMm(1755, "men")).toBe(1090);
    expect(estimateElbowHeightMm(1625, "women")).toBe(1005);
    expect(ELBOW_TO_STATURE.men).toBeCloseTo(0.6211, 4);
    expect(ELBOW_TO_STATURE.women).toBeCloseTo(0.6185, 4);
  });
  it("stays within 25 mm at the 5th and 95th percentiles", () => {
    // Pheasant, Bodyspace: stature (pub, secondary) men 1640 / 1870, women 1520 / 1730 mm;
    // elbow (memory) men 1005 / 1180, women 930 / 1085 mm. The ratio is not constant, so allow 25 mm.
    const pairs: [number, number][] = [[1640, 1005], [1870, 1180], [1520, 930], [1730, 1085]];
    for (const [stature, elbow] of pairs) expect(Math.abs(estimateElbowHeightMm(stature) - elbow)).toBeLessThanOrEqual(25);
  });
  it("says when it is an estimate", () => {
    expect(elbowHeight({ userHeightMm: 1780, elbowHeightMm: 1100 })).toMatchObject({ valueMm: 1100, estimated: false });
    const e = elbowHeight({ userHeightMm: 1780 });
    expect(e.estimated).toBe(true);
    expect(e.valueMm).toBe(Math.round(1780 * 0.62));
    expect(e.source).toMatch(/Estimated.*Pheasant/);
  });
});

describe("recommended work surface heights", () => {
  // Grandjean, Fitting the Task to the Man: light 10-15 cm below elbow, heavy 15-40 cm below; precision 5-10 cm above (memory).
  it("follows Grandjean's offsets", () => {
    const b = recommendedWorkSurfaces(1090);
    expect([b.light.minMm, b.light.maxMm]).toEqual([940, 990]);
    expect([b.heavy.minMm, b.heavy.maxMm]).toEqual([690, 940]);
    expect([b.precision.minMm, b.precision.maxMm]).toEqual([1140, 1190]);
    expect(b.light.targetMm).toBe(965);
    for (const t of ["precision", "light", "heavy"] as const) expect(b[t].source).toMatch(/Grandjean/);
    expect(b.precision.source).toMatch(/memory/);
  });

  // Cross-check: NIOSH Pub. 97-117, Elements of Ergonomics Programs (secondary copy): standing surfaces
  // precision 37-43 in, light 34-37 in, heavy 28-35 in. Its ranges cover a working population.
  const NIOSH = { precision: [37, 43], light: [34, 37], heavy: [28, 35] } as const;
  it("puts NIOSH's mid-range heights on people inside the adult 5th-95th elbow range", () => {
    // Elbow heights 930 mm (5th percentile woman) to 1180 mm (95th percentile man), Pheasant (memory).
    for (const t of ["precision", "light", "heavy"] as const) {
      const midMm = ((NIOSH[t][0] + NIOSH[t][1]) / 2) * IN;
      const zero = recommendedWorkSurfaces(0)[t];
      const elbowForMid = midMm - zero.targetMm; // the elbow height whose band is centred on NIOSH's middle
      expect(elbowForMid).toBeGreaterThanOrEqual(930);
      expect(elbowForMid).toBeLessThanOrEqual(1180);
    }
  });
  it("overlaps every NIOSH band for the 50th-percentile woman (elbow 1005 mm)", () => {
    const b = recommendedWorkSurfaces(1005);
    for (const t of ["precision", "light", "heavy"] as const) {
      const [lo, hi] = [NIOSH[t][0] * IN, NIOSH[t][1] * IN];
      expect(b[t].minMm).toBeLessThanOrEqual(hi);
      expect(b[t].maxMm).toBeGreaterThanOrEqual(lo);
    }
  });
  it("orders the bands the same way as NIOSH: precision above light above heavy", () => {
    const b = recommendedWorkSurfaces(1048);
    expect(b.precision.minMm).toBeGreaterThan(b.light.maxMm);
    expect(b.light.minMm).toBeGreaterThanOrEqual(b.heavy.maxMm);
    expect(NIOSH.precision[0]).toBeGreaterThan(NIOSH.light[0]);
    expect(NIOSH.light[0]).toBeGreaterThan(NIOSH.heavy[0]);
  });
  it("assesses a 36 in counter (kitchen convention, practice) for a 1090 mm elbow", () => {
    // 36 in = 914.4 mm: 175.6 mm below the elbow, inside heavy (690-940), 25.6 mm under light (940-990).
    const counter = 36 * IN;
    expect(assessWorkSurface(counter, 1090, "heavy")).toMatchObject({ within: true, offByMm: 0 });
    expect(assessWorkSurface(counter, 1090, "light").offByMm).toBeCloseTo(-25.6, 9);
    expect(assessWorkSurface(1200, 1090, "precision").offByMm).toBeCloseTo(10, 9);
    expect(tasksSuitedTo(counter, 1090)).toEqual(["heavy"]);
    expect(tasksSuitedTo(940, 1090)).toEqual(["light", "heavy"]);
  });
});
