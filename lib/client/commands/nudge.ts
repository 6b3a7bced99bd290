import type { PlanDocument } from "@/lib/engine/plan/schema";
import type { Editor } from "../editor";
import { setPlacement } from "../store/fixture-ops";
import { groupMembers, moveGroup } from "../tools/group-move";

/**
 * Nudges every selected fixture by (dx, dy) grid steps (or big steps): one undo step. The first
 * selected fixture sets the direction: against a wall, left/right run along its wall and up/down
 * raise or lower what stands against walls; free, the keys move on the floor plan. The others move
 * like a drag: free fixtures by the same floor vector, wall fixtures along their own wall by its share.
 */
export function nudgeSelection(ed: Editor, dx: number, dy: number, big: boolean): void {
  const step = ed.gridStepMm(big);
  const ids = ed.selection;
  if (ids.length === 0) return;
  const lead = ed.fixture(ids[0])?.placement;
  const leadWall = lead?.mode === "wall" ? ed.wall(lead.wallId) : undefined;
  const members = groupMembers(ed, ids);
  const raise = !!leadWall && dy !== 0;
  const v = leadWall ? { x: leadWall.dir.x * dx * step, y: leadWall.dir.y * dx * step } : { x: dx * step, y: dy * step };
  const changed = ed.edit((doc) => {
    if (!raise) return moveGroup(doc, members, (id) => ed.wall(id), v);
    let next: PlanDocument = doc;
    for (const m of members) next = setPlacement(next, m.id, { ...m.start, elevationMm: Math.max(0, m.start.elevationMm + dy * step) });
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
