import type { Material } from "../plan/schema";
import { stiffnessOf } from "./moe";

/** Words in a material's id, species or name that point to a row of the stiffness table (first match wins). */
const GUESSES: [RegExp, string][] = [
  [/mdf/, "mdf-130"],
  [/particle|^pb-/, "particleboard-m2"],
  [/ply/, "plywood"],
  [/white[- ]?oak/, "white-oak"],
  [/oak/, "northern-red-oak"],
  [/pine/, "eastern-white-pine"],
  [/hard[- ]?maple|sugar[- ]?maple/, "sugar-maple"],
  [/maple/, "red-maple"],
  [/poplar/, "yellow-poplar"],
  [/birch/, "yellow-birch"],
  [/fir/, "douglas-fir-coast"],
];

/**
 * The stiffness-table key for a material id: the plan material's species when the table knows it
 * (as written, or with spaces as dashes), else a guess from its id, species and name; plywood when
 * nothing matches. The shelf-run fixture and the shelf-sag check both read it, so they agree.
 */
export function stiffnessKeyFor(materialId: string, materials: readonly Material[]): string {
  const m = materials.find((x) => x.id === materialId);
  if (m?.species) {
    if (stiffnessOf(m.species)) return m.species;
    const dashed = m.species.toLowerCase().replace(/\s+/g, "-");
    if (stiffnessOf(dashed)) return dashed;
  }
  const text = `${materialId} ${m?.species ?? ""} ${m?.name ?? ""}`.toLowerCase();
  for (const [re, key] of GUESSES) if (re.test(text)) return key;
  return "plywood";
}
