/**
 * Build suite: labels, setups, stop tables and build order (buildPlan, after one derivePlan) for the demo plan and
 * generated plans of 300 and 600 fixtures (median ms; goal <= 50 ms at 300 fixtures), and the count of cutting
 * setups against the distinct rip widths and crosscut lengths of the parts (fewer setups is better; never more).
 */
import type { BenchTable } from "../bench";
import { buildPlan } from "../../lib/engine/build";
import { sawDims } from "../../lib/engine/build/cut-setups";
import { generatePlan } from "../../lib/engine/demo/generate-plan";
import { demoPlan } from "../../lib/engine/demo/demo-plan";
import { derivePlan } from "../../lib/engine/derive";
import type { PlanDocument } from "../../lib/engine/plan/schema";
import { fmt, timeIt } from "./timing";

export const order = 45;

export function run(): BenchTable[] {
  const plans: [string, PlanDocument][] = [
    ["demo", demoPlan()],
    ["generated 300", generatePlan(300, 42)],
    ["generated 600", generatePlan(600, 42)],
  ];
  const rows: (string | number)[][] = [];
  for (const [name, plan] of plans) {
    const d = derivePlan(plan);
    const t = timeIt(() => buildPlan(plan, d), { warmup: 3, runs: 15 });
    const b = buildPlan(plan, d);
    const mats = new Map(plan.materials.map((m) => [m.id, m]));
    const ripW = new Set<string>();
    const crossL = new Set<string>();
    for (const r of b.rows) {
      const s = sawDims(r, mats);
      if (s.ripMm !== null) ripW.add(s.ripMm.toFixed(1));
      crossL.add(s.crossMm.toFixed(1));
    }
    const rips = b.setups.filter((s) => s.kind === "rip").length;
    const cross = b.setups.filter((s) => s.kind === "crosscut").length;
    rows.push([name, plan.fixtures.length, d.parts.length, b.rows.length, fmt(t.median), fmt(t.p95), `${rips} / ${ripW.size}`, `${cross} / ${crossL.size}`, rips + cross <= ripW.size + crossL.size ? "yes" : "NO", b.setups.length - rips - cross, b.steps.length]);
  }
  return [
    {
      title: "Build: labels, setups, stop tables and build order",
      note: "buildPlan after one derivePlan (not timed). Median / p95 in ms; goal <= 50 ms at 300 fixtures. Setups against distinct sizes (to 0.1 mm): sizes that read the same on the plan's tape share one setup, so setups can only be fewer.",
      columns: ["plan", "fixtures", "part lines", "cut-list rows", "median (ms)", "p95 (ms)", "rip setups / distinct rip widths", "crosscut setups / distinct lengths", "within widths + lengths", "joinery setups", "steps"],
      rows,
    },
  ];
}
