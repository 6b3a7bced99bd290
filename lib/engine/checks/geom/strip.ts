import type { Vec2 } from "../../geometry/types";
import { centroid } from "./polygon";

/**
 * A straight band on the floor: from `origin` along unit vector `u` for `length` mm, between
 * `vMin` and `vMax` across it (along `v`, `u` turned a quarter turn counter-clockwise).
 * Stock paths, walkways and pull-out zones are measured along one.
 */
export interface Strip {
  origin: Vec2;
  u: Vec2;
  v: Vec2;
  vMin: number;
  vMax: number;
  length: number;
}

/** A strip from a start point, a direction and a width centred on the start. */
export function makeStrip(origin: Vec2, dir: Vec2, widthMm: number, length: number): Strip {
  const l = Math.hypot(dir.x, dir.y) || 1;
  const u = { x: dir.x / l, y: dir.y / l };
  return { origin, u, v: { x: -u.y, y: u.x }, vMin: -widthMm / 2, vMax: widthMm / 2, length };
}

/** The strip that runs through a rectangular zone away from `from` (the owner's centre). */
export function stripThroughZone(zone: readonly Vec2[], from: Vec2): Strip {
  const c = centroid(zone);
  const away = { x: c.x - from.x, y: c.y - from.y };
  let u = { x: 1, y: 0 };
  let best = -Infinity;
  for (let i = 0; i < zone.length; i++) {
    const p = zone[i];
    const q = zone[(i + 1) % zone.length];
    const l = Math.hypot(q.x - p.x, q.y - p.y);
    if (l < 1e-9) continue;
    for (const s of [1, -1]) {
      const cand = { x: (s * (q.x - p.x)) / l, y: (s * (q.y - p.y)) / l };
      const score = cand.x * away.x + cand.y * away.y;
      if (score > best) {
        best = score;
        u = cand;
      }
    }
  }
  const v = { x: -u.y, y: u.x };
  let uLo = Infinity;
  let uHi = -Infinity;
  let vLo = Infinity;
  let vHi = -Infinity;
  for (const p of zone) {
    const du = (p.x - c.x) * u.x + (p.y - c.y) * u.y;
    const dv = (p.x - c.x) * v.x + (p.y - c.y) * v.y;
    uLo = Math.min(uLo, du);
    uHi = Math.max(uHi, du);
    vLo = Math.min(vLo, dv);
    vHi = Math.max(vHi, dv);
  }
  return { origin: { x: c.x + u.x * uLo, y: c.y + u.y * uLo }, u, v, vMin: vLo, vMax: vHi, length: uHi - uLo };
}

/** (u, v) coordinates of a world point in the strip's frame. */
export function toStrip(s: Strip, p: Vec2): { u: number; v: number } {
  const dx = p.x - s.origin.x;
  const dy = p.y - s.origin.y;
  return { u: dx * s.u.x + dy * s.u.y, v: dx * s.v.x + dy * s.v.y };
}

/** A world point at (u, v) in the strip's frame. */
export function fromStrip(s: Strip, u: number, v: number): Vec2 {
  return { x: s.origin.x + s.u.x * u + s.v.x * v, y: s.origin.y + s.u.y * u + s.v.y * v };
}

/** The strip's outline in world coordinates, counter-clockwise. */
export function stripPolygon(s: Strip, length = s.length): Vec2[] {
  return [fromStrip(s, 0, s.vMin), fromStrip(s, length, s.vMin), fromStrip(s, length, s.vMax), fromStrip(s, 0, s.vMax)];
}

type UV = { u: number; v: number };

function clip(pts: UV[], inside: (p: UV) => number): UV[] {
  const out: UV[] = [];
  for (let i = 0; i < pts.length; i++) {
    const a = pts[i];
    const b = pts[(i + 1) % pts.length];
    const da = inside(a);
    const db = inside(b);
    if (da >= 0) out.push(a);
    if ((da >= 0) !== (db >= 0)) {
      const t = da / (da - db);
      out.push({ u: a.u + (b.u - a.u) * t, v: a.v + (b.v - a.v) * t });
    }
  }
  return out;
}

/**
 * Distance along the strip at which a convex polygon first enters it, mm (from u = 0, ignoring
 * anything behind the start); Infinity when it never does. `shrink` keeps things that only touch
 * the strip's sides from counting.
 */
export function firstHitConvex(s: Strip, poly: readonly Vec2[], shrink = 1): number {
  // Fast paths without allocating: the polygon's extent across and along the strip.
  const lo = s.vMin + shrink;
  const hi = s.vMax - shrink;
  let uMin = Infinity;
  let uMax = -Infinity;
  let vMin = Infinity;
  let vMax = -Infinity;
  for (const p of poly) {
    const dx = p.x - s.origin.x;
    const dy = p.y - s.origin.y;
    const u = dx * s.u.x + dy * s.u.y;
    const v = dx * s.v.x + dy * s.v.y;
    if (u < uMin) uMin = u;
    if (u > uMax) uMax = u;
    if (v < vMin) vMin = v;
    if (v > vMax) vMax = v;
  }
  if (vMax < lo || vMin > hi || uMax < 0) return Infinity;
  // Wholly inside the band across: the nearest corner along it, or 0 when it straddles the start.
  if (vMin >= lo && vMax <= hi) return Math.max(0, uMin);
  let pts: UV[] = poly.map((p) => toStrip(s, p));
  pts = clip(pts, (p) => p.v - (s.vMin + shrink));
  if (!pts.length) return Infinity;
  pts = clip(pts, (p) => s.vMax - shrink - p.v);
  if (!pts.length) return Infinity;
  pts = clip(pts, (p) => p.u);
  if (!pts.length) return Infinity;
  let m = Infinity;
  for (const p of pts) m = Math.min(m, p.u);
  return m;
}

/** Distance along the strip at which a segment (a wall) first crosses it, mm; Infinity when it does not. */
export function firstHitSegment(s: Strip, a: Vec2, b: Vec2, shrink = 1): number {
  const pa = toStrip(s, a);
  const pb = toStrip(s, b);
  let t0 = 0;
  let t1 = 1;
  // Clip the segment's parameter range by each half-plane of the band and by u >= 0.
  const planes: [number, number][] = [
    [pa.v - (s.vMin + shrink), pb.v - (s.vMin + shrink)],
    [s.vMax - shrink - pa.v, s.vMax - shrink - pb.v],
    [pa.u, pb.u],
  ];
  for (const [da, db] of planes) {
    if (da < 0 && db < 0) return Infinity;
    if (da < 0) t0 = Math.max(t0, da / (da - db));
    else if (db < 0) t1 = Math.min(t1, da / (da - db));
  }
  if (t0 > t1) return Infinity;
  return Math.min(pa.u + (pb.u - pa.u) * t0, pa.u + (pb.u - pa.u) * t1);
}

/** The stretch [from, to] of the strip's centre line that lies over a convex polygon, mm along it; null when none. */
export function centreLineCover(s: Strip, poly: readonly Vec2[]): [number, number] | null {
  const vc = (s.vMin + s.vMax) / 2;
  const pts = poly.map((p) => toStrip(s, p));
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < pts.length; i++) {
    const a = pts[i];
    const b = pts[(i + 1) % pts.length];
    if ((a.v - vc) * (b.v - vc) > 0 || a.v === b.v) {
      if (a.v === vc) {
        lo = Math.min(lo, a.u);
        hi = Math.max(hi, a.u);
      }
      continue;
    }
    const t = (vc - a.v) / (b.v - a.v);
    const u = a.u + (b.u - a.u) * t;
    lo = Math.min(lo, u);
    hi = Math.max(hi, u);
  }
  return lo <= hi ? [lo, hi] : null;
}

/** Length of the run from u = 0 covered without a gap wider than `gapMm` by the intervals, mm. */
export function coveredFromStart(intervals: [number, number][], gapMm: number, startSlackMm: number): number {
  const sorted = intervals.filter((i) => i[1] > 0).sort((a, b) => a[0] - b[0]);
  let reach = 0;
  let started = false;
  for (const [lo, hi] of sorted) {
    const limit = started ? reach + gapMm : startSlackMm;
    if (lo > limit) break;
    reach = Math.max(reach, hi);
    started = true;
  }
  return started ? reach : 0;
}
