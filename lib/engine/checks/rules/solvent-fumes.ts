import type { Part } from "../../fixtures/types";
import { cautionRule } from "../caution-rule";

const LAMINATE = /laminate|contact cement/i;

/** The test per text: parts repeat a few dozen names, materials and joinery notes, so each is tested once. */
const memo = new Map<string, boolean>();
const mentions = (text: string) => {
  let v = memo.get(text);
  if (v === undefined) {
    v = LAMINATE.test(text);
    if (memo.size < 10_000) memo.set(text, v);
  }
  return v;
};
const calls = (p: Part) => mentions(p.name) || mentions(p.materialId) || p.joinery.some(mentions);

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
    const ids = new Set<string>();
    for (const p of ctx.parts) if (calls(p)) ids.add(p.fixtureId);
    for (const h of ctx.hardware) if (mentions(h.name) || mentions(h.key)) ids.add(h.fixtureId);
    return [...ids];
  },
  message: () => "Laminate is glued with contact cement: ventilate the garage, put out pilot lights and other ignition sources while the solvent flashes off.",
});
