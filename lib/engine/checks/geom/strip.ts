import type { Bounds2, Vec2 } from "../../geometry/types";

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
  // Scalars in the loops: this runs for every zone of every fixture.
  let cx = 0;
  let cy = 0;
  for (const p of zone) {
    cx += p.x;
    cy += p.y;
  }
  cx /= zone.length || 1;
  cy /= zone.length || 1;
  const awayX = cx - from.x;
  const awayY = cy - from.y;
  let ux = 1;
  let uy = 0;
  let best = -Infinity;
  for (let i = 0; i < zone.length; i++) {
    const p = zone[i];
    const q = zone[(i + 1) % zone.length];
    const l = Math.hypot(q.x - p.x, q.y - p.y);
    if (l < 1e-9) continue;
    const ex = (q.x - p.x) / l;
    const ey = (q.y - p.y) / l;
    // The edge direction or its reverse, whichever points more away from the owner.
    const score = ex * awayX + ey * awayY;
    if (score > best) {
      best = score;
      ux = ex;
      uy = ey;
    }
    if (-score > best) {
      best = -score;
      ux = -ex;
      uy = -ey;
    }
  }
  const vx = -uy;
  const vy = ux;
  let uLo = Infinity;
  let uHi = -Infinity;
  let vLo = Infinity;
  let vHi = -Infinity;
  for (const p of zone) {
    const du = (p.x - cx) * ux + (p.y - cy) * uy;
    const dv = (p.x - cx) * vx + (p.y - cy) * vy;
    if (du < uLo) uLo = du;
    if (du > uHi) uHi = du;
    if (dv < vLo) vLo = dv;
    if (dv > vHi) vHi = dv;
  }
  return { origin: { x: cx + ux * uLo, y: cy + uy * uLo }, u: { x: ux, y: uy }, v: { x: vx, y: vy }, vMin: vLo, vMax: vHi, length: uHi - uLo };
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

/** Floor bounds of the strip (its first `length` mm), grown by `pad` mm, without building its outline. */
export function stripBounds(s: Strip, pad = 0, length = s.length): Bounds2 {
  const ox = s.origin.x;
  const oy = s.origin.y;
  const ax = s.u.x * length;
  const ay = s.u.y * length;
  const x0 = ox + s.v.x * s.vMin;
  const x1 = ox + s.v.x * s.vMax;
  const y0 = oy + s.v.y * s.vMin;
  const y1 = oy + s.v.y * s.vMax;
  return {
    minX: Math.min(x0, x1, x0 + ax, x1 + ax) - pad,
    minY: Math.min(y0, y1, y0 + ay, y1 + ay) - pad,
    maxX: Math.max(x0, x1, x0 + ax, x1 + ax) + pad,
    maxY: Math.max(y0, y1, y0 + ay, y1 + ay) + pad,
  };
}

/** The strip's outline in world coordinates, counter-clockwise. */
export function stripPolygon(s: Strip, length = s.length): Vec2[] {
  return [fromStrip(s, 0, s.vMin), fromStrip(s, length, s.vMin), fromStrip(s, length, s.vMax), fromStrip(s, 0, s.vMax)];
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
  return clippedMinU(s, poly, lo, hi);
}

/**
 * Smallest u of the part of a convex polygon inside the band lo <= v <= hi and u >= 0, Infinity
 * when none. That part's corners are the polygon's corners inside, its edges' crossings of the
 * three boundary lines, and the band's two corners at u = 0 when the polygon covers them; so the
 * smallest of those is the answer. Scalars only: this runs for most neighbours of every strip.
 */
function clippedMinU(s: Strip, poly: readonly Vec2[], lo: number, hi: number): number {
  const n = poly.length;
  if (n < 3) return Infinity;
  // Winding (the strip frame is a rotation, so it keeps the world winding).
  let area = 0;
  for (let i = 0; i < n; i++) {
    const p = poly[i];
    const q = poly[(i + 1) % n];
    area += p.x * q.y - q.x * p.y;
  }
  const orient = area >= 0 ? 1 : -1;
  let best = Infinity;
  let coversLo = true;
  let coversHi = true;
  const ox = s.origin.x;
  const oy = s.origin.y;
  for (let i = 0; i < n; i++) {
    const p = poly[i];
    const q = poly[(i + 1) % n];
    const pu = (p.x - ox) * s.u.x + (p.y - oy) * s.u.y;
    const pv = (p.x - ox) * s.v.x + (p.y - oy) * s.v.y;
    const qu = (q.x - ox) * s.u.x + (q.y - oy) * s.u.y;
    const qv = (q.x - ox) * s.v.x + (q.y - oy) * s.v.y;
    if (pv >= lo && pv <= hi && pu >= 0 && pu < best) best = pu;
    if ((pv - lo) * (qv - lo) < 0) {
      const u = pu + ((qu - pu) * (lo - pv)) / (qv - pv);
      if (u >= 0 && u < best) best = u;
    }
    if ((pv - hi) * (qv - hi) < 0) {
      const u = pu + ((qu - pu) * (hi - pv)) / (qv - pv);
      if (u >= 0 && u < best) best = u;
    }
    if (pu * qu < 0) {
      const v = pv - ((qv - pv) * pu) / (qu - pu);
      if (v >= lo && v <= hi && best > 0) best = 0;
    }
    // Is each band corner (0, lo), (0, hi) on the inner side of this edge?
    const eu = qu - pu;
    const ev = qv - pv;
    if ((eu * (lo - pv) + ev * pu) * orient < 0) coversLo = false;
    if ((eu * (hi - pv) + ev * pu) * orient < 0) coversHi = false;
  }
  if ((coversLo || coversHi) && best > 0) best = 0;
  return best;
}

/** Distance along the strip at which a segment (a wall) first crosses it, mm; Infinity when it does not. */
export function firstHitSegment(s: Strip, a: Vec2, b: Vec2, shrink = 1): number {
  // Scalars only: this runs for every wall against every strip.
  const ax = a.x - s.origin.x;
  const ay = a.y - s.origin.y;
  const bx = b.x - s.origin.x;
  const by = b.y - s.origin.y;
  const au = ax * s.u.x + ay * s.u.y;
  const av = ax * s.v.x + ay * s.v.y;
  const bu = bx * s.u.x + by * s.u.y;
  const bv = bx * s.v.x + by * s.v.y;
  const lo = s.vMin + shrink;
  const hi = s.vMax - shrink;
  // Clip the segment's parameter range [0, 1] by each half-plane of the band and by u >= 0.
  let t0 = 0;
  let t1 = 1;
  for (let k = 0; k < 3; k++) {
    const da = k === 0 ? av - lo : k === 1 ? hi - av : au;
    const db = k === 0 ? bv - lo : k === 1 ? hi - bv : bu;
    if (da < 0 && db < 0) return Infinity;
    if (da < 0) t0 = Math.max(t0, da / (da - db));
    else if (db < 0) t1 = Math.min(t1, da / (da - db));
  }
  if (t0 > t1) return Infinity;
  return Math.min(au + (bu - au) * t0, au + (bu - au) * t1);
}

/** The stretch [from, to] of the strip's centre line that lies over a convex polygon, mm along it; null when none. */
export function centreLineCover(s: Strip, poly: readonly Vec2[]): [number, number] | null {
  const vc = (s.vMin + s.vMax) / 2;
  let lo = Infinity;
  let hi = -Infinity;
  const n = poly.length;
  for (let i = 0; i < n; i++) {
    const p = poly[i];
    const q = poly[(i + 1) % n];
    const pu = (p.x - s.origin.x) * s.u.x + (p.y - s.origin.y) * s.u.y;
    const pv = (p.x - s.origin.x) * s.v.x + (p.y - s.origin.y) * s.v.y;
    const qu = (q.x - s.origin.x) * s.u.x + (q.y - s.origin.y) * s.u.y;
    const qv = (q.x - s.origin.x) * s.v.x + (q.y - s.origin.y) * s.v.y;
    if ((pv - vc) * (qv - vc) > 0 || pv === qv) {
      if (pv === vc) {
        lo = Math.min(lo, pu);
        hi = Math.max(hi, pu);
      }
      continue;
    }
    const u = pu + ((qu - pu) * (vc - pv)) / (qv - pv);
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
