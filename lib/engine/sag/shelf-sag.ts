import { MM_PER_INCH } from "../units/length";
import { centreLoadDeflectionIn, rectSecondMomentIn4, uniformLoadDeflectionIn } from "./beam";
import { stiffnessOf } from "./moe";

/** Sag allowed at first, in per foot of span (woodworking practice). */
export const SAG_LIMIT_IN_PER_FT = 0.02;
/** Sag an eye sees, in per foot of span (woodworking practice). */
export const SAG_VISIBLE_IN_PER_FT = 1 / 32;
/** Long-term (creep) factor for seasoned wood (AWC NDS 3.5.2). */
export const LONG_TERM_FACTOR = 1.5;
/** Tabulated MOE includes shear deflection; add about 10% to remove it (Wood Handbook, note to Table 5-3). */
export const SHEAR_ALLOWANCE = 0.1;

export interface ShelfSagInput {
  /** Clear span between supports, mm. */
  spanMm: number;
  /** Shelf depth (the beam's width), mm. */
  depthMm: number;
  thicknessMm: number;
  /** Key in the stiffness table, e.g. "northern-red-oak". */
  stiffnessKey: string;
  /** Uniform load, lb per running foot of shelf (books: about 20, practice). */
  uniformLbPerFt?: number;
  /** Point load at mid-span, lb. */
  centreLoadLb?: number;
  /** Raise the tabulated MOE by 10% to remove shear deflection (the handbook's note); off = conservative. */
  removeShear?: boolean;
  /** Multiply by 1.5 for long-term load (NDS 3.5.2). */
  longTerm?: boolean;
}

export type SagVerdict = "ok" | "marginal" | "visible";

export interface ShelfSagResult {
  deflectionIn: number;
  deflectionMm: number;
  /** Sag per foot of span, in/ft, compared with the practice limits. */
  inPerFt: number;
  limitIn: number;
  visibleIn: number;
  moePsi: number;
  iIn4: number;
  verdict: SagVerdict;
}

/** Mid-span sag of a simply supported shelf under its loads, mm and in (superposition of the two load cases). */
export function shelfSag(input: ShelfSagInput): ShelfSagResult {
  const row = stiffnessOf(input.stiffnessKey);
  if (!row) throw new Error(`Unknown stiffness key: ${input.stiffnessKey}`);
  const moePsi = row.moePsi * (input.removeShear && row.includesShear ? 1 + SHEAR_ALLOWANCE : 1);
  const spanIn = input.spanMm / MM_PER_INCH;
  const iIn4 = rectSecondMomentIn4(input.depthMm / MM_PER_INCH, input.thicknessMm / MM_PER_INCH);
  const w = (input.uniformLbPerFt ?? 0) / 12;
  let d = uniformLoadDeflectionIn(w, spanIn, moePsi, iIn4) + centreLoadDeflectionIn(input.centreLoadLb ?? 0, spanIn, moePsi, iIn4);
  if (input.longTerm) d *= LONG_TERM_FACTOR;
  const feet = spanIn / 12;
  const limitIn = SAG_LIMIT_IN_PER_FT * feet;
  const visibleIn = SAG_VISIBLE_IN_PER_FT * feet;
  const verdict: SagVerdict = d <= limitIn ? "ok" : d <= visibleIn ? "marginal" : "visible";
  return { deflectionIn: d, deflectionMm: d * MM_PER_INCH, inPerFt: feet > 0 ? d / feet : 0, limitIn, visibleIn, moePsi, iIn4, verdict };
}

/** Longest span, mm (to 1 mm), whose sag stays within the 0.02 in/ft practice limit for the given shelf and loads. */
export function maxSpanWithinLimitMm(input: Omit<ShelfSagInput, "spanMm">, upToMm = 3000): number {
  let lo = 0;
  let hi = upToMm;
  if (shelfSag({ ...input, spanMm: hi }).verdict === "ok") return hi;
  while (hi - lo > 1) {
    const mid = (lo + hi) / 2;
    if (shelfSag({ ...input, spanMm: mid }).verdict === "ok") lo = mid;
    else hi = mid;
  }
  return Math.floor(lo);
}
