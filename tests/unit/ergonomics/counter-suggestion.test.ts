import { describe, expect, it } from "vitest";
import { counterHeightSuggestion } from "@/lib/engine/ergonomics/counter-suggestion";
import { elbowHeight } from "@/lib/engine/ergonomics/elbow";
import { formatLength } from "@/lib/engine/units/format-length";

const IN = 25.4;
const inch = (mm: number) => formatLength(mm, { units: "in", precision: 16 });

// Grandjean, Fitting the Task to the Man: light work 10-15 cm below the elbow, heavy work 15-40 cm below.
// Elbow estimated as 0.62 x stature (Pheasant, Bodyspace, 50th-percentile ratio; value not yet checked against the published source).
describe("counter height suggestion from the elbow", () => {
  it("36 in for a 1755 mm person (elbow 1088 mm): heavy work, 15/16 in below light work", () => {
    const e = elbowHeight({ userHeightMm: 1755 });
    expect(e.valueMm).toBe(1088);
    const s = counterHeightSuggestion(36 * IN, e, inch, IN / 4);
    // Light work 1088-150 = 938 mm to 1088-100 = 988 mm; heavy 688 to 938 mm. 938 - 914.4 = 23.6 mm = 0.93 in, shown as 15/16 in.
    expect(s.light).toEqual({ minMm: 938, maxMm: 988 });
    expect(s.heavy).toEqual({ minMm: 688, maxMm: 938 });
    expect(s.verdict).toBe('36" is in the heavy-work range and 15/16" below light work.');
    expect(s.ranges).toContain("(estimated from your stature)");
    // 938 mm = 36.93 in, rounded up to the next 1/4 in: 37 in.
    expect(s.suggestedMm).toBeCloseTo(37 * IN, 9);
  });

  it("a measured elbow of 1050 mm: 36 in is light work, and the words follow a typed counter", () => {
    const e = elbowHeight({ userHeightMm: 1755, elbowHeightMm: 1050 });
    const s = counterHeightSuggestion(36 * IN, e, inch, IN / 4);
    // Light 900-950 mm: 914.4 is inside, 914.4 - 900 = 14.4 mm = 9/16 in above heavy work.
    expect(s.verdict).toBe('36" is in the light-work range and 9/16" above heavy work.');
    expect(s.ranges).not.toContain("estimated");
    expect(counterHeightSuggestion(40 * IN, e, inch, IN / 4).verdict).toMatch(/above the light-work range: too high/);
    expect(counterHeightSuggestion(25 * IN, e, inch, IN / 4).verdict).toMatch(/below the heavy-work range: too low/);
    expect(counterHeightSuggestion(900, e, inch, IN / 4).verdict).toMatch(/suits both/);
  });

  it("metric: 5 mm steps", () => {
    const s = counterHeightSuggestion(895, elbowHeight({ userHeightMm: 1625 }), (mm) => formatLength(mm, { units: "mm" }), 5);
    // 0.62 x 1625 = 1007.5 -> 1008 mm; light work from 858 mm, rounded up to 860 mm.
    expect(s.suggestedMm).toBe(860);
    expect(s.verdict).toBe("895 mm is in the light-work range and 37 mm above heavy work.");
  });
});
