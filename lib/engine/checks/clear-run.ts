import type { Vec2 } from "../geometry/types";
import type { CheckContext, SolidItem } from "./context";
import { firstHitConvex, firstHitSegment, fromStrip, stripBounds, type Strip } from "./geom/strip";

/** What stops a run: a fixture, an obstacle, a wall, or a closed door in a wall. */
export interface Blocker {
  source: "fixture" | "obstacle" | "wall" | "opening";
  id: string;
  label: string;
}

export interface RunResult {
  /** Clear length from the start, mm (capped at the strip's length). */
  clearMm: number;
  blocker?: Blocker;
  /** Where the run is blocked, on the floor. */
  at?: Vec2;
}

export interface RunOptions {
  /** Only bodies overlapping this height band block (mm above the floor). */
  zLo: number;
  zHi: number;
  /** The id of a solid that never blocks (the owner). */
  excludeId?: string;
  /** Extra filter: return false to let a solid through. */
  blocks?: (s: SolidItem) => boolean;
  /** Count walls (true by default). */
  walls?: boolean;
}

const OPENING_NAMES: Record<string, string> = { "entry-door": "the closed entry door", "garage-door": "the closed garage door", window: "the window" };

/** Walks the strip from its start and reports the first solid or wall in the height band, using the spatial index. */
export function clearRun(ctx: CheckContext, strip: Strip, o: RunOptions): RunResult {
  let best = strip.length;
  let blocker: Blocker | undefined;
  for (const s of ctx.solids.query(stripBounds(strip, 1))) {
    if (s.id === o.excludeId) continue;
    if (s.prism.zMax <= o.zLo || s.prism.zMin >= o.zHi) continue;
    if (o.blocks && !o.blocks(s)) continue;
    const d = firstHitConvex(strip, s.prism.polygon);
    // Ties go to the smaller id so the answer does not depend on the index's internal order.
    if (d < best - 1e-9 || (d <= best + 1e-9 && blocker?.source !== "wall" && blocker !== undefined && s.id < blocker.id)) {
      best = d;
      blocker = { source: s.source, id: s.id, label: s.label };
    }
  }
  if (o.walls !== false) {
    for (const w of ctx.room.walls) {
      const d = firstHitSegment(strip, w.start, w.end);
      if (d < best) {
        best = d;
        const hit = fromStrip(strip, d, (strip.vMin + strip.vMax) / 2);
        blocker = wallBlocker(ctx, w.id, w.start, w.dir, hit, o.zLo, o.zHi) ?? { source: "wall", id: w.id, label: w.id ? `wall ${w.id}` : "a wall" };
      }
    }
  }
  const clearMm = Math.max(0, best);
  return blocker ? { clearMm, blocker, at: fromStrip(strip, clearMm, (strip.vMin + strip.vMax) / 2) } : { clearMm };
}

function wallBlocker(ctx: CheckContext, wallId: string, start: Vec2, dir: Vec2, hit: Vec2, zLo: number, zHi: number): Blocker | undefined {
  const t = (hit.x - start.x) * dir.x + (hit.y - start.y) * dir.y;
  for (const op of ctx.plan.room.openings) {
    if (op.wallId !== wallId || t < op.offsetMm || t > op.offsetMm + op.widthMm) continue;
    const lo = op.kind === "window" ? op.sillMm : 0;
    const hi = lo + op.heightMm;
    if (hi <= zLo || lo >= zHi) continue;
    return { source: "opening", id: op.id, label: OPENING_NAMES[op.kind] ?? op.kind };
  }
  return undefined;
}
