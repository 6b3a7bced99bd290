import type { Vec2 } from "../geometry/types";
import { add, distance, normalize, perpLeft, scale, sub } from "../geometry/vec2";

/**
 * The point left of the line a→b at distance `ra` from a and `rb` from b (mm), or null when the
 * three lengths cannot make a triangle. A length short by less than `slackMm` is taken as flat.
 */
export function thirdPoint(a: Vec2, b: Vec2, ra: number, rb: number, slackMm = 0.5): Vec2 | null {
  const d = distance(a, b);
  if (d === 0) return null;
  const x = (d * d + ra * ra - rb * rb) / (2 * d);
  const h2 = ra * ra - x * x;
  // h2 < 0 means the sides fail the triangle inequality; allow rounding-size shortfalls only.
  if (h2 < 0 && Math.sqrt(-h2) > slackMm) return null;
  const ex = normalize(sub(b, a));
  return add(add(a, scale(ex, x)), scale(perpLeft(ex), Math.sqrt(Math.max(0, h2))));
}

/**
 * Corners of a four-walled room from its wall lengths and one diagonal (0-2 or 1-3), mm: corner 0
 * at the origin, wall 0 along +x, counter-clockwise. Null when the lengths cannot close.
 */
export function quadFromDiagonal(wallsMm: readonly number[], diagonal: { from: number; to: number; lengthMm: number }): Vec2[] | null {
  const [w0, w1, w2, w3] = wallsMm;
  const c0 = { x: 0, y: 0 };
  const c1 = { x: w0, y: 0 };
  const pair = [diagonal.from, diagonal.to].sort().join("-");
  if (pair === "0-2") {
    const c2 = thirdPoint(c0, c1, diagonal.lengthMm, w1);
    const c3 = c2 && thirdPoint(c0, c2, w3, w2);
    return c2 && c3 ? [c0, c1, c2, c3] : null;
  }
  if (pair === "1-3") {
    const c3 = thirdPoint(c0, c1, w3, diagonal.lengthMm);
    const c2 = c3 && thirdPoint(c3, c1, w2, w1);
    return c2 && c3 ? [c0, c1, c2, c3] : null;
  }
  return null;
}

/** Corners of a three-walled room from its lengths alone, mm; null when they cannot make a triangle. */
export function triangleFromWalls(wallsMm: readonly number[]): Vec2[] | null {
  const [w0, w1, w2] = wallsMm;
  const c0 = { x: 0, y: 0 };
  const c1 = { x: w0, y: 0 };
  const c2 = thirdPoint(c0, c1, w2, w1);
  return c2 ? [c0, c1, c2] : null;
}
