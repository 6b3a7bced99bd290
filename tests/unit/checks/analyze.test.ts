import { describe, expect, it } from "vitest";
import { analyzePlan } from "@/lib/engine/checks/analyze";
import { createChecker, evaluatePlan } from "@/lib/engine/checks/evaluate";
import { derivePlan, rederiveFixtures } from "@/lib/engine/derive";
import { demoPlan } from "@/lib/engine/demo/demo-plan";
import type { PlanDocument } from "@/lib/engine/plan/schema";

describe("analysis of a derived plan (the engine's own derivePlan)", () => {
  const plan = demoPlan();
  const derived = derivePlan(plan);
  it("counts match the findings, zones and parts are passed through", () => {
    const r = analyzePlan(plan, derived);
    expect(r.summary.conflicts).toBe(r.findings.filter((f) => !f.pass && f.severity === "conflict").length);
    expect(r.summary.passes).toBe(r.findings.filter((f) => f.pass).length);
    expect(r.zones).toBe(derived.zones);
    expect(r.parts.lines).toBe(derived.parts.length);
    expect(r.parts.pieces).toBe(derived.parts.reduce((a, p) => a + p.qty, 0));
    // 36 in walkway (NKBA, secondary) is in force unless a preset says otherwise.
    expect(r.numbers.walkwayMm).toBeCloseTo(914.4, 6);
  });
  it("a 42 in class preset walkway (NKBA work aisle, secondary) is reported as such", () => {
    const r = analyzePlan(plan, derived, { preset: { walkwayMm: 42 * 25.4 } });
    const w = r.findings.filter((f) => f.ruleId === "walkway");
    expect(w.length).toBeGreaterThan(0);
    expect(w.every((f) => f.message.includes("(class preset)"))).toBe(true);
  });
  it("incremental re-check after a drag matches a full evaluation, with H2's incremental derive", () => {
    const free = plan.fixtures.find((f) => f.placement.mode === "wall")!;
    const moved: PlanDocument = {
      ...plan,
      fixtures: plan.fixtures.map((f) => (f.id === free.id && f.placement.mode === "wall" ? { ...f, placement: { ...f.placement, offsetMm: f.placement.offsetMm + 150 } } : f)),
    };
    const checker = createChecker(plan, derived);
    const next = rederiveFixtures(moved, derived, [free.id]);
    const key = (x: { ruleId: string; subjectId?: string; message: string }) => `${x.ruleId}|${x.subjectId}|${x.message}`;
    expect(checker.update(moved, next, [free.id]).map(key).sort()).toEqual(evaluatePlan(moved, next).map(key).sort());
  });
});
