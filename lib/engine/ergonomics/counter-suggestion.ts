import type { ElbowHeight } from "./elbow";

/**
 * Where standing work wants a surface relative to the elbow, mm below it: light work 10-15 cm,
 * heavy work 15-40 cm (Grandjean, Fitting the Task to the Man). A class preset may change them.
 */
export interface CounterBands {
  lightWorkBelowElbowMinMm: number;
  lightWorkBelowElbowMaxMm: number;
  heavyWorkBelowElbowMaxMm: number;
}

export const GRANDJEAN_BANDS: Readonly<CounterBands> = Object.freeze({ lightWorkBelowElbowMinMm: 100, lightWorkBelowElbowMaxMm: 150, heavyWorkBelowElbowMaxMm: 400 });

/** A counter height weighed against the person's elbow: both ranges, where the counter sits, and a height to try. */
export interface CounterSuggestion {
  elbowMm: number;
  estimated: boolean;
  /** Light and heavy work, floor to the top of the surface, mm. */
  light: { minMm: number; maxMm: number };
  heavy: { minMm: number; maxMm: number };
  /** Where light and heavy work meet, rounded up to a step a person types (1/4 in or 5 mm): suits light work, a hair above heavy. */
  suggestedMm: number;
  /** "36 in is in the heavy-work range and 15/16 in below light work." */
  verdict: string;
  /** "Your elbow: 42 7/8 in (estimated from your stature). Light work 37 in to 38 7/8 in; heavy work 27 in to 37 in." */
  ranges: string;
}

/** Tolerance on the band edges, mm, as in the counter-height check. */
const EDGE_MM = 0.5;

/** Where a counter sits against the ranges, in one sentence with numbers (lengths through `len`). */
export function counterVerdict(counterMm: number, light: { minMm: number; maxMm: number }, heavy: { minMm: number; maxMm: number }, len: (mm: number) => string): string {
  const at = len(counterMm);
  const inLight = counterMm >= light.minMm - EDGE_MM && counterMm <= light.maxMm + EDGE_MM;
  const inHeavy = counterMm >= heavy.minMm - EDGE_MM && counterMm <= heavy.maxMm + EDGE_MM;
  if (inLight && inHeavy) return `${at} is where the light-work and heavy-work ranges meet: it suits both.`;
  if (inLight) return `${at} is in the light-work range and ${len(counterMm - heavy.maxMm)} above heavy work.`;
  if (inHeavy) return `${at} is in the heavy-work range and ${len(light.minMm - counterMm)} below light work.`;
  if (counterMm > light.maxMm) return `${at} is ${len(counterMm - light.maxMm)} above the light-work range: too high for standing work.`;
  return `${at} is ${len(heavy.minMm - counterMm)} below the heavy-work range: too low for standing work.`;
}

/**
 * A counter height (mm) against the person's elbow height: the light and heavy work ranges with
 * numbers, where the counter sits, and a height to try. `len` formats a length in the plan's units;
 * `stepMm` is the rounding step of the suggestion (1/4 in or 5 mm).
 */
export function counterHeightSuggestion(counterMm: number, elbow: ElbowHeight, len: (mm: number) => string, stepMm: number, bands: CounterBands = GRANDJEAN_BANDS): CounterSuggestion {
  const e = elbow.valueMm;
  const light = { minMm: e - bands.lightWorkBelowElbowMaxMm, maxMm: e - bands.lightWorkBelowElbowMinMm };
  const heavy = { minMm: e - bands.heavyWorkBelowElbowMaxMm, maxMm: e - bands.lightWorkBelowElbowMaxMm };
  const suggestedMm = Math.min(light.maxMm, Math.ceil((light.minMm - 1e-6) / stepMm) * stepMm);
  const how = elbow.estimated ? " (estimated from your stature)" : "";
  return {
    elbowMm: e,
    estimated: elbow.estimated,
    light,
    heavy,
    suggestedMm,
    verdict: counterVerdict(counterMm, light, heavy, len),
    ranges: `Your elbow: ${len(e)}${how}. Light work ${len(light.minMm)} to ${len(light.maxMm)}; heavy work ${len(heavy.minMm)} to ${len(heavy.maxMm)}.`,
  };
}
