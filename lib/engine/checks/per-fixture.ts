import type { PlanDocument } from "../plan/schema";
import type { CheckContext } from "./context";
import type { Finding, Rule } from "./types";

/** The evaluate functions of a rule whose findings are each about one fixture: all of them, or only `ids` on an incremental re-check. */
export function perFixture(check: (ctx: CheckContext, ids?: ReadonlySet<string>) => Finding[]): Pick<Rule<CheckContext>, "scope" | "evaluate" | "evaluateFor"> {
  return {
    scope: "fixture",
    evaluate: (_plan: PlanDocument, ctx: CheckContext) => check(ctx),
    evaluateFor: (_plan: PlanDocument, ctx: CheckContext, ids: ReadonlySet<string>) => check(ctx, ids),
  };
}
