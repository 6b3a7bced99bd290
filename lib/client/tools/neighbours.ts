import type { Editor } from "../editor";

/** Spans along a wall (mm from its start) of the fixtures standing against it, leaving out `skip`. */
export function wallSpans(ed: Editor, wallId: string, skip: ReadonlySet<string>): { startMm: number; endMm: number }[] {
  const spans: { startMm: number; endMm: number }[] = [];
  for (const f of ed.doc.fixtures) {
    if (skip.has(f.id) || f.placement.mode !== "wall" || f.placement.wallId !== wallId) continue;
    const w = ed.footprint(f.id)?.widthMm ?? 0;
    spans.push({ startMm: f.placement.offsetMm, endMm: f.placement.offsetMm + w });
  }
  return spans;
}

/** How near (mm) an edge must come before it snaps. */
export const SNAP_THRESHOLD_MM = 40;
