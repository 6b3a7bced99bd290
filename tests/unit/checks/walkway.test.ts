import { describe, expect, it } from "vitest";
import { evaluatePlan } from "@/lib/engine/checks/evaluate";
import { IN, counter, derive, fixture, makePlan, rectRoom } from "./helpers";

// Walkway 36 in: NKBA kitchen planning guidelines (secondary copy). Never below 28 in: OSHA 29 CFR 1910.36(g)(2).
const DEPTH = 24 * IN;

/** Counters on facing walls (w1 and w3), aisle = room depth - 2 x 24 in. */
function aisle(aisleMm: number) {
  const D = 2 * DEPTH + aisleMm;
  const plan = makePlan(4000, D);
  const room = rectRoom(4000, D);
  const far = fixture("far", { kind: "base-cabinet", x: 2000, y: D, rot: Math.PI, w: 1000, d: DEPTH, h: 36 * IN, work: 36 * IN });
  const fs = evaluatePlan(plan, derive(plan, room, [counter("near", 1000, 1000), far])).filter((f) => f.ruleId === "walkway");
  return fs.find((f) => f.subjectId === "near")!;
}

describe("walkway width between facing counters", () => {
  it("36 in passes", () => {
    const f = aisle(36 * IN);
    expect(f.pass).toBe(true);
  });
  it("just under 36 in is a caution (passable, under the NKBA walkway)", () => {
    const f = aisle(36 * IN - 1);
    expect(f.pass).toBe(false);
    expect(f.severity).toBe("caution");
    expect(f.measured).toBeCloseTo(36 * IN - 1, 1);
    expect(f.required).toBeCloseTo(914.4, 1);
    expect(f.fixtureIds).toEqual(["near", "far"]);
  });
  it("exactly 28 in is still only a caution; just under 28 in is a conflict (OSHA 1910.36(g)(2))", () => {
    expect(aisle(28 * IN).severity).toBe("caution");
    const f = aisle(28 * IN - 1);
    expect(f.severity).toBe("conflict");
    expect(f.required).toBeCloseTo(711.2, 1);
    expect(f.shortfall).toBeCloseTo(1, 1);
    expect(f.message).toMatch(/below the 28" minimum/);
  });
  it("a parked vehicle narrows the walkway", () => {
    const D = 6000;
    const plan = makePlan(6000, D, {
      room: { obstacles: [{ id: "bay", kind: "parking-bay", placement: { mode: "wall", wallId: "w3", offsetMm: 500 }, vehicleLengthMm: 4900, vehicleWidthMm: 1900, doorSwingMm: 760 }] },
    });
    const room = rectRoom(6000, D);
    // Vehicle nose at the far wall (w3, y = 6000) reaches to y = 1100; counter front at y = 610: 490 mm.
    const f = evaluatePlan(plan, derive(plan, room, [counter("c", 4000 - 1000, 1000)])).find((x) => x.ruleId === "walkway")!;
    expect(f.message).toMatch(/parked vehicle/);
    expect(f.measured).toBeCloseTo(1100 - DEPTH, 0);
  });
});
