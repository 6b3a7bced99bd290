import type { Part } from "../fixtures/types";

/**
 * Length of banded edge on one part, mm, read from its edge words ("front", "both long edges",
 * "all four edges"). Unknown words count as one long edge so banding is not under-bought.
 */
export function bandedLengthMm(p: Pick<Part, "lengthMm" | "widthMm" | "edges">): number {
  let total = 0;
  for (const raw of p.edges) {
    const e = raw.toLowerCase();
    if (/all|four|every/.test(e)) total += 2 * (p.lengthMm + p.widthMm);
    else if (/both (long|sides)/.test(e)) total += 2 * p.lengthMm;
    else if (/both (short|ends)/.test(e)) total += 2 * p.widthMm;
    else if (/short|end/.test(e)) total += p.widthMm;
    else total += p.lengthMm;
  }
  return total;
}
