import { describe, it, expect } from "vitest";
import { buildFromPlan } from "@/lib/engine/build";
import { demoPlan } from "@/lib/engine/demo/demo-plan";
import { parsePlan } from "@/lib/engine/plan/parse";
import { ITEM_PATTERN, cutItem, describeItem, shopProgress, stepItem, sumCounts } from "@/lib/engine/shop/progress";

function demoBuild() {
  const parsed = parsePlan(demoPlan());
  if (!parsed.ok) throw new Error("demo plan does not parse");
  return buildFromPlan(parsed.plan);
}

describe("shop-floor progress", () => {
  const build = demoBuild();

  it("counts every piece of every setup and every step, with nothing done at first", () => {
    const p = shopProgress(build, new Map());
    const pieces = build.setups.reduce((n, s) => n + s.totalQty, 0);
    expect(pieces).toBeGreaterThan(0);
    expect(p.overall).toEqual({ done: 0, total: pieces + build.steps.length });
    expect(p.nextSetupId).toBe(build.setups[0]!.id);
    expect(p.orphans).toEqual([]);
  });

  it("adds check-offs and undos from several sources, clamped to what the setup asks for", () => {
    const s = build.setups[0]!;
    const it0 = s.items[0]!;
    const item = cutItem(s.id, it0.label);
    const total = s.items.filter((i) => i.label === it0.label).reduce((n, i) => n + i.qty, 0);
    const server = [{ item, count: total + 3 }];
    const local = [{ item, delta: -1 }];
    const p = shopProgress(build, sumCounts(server, local));
    const row = p.setups[0]!.items.find((i) => i.item === item)!;
    expect(row.done).toBe(Math.min(total, total + 2));
    expect(shopProgress(build, sumCounts([{ item, count: -4 }])).setups[0]!.items.find((i) => i.item === item)!.done).toBe(0);
  });

  it("moves the next setup on when one is finished and counts a done step once", () => {
    const first = build.setups[0]!;
    const done = first.items.map((i) => ({ item: cutItem(first.id, i.label), delta: i.qty }));
    const step = build.steps[0]!;
    const p = shopProgress(build, sumCounts(done, [{ item: stepItem(step.id), delta: 1 }, { item: stepItem(step.id), delta: 1 }]));
    expect(p.setups[0]!.done).toBe(p.setups[0]!.total);
    expect(p.nextSetupId).toBe(build.setups[1]?.id ?? null);
    expect(p.steps[0]!.done).toBe(true);
    expect(p.overall.done).toBe(first.totalQty + 1);
  });

  it("keeps check-offs of parts the plan no longer has as orphans, in words", () => {
    const gone = cutItem("rip-99", "Z9");
    const p = shopProgress(build, sumCounts([{ item: gone, count: 2 }]));
    expect(p.orphans).toEqual([{ item: gone, count: 2 }]);
    expect(describeItem(gone)).toBe("Z9 cut at setup rip-99");
    expect(describeItem(cutItem("rip-2", "A6"), (id) => (id === "rip-2" ? 2 : undefined))).toBe("A6 cut at setup 2");
    expect(describeItem(stepItem("room-cut"), () => 1)).toBe("step 1");
  });

  it("item keys of the demo build fit the pattern the API accepts; others do not", () => {
    for (const s of build.setups) for (const i of s.items) expect(cutItem(s.id, i.label)).toMatch(ITEM_PATTERN);
    for (const st of build.steps) expect(stepItem(st.id)).toMatch(ITEM_PATTERN);
    for (const bad of ["", "cut:", "cut:a", "step:", "piece:a:b", "cut:a:b:c", "step:a b", `step:${"x".repeat(121)}`, "step:a\u0000"]) expect(bad).not.toMatch(ITEM_PATTERN);
  });
});
