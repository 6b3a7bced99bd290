import type { CheckContext } from "./context";
import { finding } from "./finding";
import type { Rule, RuleSource } from "./types";

/** A plan-wide advice rule: one finding when `applies` picks something in the plan. */
export function cautionRule(def: {
  id: string;
  title: string;
  protects: string;
  formula: string;
  numbers: { label: string; value: string }[];
  sources: RuleSource[];
  cautions: string[];
  /** Fixture ids the caution is about; null, or an empty list unless `plain` is set, means it does not apply. */
  applies(ctx: CheckContext): string[] | null;
  /** Applies with an empty list too (the hazard is in the room, not in a fixture). */
  plain?: boolean;
  message(ctx: CheckContext, fixtureIds: string[]): string;
}): Rule<CheckContext> {
  return {
    id: def.id,
    title: def.title,
    protects: def.protects,
    formula: def.formula,
    numbers: def.numbers,
    sources: def.sources,
    severity: "advice",
    cautions: def.cautions,
    scope: "plan",
    evaluate(_plan, ctx) {
      const ids = def.applies(ctx);
      if (!ids || (!ids.length && !def.plain)) return [];
      return [finding(def.id, "advice", false, def.id, `${def.message(ctx, ids)} Local codes and licensed practice come first.`, { fixtureIds: ids })];
    },
  };
}
