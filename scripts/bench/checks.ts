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

export function run(): BenchTable[] {
  const rows: (string | number)[][] = [];
  const medians = new Map<number, number>();
  const mins = new Map<number, number>();
  for (const n of [300, 600]) {
    const plan = generatePlan(n, 3);
    const derived = derivePlan(plan);
    const grid = timeIt(() => evaluatePlan(plan, derived), { warmup: 30, runs: 61 });
    const naive = timeIt(() => evaluatePlan(plan, derived, { cellMm: 1e9 }), { warmup: 3, runs: 11 });
    medians.set(n, grid.median);
    mins.set(n, grid.min);
    const count = evaluatePlan(plan, derived).length;
    rows.push([n, "full evaluation, grid index", fmt(grid.min), fmt(grid.median), fmt(grid.p95), `${count} findings`]);
    rows.push([n, "full evaluation, all-pairs scan (baseline)", fmt(naive.min), fmt(naive.median), fmt(naive.p95), `grid is ${(naive.min / grid.min).toFixed(1)}x faster (min)`]);
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
  const ratio = (medians.get(600) ?? 0) / (medians.get(300) ?? 1);
  const ratioMin = (mins.get(600) ?? 0) / (mins.get(300) ?? 1);
  return [
    {
      title: "Checks: every rule over a generated shop",
      note: `Goal: full evaluation of 300 fixtures <= 4 ms median; 600 within 2.2x of 300 (this run: ${ratio.toFixed(2)}x by median, ${ratioMin.toFixed(2)}x by minimum). Times in ms; on a shared machine the minimum is the steadier figure.`,
      columns: ["fixtures", "run", "min ms", "median ms", "p95 ms", "note"],
      rows,
    },
  ];
}
