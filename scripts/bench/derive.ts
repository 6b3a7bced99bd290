/**
 * Derive suite: the full derivePlan (room, placement, zones, parts, hardware) for generated plans of 50, 300 and
 * 600 fixtures, cold (a fresh copy of the plan each run, nothing reused) and warm (the same plan objects, so each
 * fixture's layout is reused as in the editor), with the 600/300 ratio (near 2 means linear); the incremental
 * re-derive after moving one fixture; and the plan-level parts list grouping.
 */
import type { BenchTable } from "../bench";
import { generatePlan } from "../../lib/engine/demo/generate-plan";
import { derivePlan, rederiveFixtures } from "../../lib/engine/derive";
import { planPartsList } from "../../lib/engine/parts";
import type { PlanDocument } from "../../lib/engine/plan/schema";
import { fmt, timeIt } from "./timing";

export const order = 30;

/** The plan with its first free fixture moved by 100 mm, and that fixture's id. */
function nudged(plan: PlanDocument): { plan: PlanDocument; id: string } {
  const i = plan.fixtures.findIndex((f) => f.placement.mode === "free");
  const f = plan.fixtures[i];
  if (f.placement.mode !== "free") return { plan, id: f.id };
  const moved = { ...f, placement: { ...f.placement, xMm: f.placement.xMm + 100 } };
  return { plan: { ...plan, fixtures: plan.fixtures.map((x, k) => (k === i ? moved : x)) }, id: f.id };
}

export function run(): BenchTable[] {
  const sizes = [50, 300, 600];
  const rows: (string | number)[][] = [];
  const medians = new Map<number, number>();
  const incRows: (string | number)[][] = [];
  for (const n of sizes) {
    const plan = generatePlan(n, 42);
    const d = derivePlan(plan);
    const runs = n >= 300 ? 9 : 15;
    const copies = Array.from({ length: runs + 2 }, () => JSON.parse(JSON.stringify(plan)) as PlanDocument);
    let k = 0;
    const cold = timeIt(() => derivePlan(copies[k++]), { warmup: 2, runs });
    const warm = timeIt(() => derivePlan(plan), { warmup: 2, runs: 15 });
    medians.set(n, cold.median);
    const list = timeIt(() => planPartsList(d), { warmup: 2, runs: 15 });
    rows.push([n, d.parts.length, d.zones.length, fmt(cold.median), fmt(cold.p95), fmt(warm.median), fmt(list.median)]);
    const { plan: moved, id } = nudged(plan);
    const inc = timeIt(() => rederiveFixtures(moved, d, [id]), { warmup: 2, runs: 15 });
    const movedCopies = Array.from({ length: 10 }, () => JSON.parse(JSON.stringify(moved)) as PlanDocument);
    let m = 0;
    const fullMoved = timeIt(() => derivePlan(movedCopies[m++]), { warmup: 1, runs: 9 });
    incRows.push([n, fmt(inc.median), fmt(fullMoved.median), (fullMoved.median / inc.median).toFixed(1)]);
  }
  const ratio = (medians.get(600)! / medians.get(300)!).toFixed(2);
  return [
    {
      title: "Derive: full plan (placement, zones, parts, hardware)",
      note: `Generated plans (seed 42): about 40% base-cabinet runs with tool shelves and stop tracks on the walls, the rest free-standing. Median / p95 in ms. 600/300 ratio of cold medians: ${ratio} (2.00 = linear).`,
      columns: ["fixtures", "part lines", "zones", "cold median (ms)", "cold p95 (ms)", "warm median (ms)", "parts list grouping (ms)"],
      rows,
    },
    {
      title: "Derive: incremental after moving one fixture",
      note: "rederiveFixtures reuses the room, obstacles and unchanged fixtures; compared with a cold full derive of the same moved plan.",
      columns: ["fixtures", "incremental median (ms)", "cold full median (ms)", "speed-up (x)"],
      rows: incRows,
    },
  ];
}
