import type { Vec2 } from "../geometry/types";
import { fromAngle, rotate } from "../geometry/vec2";

const DEG = Math.PI / 180;

/** Interior angles to walk the room with (degrees, corner i where wall i starts), and what was assumed. */
export interface TraverseAngles {
  anglesDeg: number[];
  measuredCount: number;
  notes: string[];
}

/**
 * Fill the corner angles for a walk around the room: measured ones as given (spread evenly if
 * they do not add up to (n-2) x 180), the rest sharing what is left: 90 degrees each when the
 * room allows it.
 */
export function traverseAngles(n: number, measured: readonly (number | null | undefined)[]): TraverseAngles {
  const total = (n - 2) * 180;
  const notes: string[] = [];
  const given = Array.from({ length: n }, (_, i) => (typeof measured[i] === "number" ? (measured[i] as number) : null));
  const known = given.filter((a): a is number => a !== null);
  const missing = n - known.length;
  const knownSum = known.reduce((s, a) => s + a, 0);
  if (missing === 0) {
    const excess = knownSum - total;
    if (Math.abs(excess) > 1e-9) {
      notes.push(`The measured corners add up to ${round(knownSum, 2)}°, not ${total}°: the ${round(excess, 2)}° difference is shared evenly across the ${n} corners.`);
    }
    return { anglesDeg: given.map((a) => (a as number) - excess / n), measuredCount: n, notes };
  }
  const share = (total - knownSum) / missing;
  if (Math.abs(share - 90) > 1e-6) {
    notes.push(
      `${missing} unmeasured corner${missing > 1 ? "s" : ""} cannot all be square in a room of ${n} walls: each was taken as ${round(share, 2)}°. Measure the corner angles or diagonals.`,
    );
  }
  if (share <= 0 || share >= 360) notes.push("The measured angles leave no sensible angle for the other corners: check them.");
  return { anglesDeg: given.map((a) => a ?? share), measuredCount: known.length, notes };
}

/**
 * Walk the walls with the given interior angles (corner 0 at the origin, wall 0 along +x,
 * counter-clockwise), then close the loop by the compass (Bowditch) rule: each corner moves
 * against the gap in proportion to the wall length walked to reach it. Returns the corners (mm)
 * and the gap before closing (mm).
 */
export function closeTraverse(wallsMm: readonly number[], anglesDeg: readonly number[]): { corners: Vec2[]; gap: Vec2 } {
  const n = wallsMm.length;
  const open: Vec2[] = [{ x: 0, y: 0 }];
  let heading = 0;
  for (let i = 0; i < n; i++) {
    if (i > 0) heading += (180 - anglesDeg[i]) * DEG;
    const u = fromAngle(heading);
    const p = open[i];
    open.push({ x: p.x + u.x * wallsMm[i], y: p.y + u.y * wallsMm[i] });
  }
  const gap = open[n];
  const perimeter = wallsMm.reduce((s, w) => s + w, 0);
  let walked = 0;
  const closed: Vec2[] = [];
  for (let k = 0; k < n; k++) {
    closed.push({ x: open[k].x - (gap.x * walked) / perimeter, y: open[k].y - (gap.y * walked) / perimeter });
    walked += wallsMm[k];
  }
  // Closing moved corner 1 off the x axis: turn the room back so wall 0 runs along +x.
  const turn = -Math.atan2(closed[1].y, closed[1].x);
  return { corners: closed.map((p) => rotate(p, turn)), gap };
}

export function round(v: number, decimals: number): number {
  const f = 10 ** decimals;
  return Math.round(v * f) / f;
}
