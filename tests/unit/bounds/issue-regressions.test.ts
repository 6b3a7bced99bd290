import { describe, expect, it } from "vitest";
import { analyzePlan } from "@/lib/engine/checks/analyze";
import { derivePlan } from "@/lib/engine/derive";
import type { Part } from "@/lib/engine/fixtures/types";
import { nestSheets } from "@/lib/engine/nesting/nest-sheets";
import { newPlanDocument } from "@/lib/engine/plan/defaults";
import { PLAN_LIMITS } from "@/lib/engine/plan/limits";
import { parsePlan } from "@/lib/engine/plan/parse";
import { partsCsv, shoppingCsv } from "@/lib/engine/shopping/csv";
import { DEFAULT_PRICE_LIST } from "@/lib/engine/shopping/default-prices";
import { materialsReport } from "@/lib/engine/shopping/plan-shopping";

/** The default garage with these fixtures against the back wall. */
function withFixtures(fixtures: { kind: string; params?: Record<string, unknown> }[]) {
  return { ...newPlanDocument(), fixtures: fixtures.map((f, i) => ({ id: `f${i}`, kind: f.kind, placement: { mode: "wall", wallId: "w3", offsetMm: 100 }, params: f.params ?? {} })) };
}

function issuesOf(input: unknown) {
  const r = parsePlan(input);
  expect(r.ok).toBe(false);
  return r.ok ? [] : r.issues;
}

describe("inputs that once took the server down are refused with a field message", () => {
  it("refuses a lumber rack with uprights 1e-9 mm apart (it ran the heap out of memory)", () => {
    const issues = issuesOf(withFixtures([{ kind: "lumber-rack", params: { maxUprightSpacingMm: 1e-9 } }]));
    expect(issues).toEqual([{ path: "fixtures.0.params.maxUprightSpacingMm", message: expect.stringMatching(/^At least 12 in \(304\.8 mm\): uprights go on studs/) }]);
  });

  it("refuses uprights 0.1 mm apart (the shopping CSV spun for minutes)", () => {
    const issues = issuesOf(withFixtures([{ kind: "lumber-rack", params: { maxUprightSpacingMm: 0.1 } }]));
    expect(issues.map((i) => i.path)).toEqual(["fixtures.0.params.maxUprightSpacingMm"]);
  });

  it("refuses a wall cabinet 5e-324 mm high (the cut order overflowed the call stack)", () => {
    const issues = issuesOf(withFixtures([{ kind: "wall-cabinet", params: { heightMm: 5e-324 } }]));
    expect(issues).toEqual([{ path: "fixtures.0.params.heightMm", message: expect.stringMatching(/^At least 6 in \(152\.4 mm\): /) }]);
  });

  it("lays out even vanishing parts that bypass the schema, without recursion, and writes both CSVs", () => {
    const tiny: Part = { id: "x:sliver", fixtureId: "x", name: "Sliver", qty: 400, lengthMm: 5e-324, widthMm: 5e-324, thicknessMm: 18, materialId: "ply-18", stock: "sheet", grain: "length", edges: [], joinery: [] };
    const bad: Part = { ...tiny, id: "x:nan", name: "No size", qty: 3, lengthMm: Number.NaN };
    const plan = newPlanDocument();
    const r = materialsReport([tiny, bad], [], plan.materials, DEFAULT_PRICE_LIST.items, { kerfMm: 3.175, nest: { maxWork: 200_000 } });
    expect(r.nest.unplaced).toContainEqual(expect.objectContaining({ partId: "x:nan", reason: expect.stringMatching(/no usable size/) }));
    expect(shoppingCsv(r.shopping)).toContain("Category");
    expect(partsCsv([tiny], plan.materials, plan.settings).split("\r\n").length).toBe(3);
  });

  it("refuses text with U+0000 and a stop track with more cut lengths than its cap", () => {
    const doc = withFixtures([]);
    doc.room.walls[0].label = "Door\u0000wall";
    expect(issuesOf(doc).map((i) => i.path)).toEqual(["room.walls.0.label"]);
    const track = withFixtures([{ kind: "stop-track", params: { cutLengthsMm: Array.from({ length: PLAN_LIMITS.cutLengths + 1 }, () => 300) } }]);
    expect(issuesOf(track)).toEqual([{ path: "fixtures.0.params.cutLengthsMm", message: `At most ${PLAN_LIMITS.cutLengths} cut lengths on one track.` }]);
  });
});

describe("plan caps", () => {
  it(`derives and analyses a plan at the fixture cap (${PLAN_LIMITS.fixtures} cabinets stacked in one place), with a bounded answer`, () => {
    const r = parsePlan(withFixtures(Array.from({ length: PLAN_LIMITS.fixtures }, () => ({ kind: "base-cabinet" }))));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const derived = derivePlan(r.plan);
    expect(derived.fixtures).toHaveLength(PLAN_LIMITS.fixtures);
    const a = analyzePlan(r.plan, derived);
    // Every pair overlaps: 44,850 collisions, listed up to the cap and counted in full.
    expect(a.findings).toHaveLength(PLAN_LIMITS.analysisFindings);
    expect(a.omittedFindings).toBeGreaterThan(40_000);
    expect(a.summary.conflicts).toBeGreaterThan(44_000);
    expect(a.findings[0].severity).toBe("conflict");
    expect(JSON.stringify(a).length).toBeLessThan(5_000_000);
  }, 60_000);

  it("refuses one fixture over the cap with a message at fixtures", () => {
    const issues = issuesOf(withFixtures(Array.from({ length: PLAN_LIMITS.fixtures + 1 }, () => ({ kind: "pegboard" }))));
    expect(issues).toEqual([{ path: "fixtures", message: expect.stringMatching(/^At most 300 fixtures/) }]);
  });

  it("refuses a plan whose fixtures make more pieces than the cap", () => {
    const big = { widthMm: 2500, carcassHeightMm: 1500, sections: Array.from({ length: 6 }, () => ({ fill: "drawers", drawerCount: 8 })) };
    const issues = issuesOf(withFixtures(Array.from({ length: 200 }, () => ({ kind: "base-cabinet", params: big }))));
    expect(issues).toEqual([{ path: "fixtures", message: expect.stringMatching(/pieces; a plan may have at most 20,000/) }]);
  });
});

describe("nesting is decided by counted work, not the clock", () => {
  it("gives the same layout whatever time budget is passed", () => {
    const plan = parsePlan(withFixtures(Array.from({ length: 6 }, () => ({ kind: "base-cabinet" }))));
    if (!plan.ok) throw new Error("plan refused");
    const parts = derivePlan(plan.plan).parts;
    const fast = nestSheets(parts, plan.plan.materials, { kerfMm: 3.175, timeBudgetMs: 1, maxWork: 300_000 });
    const slow = nestSheets(parts, plan.plan.materials, { kerfMm: 3.175, timeBudgetMs: 60_000, maxWork: 300_000 });
    expect(slow.materials.map((m) => [m.sheets.length, m.attempts, m.work, m.strategy])).toEqual(fast.materials.map((m) => [m.sheets.length, m.attempts, m.work, m.strategy]));
    expect(fast.work).toBeLessThanOrEqual(300_000 + 50_000);
  });
});
