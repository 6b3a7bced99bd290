import { MAX_LENGTH_MM, MM_PER_FOOT, MM_PER_INCH, mm } from "./length";
import type { LengthUnits, Mm } from "./length";

/** What a person typed, read as a length: millimetres, or a message saying what was wrong. Never throws. */
export type ParseLengthResult = { ok: true; mm: Mm; readAs: LengthUnits } | { ok: false; message: string };

export interface ParseLengthOptions {
  /** The user's units: bare numbers are inches for "in" and "ft-in", millimetres for "mm". */
  units: LengthUnits;
  /** Accept 0 (offsets, elevations). Default false: a length must be greater than zero. */
  allowZero?: boolean;
  /** Accept a leading minus (positions along a wall). Default false. */
  allowNegative?: boolean;
  /** Largest accepted length, mm. Default 100 m. */
  maxMm?: number;
}

type NumberRead = { ok: true; value: number; fraction: boolean } | { ok: false; message: string };

const EXAMPLES = `Try 23 7/8, 23-7/8", 2' 3-1/2", 606.4 mm or 60.6 cm.`;
const DECIMAL = /^(\d+(?:\.\d*)?|\.\d+)$/;
const FRACTION = /^(\d+)\s*\/\s*(\d+)$/;
const MIXED = /^(\d+)(?:\s+|\s*-\s*)(\d+)\s*\/\s*(\d+)$/;
const METRIC = /^(.*?)\s*(mm|millimet(?:er|re)s?|cm|centimet(?:er|re)s?|m|met(?:er|re)s?)$/;
const METRIC_FACTOR: Record<string, number> = { mm: 1, cm: 10, m: 1000 };
const FEET_MARK = /'|(?<![a-z])(?:ft|feet|foot)(?![a-z])/;
const INCH_MARK_END = /\s*(?:"|(?<![a-z])(?:in|inch|inches)(?![a-z])\.?)$/;
const INCH_MARK_ANY = /"|(?<![a-z])(?:in|inch|inches)(?![a-z])/;
const VULGAR: Record<string, string> = { "½": "1/2", "¼": "1/4", "¾": "3/4", "⅛": "1/8", "⅜": "3/8", "⅝": "5/8", "⅞": "7/8" };

/** Unify the marks people type: curly quotes and primes, two apostrophes for inches, dashes, vulgar fractions. */
function normalize(text: string): string {
  let s = text.trim().toLowerCase();
  s = s.replace(/[″“”]/g, '"').replace(/[′‘’`´]/g, "'").replace(/''/g, '"');
  s = s.replace(/[‐‑–—−]/g, "-").replace(/⁄/g, "/");
  s = s.replace(/[½¼¾⅛⅜⅝⅞]/g, (c) => ` ${VULGAR[c]}`);
  return s.replace(/\s+/g, " ").trim();
}

/** Read a decimal, a fraction or a mixed number ("23 7/8", "23-7/8"). */
function readNumber(raw: string): NumberRead {
  const s = raw.trim();
  if (s === "") return { ok: false, message: `Enter a number. ${EXAMPLES}` };
  if (DECIMAL.test(s)) return { ok: true, value: Number(s), fraction: false };
  const f = FRACTION.exec(s) ?? MIXED.exec(s);
  if (f) {
    const [whole, num, den] = f.length === 4 ? [Number(f[1]), Number(f[2]), Number(f[3])] : [0, Number(f[1]), Number(f[2])];
    if (den === 0) return { ok: false, message: "A fraction cannot have 0 below the slash." };
    return { ok: true, value: whole + num / den, fraction: true };
  }
  if (s.includes("//")) return { ok: false, message: "Two slashes in a row: write a fraction with one, like 7/8." };
  if ((s.match(/\//g) ?? []).length > 1) return { ok: false, message: "Too many slashes: write one fraction, like 23 7/8." };
  if (/\d\.\d*\s*\/|\/\s*\d*\.\d/.test(s)) return { ok: false, message: "Use whole numbers in a fraction, like 7/8, or a decimal like 0.875." };
  if (/\/\s*$/.test(s)) return { ok: false, message: "A fraction needs a number below the slash, like 7/8." };
  if (/^\//.test(s)) return { ok: false, message: "A fraction needs a number above the slash, like 7/8." };
  if (/\d\.\d*\./.test(s)) return { ok: false, message: "A number can have only one decimal point." };
  return { ok: false, message: `Could not read "${raw.trim()}" as a length. ${EXAMPLES}` };
}

/** Millimetres from a metric entry such as "606.4 mm", "60.64cm", "0.6064 m"; null when there is no metric unit. */
function readMetric(s: string): { ok: true; value: number } | { ok: false; message: string } | null {
  const m = METRIC.exec(s);
  if (!m) return null;
  const unit = m[2].startsWith("mm") || m[2].startsWith("milli") ? "mm" : m[2].startsWith("c") ? "cm" : "m";
  if (!DECIMAL.test(m[1].trim())) {
    if (m[1].trim() === "") return { ok: false, message: `Put a number before ${unit}, like 606.4 ${unit}.` };
    if (/['"]/.test(m[1])) return { ok: false, message: "Use either inches and feet or metric units, not both." };
    return { ok: false, message: `Write ${unit === "mm" ? "millimetres" : unit === "cm" ? "centimetres" : "metres"} as a decimal number, like 606.4 mm.` };
  }
  return { ok: true, value: Number(m[1].trim()) * METRIC_FACTOR[unit] };
}

/** Read an inch or feet-and-inch entry: 23 7/8, 23-7/8", 2' 3-1/2", 2ft 3.5in, 1'6. */
function readImperial(s: string, units: LengthUnits): { ok: true; value: number; readAs: LengthUnits } | { ok: false; message: string } {
  let feetText: string | null = null;
  let rest = s;
  const fm = FEET_MARK.exec(s);
  if (fm) {
    feetText = s.slice(0, fm.index).trim();
    rest = s.slice(fm.index + fm[0].length).trim().replace(/^-\s*/, "");
    if (feetText === "") return { ok: false, message: `Put a number before the feet mark, like 2' 3".` };
    if (FEET_MARK.test(rest)) return { ok: false, message: "Feet are given twice: write feet once, then inches, like 2' 3\"." };
  }
  let hasInchMark = false;
  const im = INCH_MARK_END.exec(rest);
  if (im) {
    hasInchMark = true;
    rest = rest.slice(0, im.index).trim();
    if (rest === "") return { ok: false, message: `Put a number before the inch mark, like 23 7/8".` };
  }
  if (INCH_MARK_ANY.test(rest)) return { ok: false, message: `Write inches once, at the end, like 23 7/8".` };
  if (/[^0-9 ./-]/.test(rest) || (feetText !== null && /[^0-9 ./-]/.test(feetText))) {
    return { ok: false, message: `Could not read "${s}" as a length. ${EXAMPLES}` };
  }
  let inchesValue = 0;
  if (rest !== "") {
    const n = readNumber(rest);
    if (!n.ok) return n;
    if (feetText === null && !hasInchMark && units === "mm") {
      if (n.fraction) return { ok: false, message: `A fraction is read as inches: add the inch mark (7/8") or write millimetres as a decimal.` };
      return { ok: true, value: n.value, readAs: "mm" };
    }
    inchesValue = n.value;
  }
  let feetValue = 0;
  if (feetText !== null) {
    const f = readNumber(feetText);
    if (!f.ok) return f;
    feetValue = f.value;
  }
  const value = feetValue * MM_PER_FOOT + inchesValue * MM_PER_INCH;
  return { ok: true, value, readAs: feetText !== null ? "ft-in" : "in" };
}

/** Parse a typed length into millimetres. Bare numbers are read in the user's units. Returns a message instead of throwing. */
export function parseLength(text: string, options: ParseLengthOptions): ParseLengthResult {
  const maxMm = options.maxMm ?? MAX_LENGTH_MM;
  if (typeof text !== "string" || text.trim() === "") return { ok: false, message: "Enter a length." };
  if (text.length > 40) return { ok: false, message: "That is too long to be a length." };
  let s = normalize(text);
  let negative = false;
  if (s.startsWith("-")) {
    negative = true;
    s = s.slice(1).trim();
  } else if (s.startsWith("+")) s = s.slice(1).trim();
  if (negative && !options.allowNegative) return { ok: false, message: "A length cannot be negative." };
  if (/\d,\d/.test(s)) return { ok: false, message: "Commas are not read: write 606.4 or 1200, with a point for decimals." };
  if (s === "") return { ok: false, message: "Enter a length." };

  let value: number;
  let readAs: LengthUnits;
  const metric = readMetric(s);
  if (metric) {
    if (!metric.ok) return metric;
    value = metric.value;
    readAs = "mm";
  } else {
    const imperial = readImperial(s, options.units);
    if (!imperial.ok) return imperial;
    value = imperial.value;
    readAs = imperial.readAs;
  }
  if (!Number.isFinite(value) || value > maxMm) {
    return { ok: false, message: `Longer than ${maxMm >= 1000 ? `${maxMm / 1000} m` : `${maxMm} mm`}: check the units.` };
  }
  if (value === 0 && !options.allowZero) return { ok: false, message: "A length must be greater than zero." };
  return { ok: true, mm: mm(negative && value !== 0 ? -value : value), readAs };
}
