import { cautionRule } from "../caution-rule";
import { isSaw } from "../kinds";

/** Advice: saw guards and no automatic restart after a power cut. */
export const sawGuardingRule = cautionRule({
  id: "saw-guarding",
  title: "Saw guards and no automatic restart",
  protects: "A saw that restarts by itself when the power returns can catch a hand clearing a jam; a missing guard leaves the blade exposed.",
  formula: "advice when the plan has a saw or another machine on a tool shelf or mobile base",
  numbers: [],
  sources: [
    { citation: "OSHA 29 CFR 1910.213(b)(3): no automatic restart of woodworking machines after a power failure", status: "published" },
    { citation: "Washington WAC 296-806-48028: miter saw upper hood and self-retracting lower guard", status: "published" },
  ],
  cautions: ["Keep the guards on; use a magnetic (no-volt) switch or a switched outlet that does not restart after a power cut."],
  applies: (ctx) => ctx.fixtures.filter(isSaw).map((f) => f.id),
  message: () =>
    "Saws and other machines in this plan: keep the upper hood and self-retracting lower guard working, and power them so they do not restart by themselves after a power cut (OSHA 1910.213(b)(3)).",
});
