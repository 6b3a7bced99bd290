/** Greatest common divisor of two non-negative integers. */
export function gcd(a: number, b: number): number {
  let x = Math.abs(a);
  let y = Math.abs(b);
  while (y) [x, y] = [y, x % y];
  return x;
}

/** A mixed number: whole + num/den, reduced; den is 1 when there is no fraction. */
export interface MixedNumber {
  negative: boolean;
  whole: number;
  num: number;
  den: number;
}

/**
 * Round a plain number (inches, say) to the nearest 1/denominator and split it into a reduced
 * mixed number, carrying into the whole part (23 31/32 at 1/16 becomes 24).
 */
export function roundToFraction(value: number, denominator: number): MixedNumber {
  const steps = Math.round(Math.abs(value) * denominator);
  const whole = Math.floor(steps / denominator);
  const rest = steps - whole * denominator;
  const g = rest === 0 ? denominator : gcd(rest, denominator);
  return { negative: value < 0 && steps !== 0, whole, num: rest / g, den: denominator / g };
}

/** Text for a mixed number without a unit mark: "23 7/8", "7/8", "24". */
export function mixedToText(m: MixedNumber, separator = " "): string {
  const sign = m.negative ? "-" : "";
  if (m.num === 0) return `${sign}${m.whole}`;
  if (m.whole === 0) return `${sign}${m.num}/${m.den}`;
  return `${sign}${m.whole}${separator}${m.num}/${m.den}`;
}
