import type { Material } from "../plan/schema";
import { stiffnessOf } from "../sag/moe";

const GUESSES: [RegExp, string][] = [
  [/mdf/, "mdf-130"],
  [/particle/, "particleboard-m2"],
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

/** The stiffness-table key for a material id (and its entry in the plan, if any); plywood when nothing matches. */
export function stiffnessKeyFor(materialId: string, materials: readonly Material[]): string {
  const m = materials.find((x) => x.id === materialId);
  if (m?.species && stiffnessOf(m.species)) return m.species;
  const text = `${materialId} ${m?.species ?? ""} ${m?.name ?? ""}`.toLowerCase();
  for (const [re, key] of GUESSES) if (re.test(text)) return key;
  return "plywood";
}
