import { describe, it, expect } from "vitest";
import { buildFromPlan } from "@/lib/engine/build";
import { demoPlan } from "@/lib/engine/demo/demo-plan";
import type { PlanDocument } from "@/lib/engine/plan/schema";

const IN = 25.4;

function withTrack(params: Record<string, unknown>): PlanDocument {
  const plan = demoPlan();
  return { ...plan, fixtures: plan.fixtures.map((f) => (f.kind === "stop-track" ? { ...f, params: { ...f.params, ...params } } : f)) };
}

describe("stop tables from the plan", () => {
  it("rows come from the plan's repeat crosscuts, with labels and quantities, then the typed lengths", () => {
    const b = buildFromPlan(demoPlan());
    const t = b.stopTables[0];
    const rails = b.rows.find((r) => r.name === "Face-frame rail");
    const row = t.rows.find((r) => rails && r.labels.includes(rails.label));
    expect(row?.source).toBe("plan");
    expect(row?.qty).toBe(8);
    expect(row?.cutLengthMm).toBeCloseTo(685.8, 1);
    expect(row?.tapeReadingMm).toBeCloseTo(685.8, 6);
    expect(b.setups.find((s) => s.id === row?.setupId)?.stopTrackId).toBe(t.fixtureId);
    const firstTyped = t.rows.findIndex((r) => r.source === "typed");
    expect(t.rows.slice(firstTyped).every((r) => r.source === "typed")).toBe(true);
  });

  it("kerf toward the track moves every stop one kerf (1/8 in full kerf, practice) further from the blade", () => {
    const away = buildFromPlan(withTrack({ kerfSide: "away" })).stopTables[0];
    const toward = buildFromPlan(withTrack({ kerfSide: "toward" })).stopTables[0];
    expect(toward.rows.length).toBe(away.rows.length);
    toward.rows.forEach((r, i) => expect(r.fromBladeMm - away.rows[i].fromBladeMm).toBeCloseTo(3.175, 6));
    expect(away.tapeOffsetMm - toward.tapeOffsetMm).toBeCloseTo(3.175, 6);
  });

  it("a typed length past the track's end is flagged out of reach with a note; one already in the plan is not repeated", () => {
    const t = buildFromPlan(withTrack({ lengthMm: 48 * IN, startFromBladeMm: 2 * IN, cutLengthsMm: [27 * IN, 60 * IN] })).stopTables[0];
    const far = t.rows.find((r) => Math.abs(r.cutLengthMm - 60 * IN) < 0.01);
    expect(far?.inReach).toBe(false);
    expect(far?.source).toBe("typed");
    expect(t.rows.filter((r) => Math.abs(r.cutLengthMm - 27 * IN) < 0.01)).toHaveLength(1);
    expect(t.notes.join(" ")).toMatch(/out of the track's reach/);
  });
});
