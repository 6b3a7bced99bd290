import { cautionRule } from "../caution-rule";
import { laminateHardware, partFacts } from "../part-facts";

/** Advice: ventilate when gluing laminate with solvent contact cement. */
export const solventFumesRule = cautionRule({
  id: "solvent-fumes",
  title: "Contact cement fumes",
  protects: "Solvent contact cement gives off vapour that builds up in a closed garage and can ignite from a water heater's pilot or a tool's motor.",
  formula: "advice when a part or hardware item calls for laminate or contact cement",
  numbers: [],
  sources: [
    { citation: "Ontario Ministry of Labour hazard alert on contact cement vapours", status: "published" },
    { citation: "CPSC 16 CFR 1302 (extremely flammable contact adhesives)", status: "published" },
  ],
  cautions: ["Open the big door, run a fan blowing out, put out pilot lights and unplug tools; or use a water-based contact cement."],
  applies: (ctx) => {
    const ids = laminateHardware(ctx.hardware);
    for (const f of partFacts(ctx.parts)) if (f.laminate) ids.add(f.fixtureId);
    return [...ids];
  },
  message: () => "Laminate is glued with contact cement: ventilate the garage, put out pilot lights and other ignition sources while the solvent flashes off.",
});
