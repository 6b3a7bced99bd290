import type { Placement, PlanDocument } from "@/lib/engine/plan/schema";
import type { Editor } from "../editor";
import { setPlacement } from "../store/fixture-ops";

/**
 * Moves a placement by a step. Against a wall, left/right slide along it (from its start toward
 * its end) and up/down raise or lower it; free, the four keys move it on the floor plan.
 */
export function nudgePlacement(p: Placement, dx: number, dy: number, wallLengthMm?: number, widthMm = 0): Placement {
  if (p.mode === "free") return { ...p, xMm: p.xMm + dx, yMm: p.yMm + dy };
  let offsetMm = p.offsetMm + dx;
  if (wallLengthMm !== undefined) offsetMm = Math.min(Math.max(0, wallLengthMm - widthMm), Math.max(0, offsetMm));
  return { ...p, offsetMm, elevationMm: Math.max(0, p.elevationMm + dy) };
}

/** Nudges every selected fixture by (dx, dy) steps of the grid (or the big step): one undo step. */
export function nudgeSelection(ed: Editor, dx: number, dy: number, big: boolean): void {
  const ui = ed.ui.getState();
  const step = big ? ui.bigStepMm : ui.gridStepMm;
  const ids = ed.selection;
  if (ids.length === 0) return;
  const changed = ed.edit((doc) => {
    let next: PlanDocument = doc;
    for (const id of ids) {
      const f = next.fixtures.find((x) => x.id === id);
      if (!f) continue;
      const wall = f.placement.mode === "wall" ? ed.wall(f.placement.wallId) : undefined;
      next = setPlacement(next, id, nudgePlacement(f.placement, dx * step, dy * step, wall?.lengthMm, ed.footprint(id)?.widthMm));
    }
    return next;
  });
  if (changed) {
    const f = ed.fixture(ids[0]);
    const where = f?.placement.mode === "wall" ? `${ed.formatLength(f.placement.offsetMm)} along the wall` : "";
    ed.announce(`Moved ${ids.length} fixture${ids.length > 1 ? "s" : ""} ${ed.formatLength(step)}${where ? `, now ${where}` : ""}.`);
  }
}

/** Turns free fixtures by `deg` counter-clockwise; fixtures against a wall keep facing the room. */
export function rotateSelection(ed: Editor, deg: number): void {
  const ids = ed.selection;
  ed.edit((doc) => {
    let next = doc;
    for (const id of ids) {
      const f = next.fixtures.find((x) => x.id === id);
      if (f?.placement.mode !== "free") continue;
      next = setPlacement(next, id, { ...f.placement, rotationDeg: (((f.placement.rotationDeg + deg) % 360) + 360) % 360 });
    }
    return next;
  });
}
