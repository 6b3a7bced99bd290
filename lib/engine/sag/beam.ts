/**
 * Simple-beam deflection in inch-pound units (AWC Design Aid No. 6, Beam Design Formulas, 2007:
 * fig. 1 uniform load, fig. 7 concentrated load at centre). The sag module converts at its edges.
 */

/** Second moment of area of a rectangle, in^4: b h^3 / 12 (b = width across the span, h = thickness). */
export function rectSecondMomentIn4(widthIn: number, thicknessIn: number): number {
  return (widthIn * thicknessIn ** 3) / 12;
}

/** Mid-span deflection under a uniform load, in: 5 w L^4 / (384 E I); w in lb/in, L in in, E in psi, I in in^4. */
export function uniformLoadDeflectionIn(wLbPerIn: number, spanIn: number, moePsi: number, iIn4: number): number {
  return (5 * wLbPerIn * spanIn ** 4) / (384 * moePsi * iIn4);
}

/** Mid-span deflection under a point load at the centre, in: P L^3 / (48 E I); P in lb. */
export function centreLoadDeflectionIn(pLb: number, spanIn: number, moePsi: number, iIn4: number): number {
  return (pLb * spanIn ** 3) / (48 * moePsi * iIn4);
}
