import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { planBoards } from "@/lib/engine/boards/plan-boards";
import { analyzePlan } from "@/lib/engine/checks/analyze";
import { deriveWithNotes } from "@/lib/engine/derive";
import { nestSheets } from "@/lib/engine/nesting/nest-sheets";
import { planPartsList } from "@/lib/engine/parts";
import { PLAN_LIMITS } from "@/lib/engine/plan/limits";
import { parsePlan } from "@/lib/engine/plan/parse";
import { partsCsv, shoppingCsv } from "@/lib/engine/shopping/csv";
import { DEFAULT_PRICE_LIST } from "@/lib/engine/shopping/default-prices";
import { buildShoppingList } from "@/lib/engine/shopping/shopping-list";
import { planArb } from "./plan-arbitrary";

/** A work budget smaller than the default keeps the runs quick; the code path is the same. */
const NEST_WORK = 1_500_000;
const BOARD_WORK = 500_000;
const NEST_ATTEMPTS = 40;

describe("every plan the schema accepts finishes within a fixed work budget", () => {
  it(
    "derive, checks, parts, sheet nesting, board plan, shopping list and both CSVs stay bounded",
    () => {
      const heap0 = process.memoryUsage().heapUsed;
      let fixtures = 0;
      let withParams = 0;
      fc.assert(
        fc.property(planArb(12), (input) => {
          const parsed = parsePlan(input);
          if (!parsed.ok) throw new Error(`the schema refused a generated plan: ${JSON.stringify(parsed.issues.slice(0, 3))}`);
          const plan = parsed.plan;
          fixtures += plan.fixtures.length;
          withParams += (input.fixtures ?? []).filter((f) => Object.keys(f.params ?? {}).length > 0).length;
          const { derived } = deriveWithNotes(plan);
          const pieces = derived.parts.reduce((s, p) => s + p.qty, 0);
          expect(pieces).toBeLessThanOrEqual(PLAN_LIMITS.pieces);
          expect(derived.fixtures.length).toBeLessThanOrEqual(plan.fixtures.length);

          const analysis = analyzePlan(plan, derived);
          expect(analysis.findings.length).toBeLessThanOrEqual(PLAN_LIMITS.analysisFindings);
          // The answer grows with the plan, not with its numbers: a loose bound per fixture and per zone.
          expect(JSON.stringify(analysis).length).toBeLessThan(200_000 + 50_000 * plan.fixtures.length);

          const list = planPartsList(derived);
          expect(list.partCount).toBe(pieces);

          const nest = nestSheets(derived.parts, plan.materials, { kerfMm: plan.settings.kerfMm, seed: 1, maxWork: NEST_WORK, maxAttempts: NEST_ATTEMPTS });
          // One charge may overshoot the budget; the next-fit stand-in is counted as one more attempt.
          expect(nest.work).toBeLessThanOrEqual(NEST_WORK + 100_000);
          for (const m of nest.materials) expect(m.attempts).toBeLessThanOrEqual(NEST_ATTEMPTS + 1);
          const placed = nest.materials.reduce((s, m) => s + m.sheets.reduce((a, sh) => a + sh.placements.length, 0), 0);
          expect(placed).toBeLessThanOrEqual(PLAN_LIMITS.pieces);

          const boards = planBoards(derived.parts, plan.materials, { kerfMm: plan.settings.kerfMm, maxWork: BOARD_WORK });
          const boardCount = boards.groups.reduce((s, g) => s + g.boards.length, 0);
          expect(boardCount).toBeLessThanOrEqual(pieces);

          const shopping = buildShoppingList({ parts: derived.parts, hardware: derived.hardware, sheets: nest.materials, boards, materials: plan.materials }, DEFAULT_PRICE_LIST.items);
          expect(Number.isFinite(shopping.totalCents)).toBe(true);
          const csv1 = partsCsv(derived.parts, plan.materials, plan.settings);
          const csv2 = shoppingCsv(shopping);
          expect(csv1.length).toBeLessThan(2000 * (derived.parts.length + 1));
          expect(csv2.length).toBeLessThan(1000 * (shopping.lines.length + shopping.totals.length + 2));
          expect(process.memoryUsage().heapUsed - heap0).toBeLessThan(1.5e9);
        }),
        { seed: 20261202, numRuns: 25, endOnFailure: true },
      );
      // Most fixtures carry generated parameters (extremes included), not just their defaults.
      expect(withParams / fixtures).toBeGreaterThan(0.5);
    },
    120_000,
  );
});
