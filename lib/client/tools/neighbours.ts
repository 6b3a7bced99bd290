import type { Editor } from "../editor";
import { frameOfWall, worldToWall } from "@/lib/engine/room/wall-frame";

/**
 * A wall fixture's extent along its wall relative to its offset, mm: what it really occupies
 * (countertop or face-frame overhangs can reach past its nominal width), from its placed body.
 */
export function wallExtent(ed: Editor, id: string): { x0: number; x1: number } {
  const f = ed.fixture(id);
  const placed = ed.placed(id);
  if (f?.placement.mode === "wall" && placed) {
    const wall = ed.wall(f.placement.wallId);
    if (wall && placed.body.polygon.length) {
      const frame = frameOfWall(wall);
      const along = placed.body.polygon.map((p) => worldToWall(frame, p).offsetAlongMm - (f.placement.mode === "wall" ? f.placement.offsetMm : 0));
      return { x0: Math.min(...along), x1: Math.max(...along) };
    }
  }
  return { x0: 0, x1: ed.footprint(id)?.widthMm ?? 0 };
}

/** Spans along a wall (mm from its start) of the fixtures standing against it, leaving out `skip`. */
export function wallSpans(ed: Editor, wallId: string, skip: ReadonlySet<string>): { startMm: number; endMm: number }[] {
  const spans: { startMm: number; endMm: number }[] = [];
  for (const f of ed.doc.fixtures) {
    if (skip.has(f.id) || f.placement.mode !== "wall" || f.placement.wallId !== wallId) continue;
    const e = wallExtent(ed, f.id);
    spans.push({ startMm: f.placement.offsetMm + e.x0, endMm: f.placement.offsetMm + e.x1 });
  }
  return spans;
}

/** How near (mm) an edge must come before it snaps. */
export const SNAP_THRESHOLD_MM = 40;
