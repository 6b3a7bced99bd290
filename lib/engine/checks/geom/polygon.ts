import type { Bounds2, Prism, Vec2 } from "../../geometry/types";
import { distanceToSegment } from "../../geometry/polygon";

/** Floor bounds of a polygon, mm. */
export function polygonBounds(poly: readonly Vec2[]): Bounds2 {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const p of poly) {
    if (p.x < minX) minX = p.x;
    if (p.y < minY) minY = p.y;
    if (p.x > maxX) maxX = p.x;
    if (p.y > maxY) maxY = p.y;
  }
  return { minX, minY, maxX, maxY };
}

/** Bounds grown by `by` mm on every side. */
export function expandBounds(b: Bounds2, by: number): Bounds2 {
  return { minX: b.minX - by, minY: b.minY - by, maxX: b.maxX + by, maxY: b.maxY + by };
}

export function boundsOverlap(a: Bounds2, b: Bounds2): boolean {
  return a.minX <= b.maxX && b.minX <= a.maxX && a.minY <= b.maxY && b.minY <= a.maxY;
}

export function unionBounds(a: Bounds2, b: Bounds2): Bounds2 {
  return { minX: Math.min(a.minX, b.minX), minY: Math.min(a.minY, b.minY), maxX: Math.max(a.maxX, b.maxX), maxY: Math.max(a.maxY, b.maxY) };
}

/** Scratch spans [lo, hi], so the overlap test allocates nothing. */
const SPAN_A = new Float64Array(2);
const SPAN_B = new Float64Array(2);

/** A polygon's extent along the axis (ax, ay), written to `out` as [lo, hi]. */
function project(poly: readonly Vec2[], ax: number, ay: number, out: Float64Array): void {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of poly) {
    const d = v.x * ax + v.y * ay;
    if (d < lo) lo = d;
    if (d > hi) hi = d;
  }
  out[0] = lo;
  out[1] = hi;
}

/** Smallest overlap of the two polygons' projections on the edge normals of `edges`, mm (Infinity when it has no edges). */
function minOverlapOnNormals(edges: readonly Vec2[], a: readonly Vec2[], b: readonly Vec2[], best: number): number {
  const n = edges.length;
  for (let i = 0; i < n; i++) {
    const p = edges[i];
    const q = edges[(i + 1) % n];
    const ex = q.x - p.x;
    const ey = q.y - p.y;
    const len = Math.hypot(ex, ey);
    if (len < 1e-9) continue;
    const ax = -ey / len;
    const ay = ex / len;
    project(a, ax, ay, SPAN_A);
    project(b, ax, ay, SPAN_B);
    const overlap = Math.min(SPAN_A[1], SPAN_B[1]) - Math.max(SPAN_A[0], SPAN_B[0]);
    if (overlap < best) best = overlap;
  }
  return best;
}

/**
 * Penetration depth of two convex polygons on the floor, mm, by separating axes: the smallest
 * overlap over every edge normal. Zero or negative means they do not overlap (negative: the gap
 * along the best separating axis).
 */
export function convexPenetration(a: readonly Vec2[], b: readonly Vec2[]): number {
  const best = minOverlapOnNormals(b, a, b, minOverlapOnNormals(a, a, b, Infinity));
  return best === Infinity ? 0 : best;
}

/** How far two prisms overlap, mm: the smaller of the floor penetration and the vertical overlap; <= 0 when apart. */
export function prismPenetration(a: Prism, b: Prism): number {
  const dz = Math.min(a.zMax, b.zMax) - Math.max(a.zMin, b.zMin);
  if (dz <= 0) return dz;
  const d = convexPenetration(a.polygon, b.polygon);
  return Math.min(d, dz);
}

/** Point in a simple polygon (any winding), by ray crossing. */
export function pointInPolygon(p: Vec2, poly: readonly Vec2[]): boolean {
  let inside = false;
  for (let i = 0, j = poly.length - 1; i < poly.length; j = i++) {
    const a = poly[i];
    const b = poly[j];
    if (a.y > p.y !== b.y > p.y && p.x < ((b.x - a.x) * (p.y - a.y)) / (b.y - a.y) + a.x) inside = !inside;
  }
  return inside;
}

/** Distance from a point to a segment, mm (the geometry module's one definition). */
export const pointSegmentDistance = distanceToSegment;

/** Distance from a point to a polygon's outline, mm. */
export function distanceToOutline(p: Vec2, poly: readonly Vec2[]): number {
  let best = Infinity;
  for (let i = 0; i < poly.length; i++) best = Math.min(best, pointSegmentDistance(p, poly[i], poly[(i + 1) % poly.length]));
  return best;
}

/**
 * How far a convex polygon reaches outside the room outline, mm (0 when it is inside):
 * the largest distance of one of its corners outside, or a room corner poking into it.
 */
export function outsideDepth(poly: readonly Vec2[], room: readonly Vec2[]): number {
  let worst = 0;
  for (const p of poly) {
    if (!pointInPolygon(p, room)) worst = Math.max(worst, distanceToOutline(p, room));
  }
  // A re-entrant room corner inside the polygon (L-shaped rooms) also puts part of it outside.
  for (const c of room) {
    if (pointInConvexStrict(c, poly)) worst = Math.max(worst, distanceToOutline(c, poly));
  }
  return worst;
}

/** Strictly inside a counter-clockwise convex polygon (more than 1e-6 mm from each edge). */
export function pointInConvexStrict(p: Vec2, poly: readonly Vec2[]): boolean {
  for (let i = 0; i < poly.length; i++) {
    const a = poly[i];
    const b = poly[(i + 1) % poly.length];
    const cross = (b.x - a.x) * (p.y - a.y) - (b.y - a.y) * (p.x - a.x);
    if (cross <= 1e-6) return false;
  }
  return poly.length >= 3;
}

/** Centroid of a polygon's corners (good enough for convex zones). */
export function centroid(poly: readonly Vec2[]): Vec2 {
  let x = 0;
  let y = 0;
  for (const p of poly) {
    x += p.x;
    y += p.y;
  }
  return { x: x / poly.length, y: y / poly.length };
}

/** Area of a polygon, mm^2 (positive when counter-clockwise). */
export function signedArea(poly: readonly Vec2[]): number {
  let a = 0;
  for (let i = 0; i < poly.length; i++) {
    const p = poly[i];
    const q = poly[(i + 1) % poly.length];
    a += p.x * q.y - q.x * p.y;
  }
  return a / 2;
}
