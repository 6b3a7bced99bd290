import { describe, expect, it } from "vitest";
import { partFacts } from "@/lib/engine/checks/part-facts";
import { derivePlan, rederiveFixtures } from "@/lib/engine/derive";
import { generatePlan } from "@/lib/engine/demo/generate-plan";

describe("facts of each fixture's parts", () => {
  const plan = generatePlan(40, 5);
  const derived = derivePlan(plan);

  it("lists every fixture with parts once, with its distinct shelves and whether laminate is glued", () => {
    const facts = partFacts(derived.parts);
    const withParts = new Set(derived.parts.map((p) => p.fixtureId));
    expect(facts.map((f) => f.fixtureId).sort()).toEqual([...withParts].sort());
    for (const f of facts) {
      const shelves = derived.parts.filter((p) => p.fixtureId === f.fixtureId && /shelf/i.test(p.name));
      const distinct = new Set(shelves.map((p) => `${Math.round(p.lengthMm)}|${Math.round(p.widthMm)}|${p.thicknessMm}|${p.materialId}`));
      expect(f.shelves).toHaveLength(distinct.size);
      const laminate = derived.parts.some((p) => p.fixtureId === f.fixtureId && [p.name, p.materialId, ...p.joinery].some((t) => /laminate|contact cement/i.test(t)));
      expect(f.laminate).toBe(laminate);
    }
    // The generated shop's counters are laminate-topped base cabinets.
    expect(facts.some((f) => f.laminate)).toBe(true);
  });

  it("keeps the facts of unchanged fixtures across a re-derive and works out the moved one's again", () => {
    const before = new Map(partFacts(derived.parts).map((f) => [f.fixtureId, f]));
    const target = plan.fixtures.find((f) => f.kind === "shelf-run")!;
    const next = { ...plan, fixtures: plan.fixtures.map((f) => (f.id === target.id ? { ...f, params: { ...f.params, levels: 2 } } : f)) };
    const after = new Map(partFacts(rederiveFixtures(next, derived, [target.id]).parts).map((f) => [f.fixtureId, f]));
    for (const [id, f] of after) {
      if (id === target.id) expect(f).not.toBe(before.get(id));
      else expect(f).toBe(before.get(id));
    }
  });
});
