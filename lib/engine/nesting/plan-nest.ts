import type { NestOptions } from "./types";

/**
 * How every output of a plan nests its sheets (the sheet maps on screen, the shopping CSV, the
 * build packet): the fixed seed and the default work cap, never the clock, so all of them show the
 * same layout for the same plan.
 */
export function planNestOptions(kerfMm: number, extra: Pick<NestOptions, "offcuts"> = {}): NestOptions {
  return { kerfMm, seed: 1, ...extra };
}
