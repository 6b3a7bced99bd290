/**
 * Standing elbow height over stature at the 50th percentile, from Pheasant, Bodyspace (values from
 * memory): men 1090 / 1755 mm = 0.621, women 1005 / 1625 mm = 0.618. Pooled, rounded: 0.62.
 */
export const ELBOW_TO_STATURE = { men: 1090 / 1755, women: 1005 / 1625, pooled: 0.62 } as const;

export type ElbowPopulation = keyof typeof ELBOW_TO_STATURE;

/** An elbow height, mm, saying whether it was measured or estimated and on what it rests. */
export interface ElbowHeight {
  valueMm: number;
  estimated: boolean;
  source: string;
}

const ESTIMATE_SOURCE =
  "Estimated from stature: 0.62 x stature, the 50th-percentile ratio of standing elbow height to stature in Pheasant, Bodyspace (men 1090/1755 mm, women 1005/1625 mm; values from memory). Measure your own elbow height for a better fit.";

/** Standing elbow height estimated from stature, mm (whole mm); an estimate, good to a few centimetres. */
export function estimateElbowHeightMm(statureMm: number, population: ElbowPopulation = "pooled"): number {
  return Math.round(statureMm * ELBOW_TO_STATURE[population]);
}

/** The user's elbow height, mm: as measured when given, otherwise estimated from stature (and labelled so). */
export function elbowHeight(settings: { userHeightMm: number; elbowHeightMm?: number }): ElbowHeight {
  if (settings.elbowHeightMm !== undefined) return { valueMm: settings.elbowHeightMm, estimated: false, source: "Measured: the elbow height in the plan's settings." };
  return { valueMm: estimateElbowHeightMm(settings.userHeightMm), estimated: true, source: ESTIMATE_SOURCE };
}
