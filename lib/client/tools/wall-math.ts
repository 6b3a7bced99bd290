import type { Vec2 } from "@/lib/engine/geometry/types";
import type { SolvedWall } from "@/lib/engine/room/types";

/** Distance of a floor point along a wall from its start corner, mm (may be negative or past the end). */
export function alongWall(wall: SolvedWall, p: Vec2): number {
  return (p.x - wall.start.x) * wall.dir.x + (p.y - wall.start.y) * wall.dir.y;
}

/** Distance of a floor point from a wall's line, into the room positive, mm. */
export function fromWall(wall: SolvedWall, p: Vec2): number {
  return (p.x - wall.start.x) * wall.inward.x + (p.y - wall.start.y) * wall.inward.y;
}

/** The wall nearest a floor point, within `maxMm` of its segment. */
export function nearestWall(walls: readonly SolvedWall[], p: Vec2, maxMm = Infinity): SolvedWall | undefined {
  let best: SolvedWall | undefined;
  let bestD = maxMm;
  for (const w of walls) {
    const t = Math.max(0, Math.min(w.lengthMm, alongWall(w, p)));
    const d = Math.hypot(w.start.x + w.dir.x * t - p.x, w.start.y + w.dir.y * t - p.y);
    if (d < bestD) {
      bestD = d;
      best = w;
    }
  }
  return best;
}

/** Distance of a floor point from a wall's segment (not its endless line), mm. */
export function distanceToWall(wall: SolvedWall, p: Vec2): number {
  const t = Math.max(0, Math.min(wall.lengthMm, alongWall(wall, p)));
  return Math.hypot(wall.start.x + wall.dir.x * t - p.x, wall.start.y + wall.dir.y * t - p.y);
}
