import { cautionRule } from "../caution-rule";
import { isSaw } from "../kinds";

/** Advice: wood dust limits and collection. */
export const dustRule = cautionRule({
  id: "wood-dust",
  title: "Wood dust",
  protects: "Fine wood dust irritates the lungs and eyes and some species sensitise; hardwood dust is a recognised carcinogen.",
  formula: "advice when the plan has a saw",
  numbers: [
    { label: "NIOSH REL", value: "1 mg/m3 (10-hour TWA)" },
    { label: "ACGIH TLV", value: "1 mg/m3 inhalable (western red cedar 0.5)" },
    { label: "OSHA PEL", value: "nuisance dust only: 15 mg/m3 total, 5 mg/m3 respirable" },
  ],
  sources: [
    { citation: "OSHA wood dust safety and health topic page; 29 CFR 1910.1000 Table Z-1", status: "published" },
    { citation: "NIOSH REL and ACGIH TLV for wood dust, as quoted there", status: "published" },
  ],
  cautions: ["Collect dust at the tool, wear a fitted respirator for sanding, and clean with a vacuum, not a broom or compressed air."],
  applies: (ctx) => ctx.fixtures.filter(isSaw).map((f) => f.id),
  message: () => "Saws make fine dust: connect dust collection at each tool and wear a fitted respirator for sanding (NIOSH REL 1 mg/m3).",
});
