import { cautionRule } from "../caution-rule";

/** Advice: new circuits and panel work by licensed practice. */
export const electricalWorkRule = cautionRule({
  id: "electrical-work",
  title: "Electrical work",
  protects: "Shop tools draw heavy current; a circuit added or extended without a permit and an inspection is a fire and shock risk.",
  formula: "advice when the plan has an electrical panel or outlets",
  numbers: [],
  sources: [{ citation: "NFPA 70 (NEC) as adopted locally; permits and inspection by the local authority", status: "practice" }],
  cautions: ["Have a licensed electrician add circuits; garage outlets usually need GFCI protection under the adopted code."],
  // The panel and outlets are obstacles, not fixtures: the finding names no fixture.
  plain: true,
  applies: (ctx) => (ctx.plan.room.obstacles.some((o) => o.kind === "panel" || o.kind === "outlet") ? [] : null),
  message: () => "Panel and outlets in this plan: new circuits, GFCI protection and panel work are for a licensed electrician, with a permit where required.",
});
