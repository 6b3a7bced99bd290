import { z } from "zod";
import { mixedToText, roundToFraction } from "../units/fraction";
import { formatMmNumber } from "../units/format-length";
import { MM_PER_INCH } from "../units/length";

/**
 * The one place the plan's bounded fields are made: lengths, counts and other numbers with a physical
 * minimum and maximum, and text without control characters. Every bound carries its reason in words a
 * woodworker reads ("At least 1/4 in (6.4 mm): a thinner shelf cannot carry load"). The plan schema and
 * every fixture kind's parameters use these helpers; docs/plan-format.md lists the bounds.
 */

/** A length in words for a bound: inches and fractions below 2 ft, feet and inches to 10 ft, whole feet above; with the metric size. */
export function boundText(mm: number): string {
  if (mm === 0) return "0";
  if (mm < 0) return `-${boundText(-mm).replace("(", "(-")}`;
  const metric = mm >= 1000 ? `${formatMmNumber(mm / 1000, 2)} m` : `${formatMmNumber(mm)} mm`;
  const inches = mm / MM_PER_INCH;
  if (inches < 24) return `${mixedToText(roundToFraction(inches, 32), "-")} in (${metric})`;
  if (inches >= 120) return `${Math.round(inches / 12)} ft (${metric})`;
  const sixteenths = Math.round(inches * 16);
  const ft = Math.floor(sixteenths / 192);
  const rest = roundToFraction((sixteenths - ft * 192) / 16, 16);
  return rest.whole === 0 && rest.num === 0 ? `${ft} ft (${metric})` : `${ft} ft ${mixedToText(rest, "-")} in (${metric})`;
}

/** Why a bound is where it is: one clause for each end, read after "At least ...:" and "At most ...:". */
export interface BoundReasons {
  min: string;
  max: string;
}

const NOT_A_NUMBER = "Enter a number.";

/** A reason as the end of a sentence. */
const end = (why: string) => (/[.!?]$/.test(why) ? why : `${why}.`);

/**
 * A length in mm from `min` to `max` inclusive (both finite; `min` may be 0). NaN, infinities and
 * anything outside are refused with the reason.
 */
export function mmRange(min: number, max: number, why: BoundReasons) {
  const low = min === 0 ? `Cannot be negative: ${end(why.min)}` : `At least ${boundText(min)}: ${end(why.min)}`;
  return z.number({ error: NOT_A_NUMBER }).min(min, low).max(max, `At most ${boundText(max)}: ${end(why.max)}`);
}

/** A whole count from `min` to `max` inclusive. */
export function countRange(min: number, max: number, why: BoundReasons, noun = "") {
  const n = (v: number) => (noun ? `${v} ${noun}` : String(v));
  return z
    .number({ error: NOT_A_NUMBER })
    .int("Use a whole number.")
    .min(min, `At least ${n(min)}: ${end(why.min)}`)
    .max(max, `At most ${n(max)}: ${end(why.max)}`);
}

/** A plain number (a load, a ratio, an angle) from `min` to `max` inclusive; `unit` follows the number in messages ("lb per foot"). */
export function numberRange(min: number, max: number, unit: string, why: BoundReasons) {
  const u = unit ? ` ${unit}` : "";
  return z
    .number({ error: NOT_A_NUMBER })
    .min(min, `At least ${min}${u}: ${end(why.min)}`)
    .max(max, `At most ${max}${u}: ${end(why.max)}`);
}

/** C0 controls other than tab and line breaks, DEL, and UTF-16 halves without their partner. */
const BAD_TEXT = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

/** True when text holds a control character or an unpaired surrogate (never stored, never silently changed). */
export function hasBadText(s: string): boolean {
  return BAD_TEXT.test(s);
}

/** Text of at most `max` characters, without control characters or unpaired surrogates. */
export function planText(max: number, min = 0) {
  const s = z.string({ error: "Enter text." }).max(max, `At most ${max} characters.`);
  return (min > 0 ? s.min(min, min === 1 ? "Cannot be empty." : `At least ${min} characters.`) : s).refine((v) => !hasBadText(v), "Remove control characters (such as U+0000) and broken characters.");
}

/** A reference to one of the plan's materials by id (1-64 characters). */
export const materialRef = planText(64, 1);
