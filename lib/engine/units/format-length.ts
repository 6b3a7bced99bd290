import { mixedToText, roundToFraction } from "./fraction";
import { MM_PER_FOOT, MM_PER_INCH } from "./length";
import type { InchPrecision, LengthUnits } from "./length";

export interface FormatLengthOptions {
  units: LengthUnits;
  /** Denominator for inch fractions (16 or 32); ignored for mm. Default 16. */
  precision?: InchPrecision;
  /** Append the unit mark (" or ' or mm). Default true. */
  unitMark?: boolean;
}

/** Millimetres rounded to at most one decimal, trailing zeros dropped: "606.4", "606". */
export function formatMmNumber(valueMm: number, decimals = 1): string {
  const f = 10 ** decimals;
  const r = Math.round(valueMm * f) / f;
  const out = (Object.is(r, -0) ? 0 : r).toFixed(decimals);
  return out.includes(".") ? out.replace(/\.?0+$/, "") : out;
}

/**
 * Format a length in mm for people: inches with a reduced fraction ("23 7/8\"", carrying to
 * "24\""), feet and inches ("2' 3 1/2\""), or millimetres ("606.4 mm").
 */
export function formatLength(valueMm: number, options: FormatLengthOptions): string {
  const mark = options.unitMark ?? true;
  if (options.units === "mm") return `${formatMmNumber(valueMm)}${mark ? " mm" : ""}`;
  const precision = options.precision ?? 16;
  if (options.units === "in") {
    return `${mixedToText(roundToFraction(valueMm / MM_PER_INCH, precision))}${mark ? '"' : ""}`;
  }
  // Feet and inches: round the whole length to the fraction first so that 1' 11 31/32" carries to 2' 0".
  const steps = Math.round((Math.abs(valueMm) / MM_PER_INCH) * precision);
  const sign = valueMm < 0 && steps !== 0 ? "-" : "";
  const perFoot = 12 * precision;
  const feet = Math.floor(steps / perFoot);
  const inch = roundToFraction((steps - feet * perFoot) / precision, precision);
  const inchText = mixedToText(inch);
  if (feet === 0) return `${sign}${inchText}${mark ? '"' : ""}`;
  // Trade habit: keep the zero inches after feet (20' 0 3/16", not 20' 3/16").
  const afterFeet = inch.whole === 0 && inch.num !== 0 ? `0 ${inchText}` : inchText;
  return `${sign}${feet}' ${afterFeet}${mark ? '"' : ""}`;
}

/** Format an area given in mm² : square feet with one decimal for inch users, square metres with two decimals for mm users. */
export function formatArea(areaMm2: number, options: { units: LengthUnits }): string {
  if (options.units === "mm") return `${formatMmNumber(areaMm2 / 1e6, 2)} m²`;
  return `${formatMmNumber(areaMm2 / (MM_PER_FOOT * MM_PER_FOOT), 1)} sq ft`;
}

/**
 * Format a length per length (a slope or a sag rate, mm per mm): inches per foot with three
 * decimals for inch users, millimetres per metre with one decimal for mm users.
 */
export function formatLengthPerLength(ratio: number, options: { units: LengthUnits }): string {
  if (options.units === "mm") return `${formatMmNumber(ratio * 1000, 1)} mm/m`;
  return `${formatMmNumber(ratio * 12, 3)} in/ft`;
}

/** The smallest step formatLength shows, mm: 1/16 or 1/32 in, or 0.1 mm. */
export function displayStepMm(options: { units: LengthUnits; precision?: InchPrecision }): number {
  return options.units === "mm" ? 0.1 : MM_PER_INCH / (options.precision ?? 16);
}
