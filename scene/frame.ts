import type { Vec2 } from "@/lib/engine/geometry/types";
import type { SolvedWall } from "@/lib/engine/room/types";

export interface Box3mm {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
  maxZ: number;
}

/** Bounds of floor points with a height, mm. */
export function boundsOf(points: readonly Vec2[], maxZ: number): Box3mm {
  const b = { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity, maxZ };
  for (const p of points) {
    b.minX = Math.min(b.minX, p.x);
    b.minY = Math.min(b.minY, p.y);
    b.maxX = Math.max(b.maxX, p.x);
    b.maxY = Math.max(b.maxY, p.y);
  }
  if (!Number.isFinite(b.minX)) return { minX: 0, minY: 0, maxX: 1000, maxY: 1000, maxZ };
  return b;
}

/** How far into the room the far side lies from a wall, mm. */
export function roomDepthFrom(wall: SolvedWall, corners: readonly Vec2[]): number {
  let d = 0;
  for (const c of corners) d = Math.max(d, (c.x - wall.start.x) * wall.inward.x + (c.y - wall.start.y) * wall.inward.y);
  return d;
}
