/**
 * Checks suite, over the seeded generated shops (lib/engine/demo): full evaluation of every rule at
 * 300 and 600 fixtures (goal: median <= 4 ms at 300; 600 within 2.2x of 300); the same evaluation
 * with the grid turned into one cell, so every query scans every item (the naive all-pairs
 * baseline); and the incremental re-check after moving one fixture.
 */
import type { BenchTable } from "../bench";
import { createChecker, evaluatePlan } from "../../lib/engine/checks/evaluate";
import { derivePlan, rederiveFixtures } from "../../lib/engine/derive";
import { generatePlan } from "../../lib/engine/demo/generate-plan";
import type { PlanDocument } from "../../lib/engine/plan/schema";
import { fmt } from "./timing";

/** Min, median and p95 of repeated timings, ms: on a shared machine the minimum shows the work itself, the median the wait for a core. */
function timeIt(fn: () => unknown, opts: { warmup: number; runs: number }): { min: number; median: number; p95: number } {
  for (let i = 0; i < opts.warmup; i++) fn();
  const t: number[] = [];
  for (let i = 0; i < opts.runs; i++) {
    const s = performance.now();
    fn();
    t.push(performance.now() - s);
  }
  t.sort((a, b) => a - b);
  return { min: t[0], median: t[Math.floor(t.length / 2)], p95: t[Math.min(t.length - 1, Math.floor(t.length * 0.95))] };
}

export const order = 40;

/** The plan with one fixture nudged along x by `dx` mm (free fixtures) or along its wall. */
function nudge(plan: PlanDocument, id: string, dx: number): PlanDocument {
  return {
    ...plan,
    fixtures: plan.fixtures.map((f) => {
      if (f.id !== id) return f;
      const p = f.placement;
      return { ...f, placement: p.mode === "free" ? { ...p, xMm: p.xMm + dx } : { ...p, offsetMm: p.offsetMm + dx } };
    }),
  };
}

const stats = (t: number[]) => {
  const s = [...t].sort((a, b) => a - b);
  return { min: s[0], median: s[Math.floor(s.length / 2)], p95: s[Math.min(s.length - 1, Math.floor(s.length * 0.95))] };
};

/**
 * Full evaluations at every size, interleaved round by round (300, 600, 300, 600...) so a burst of
 * load on a shared machine falls on both sizes alike and the ratio compares like with like.
 */
function interleaved(cases: { n: number; fn: () => unknown }[], warmup: number, rounds: number): Map<number, { min: number; median: number; p95: number }> {
  for (let i = 0; i < warmup; i++) for (const c of cases) c.fn();
  const times = new Map<number, number[]>(cases.map((c) => [c.n, []]));
  for (let r = 0; r < rounds; r++) {
    for (const c of cases) {
      const s = performance.now();
      c.fn();
      times.get(c.n)!.push(performance.now() - s);
    }
  }
  return new Map([...times].map(([n, t]) => [n, stats(t)]));
}

export function run(): BenchTable[] {
  const rows: (string | number)[][] = [];
  const sizes = [300, 600];
  const plans = new Map(sizes.map((n) => {
    const plan = generatePlan(n, 3);
    return [n, { plan, derived: derivePlan(plan) }];
  }));
  const grid = interleaved(sizes.map((n) => ({ n, fn: () => evaluatePlan(plans.get(n)!.plan, plans.get(n)!.derived) })), 30, 81);
  const naive = interleaved(sizes.map((n) => ({ n, fn: () => evaluatePlan(plans.get(n)!.plan, plans.get(n)!.derived, { cellMm: 1e9 }) })), 3, 11);
  // Cold: a freshly derived plan each time (new objects, as the analyze endpoint has), so no per-fixture memo (solids, zone bounds, kinds, part facts) helps.
  const cold = new Map<number, { min: number; median: number; p95: number }>();
  for (const n of sizes) {
    const { plan } = plans.get(n)!;
    const t: number[] = [];
    for (let i = 0; i < 15; i++) {
      const copy = derivePlan(plan);
      const s = performance.now();
      evaluatePlan(plan, copy);
      t.push(performance.now() - s);
    }
    cold.set(n, stats(t));
  }
  for (const n of sizes) {
    const { plan, derived } = plans.get(n)!;
    const g = grid.get(n)!;
    const a = naive.get(n)!;
    const c = cold.get(n)!;
    const count = evaluatePlan(plan, derived).length;
    rows.push([n, "full evaluation, grid index", fmt(g.min), fmt(g.median), fmt(g.p95), `${count} findings`]);
    rows.push([n, "full evaluation of a freshly derived plan (no memo)", fmt(c.min), fmt(c.median), fmt(c.p95), "derivePlan before each run, outside the timing"]);
    rows.push([n, "full evaluation, all-pairs scan (baseline)", fmt(a.min), fmt(a.median), fmt(a.p95), `grid is ${(a.median / g.median).toFixed(1)}x faster (median)`]);
    // Incremental: a free-standing fixture moves 100 mm and back; derive and check only what changed.
    const moving = plan.fixtures.find((f) => f.placement.mode === "free")!.id;
    const checker = createChecker(plan, derived);
    const there = nudge(plan, moving, 100);
    const dThere = rederiveFixtures(there, derived, [moving]);
    let flip = false;
    const inc = timeIt(
      () => {
        flip = !flip;
        checker.update(flip ? there : plan, flip ? dThere : derived, [moving]);
      },
      { warmup: 30, runs: 61 },
    );
    let flip2 = false;
    let prev = derived;
    const incDerive = timeIt(
      () => {
        flip2 = !flip2;
        const next = flip2 ? there : plan;
        prev = rederiveFixtures(next, prev, [moving]);
        checker.update(next, prev, [moving]);
      },
      { warmup: 10, runs: 31 },
    );
    rows.push([n, "one fixture moved: incremental re-check", fmt(inc.min), fmt(inc.median), fmt(inc.p95), `${checker.lastRechecked().size} fixtures re-checked`]);
    rows.push([n, "one fixture moved: re-derive that fixture + incremental re-check", fmt(incDerive.min), fmt(incDerive.median), fmt(incDerive.p95), ""]);
  }
  const r = (pick: (x: { min: number; median: number }) => number) => pick(grid.get(600)!) / pick(grid.get(300)!);
  return [
    {
      title: "Checks: every rule over a generated shop",
      note: `Goal: full evaluation of 300 fixtures <= 4 ms median; 600 within 2.2x of 300 (this run: ${r((x) => x.median).toFixed(2)}x by median, ${r((x) => x.min).toFixed(2)}x by minimum). The two sizes run interleaved, round by round, so load on a shared machine hits both alike. Times in ms.`,
      columns: ["fixtures", "run", "min ms", "median ms", "p95 ms", "note"],
      rows,
    },
  ];
}
