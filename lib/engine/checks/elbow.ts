/**
 * Standing elbow height estimated from stature, mm: 0.62 x stature. The ratio is the 50th
 * percentile of Pheasant, Bodyspace (men 1090/1755 mm, women 1005/1625 mm; values from memory).
 * Used only when the plan does not give an elbow height.
 */
export function estimateElbowHeightMm(statureMm: number): number {
  return Math.round(statureMm * 0.62);
}
