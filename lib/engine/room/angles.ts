import type { Vec2 } from "../geometry/types";

/**
 * Interior angle at each corner of a counter-clockwise polygon, degrees (corner i is where wall i
 * starts, between wall i-1 arriving and wall i leaving); over 180 at a reflex corner.
 */
export function interiorAnglesDeg(corners: readonly Vec2[]): number[] {
  const n = corners.length;
  return corners.map((c, i) => {
    const prev = corners[(i + n - 1) % n];
    const next = corners[(i + 1) % n];
    const inX = c.x - prev.x;
    const inY = c.y - prev.y;
    const outX = next.x - c.x;
    const outY = next.y - c.y;
    // Left turn is positive; the interior angle is what is left of a straight line.
    const turn = Math.atan2(inX * outY - inY * outX, inX * outX + inY * outY);
    return 180 - (turn * 180) / Math.PI;
  });
}
