import type { Vec2 } from "@/lib/engine/geometry/types";
import type { Placement, PlanDocument } from "@/lib/engine/plan/schema";
import type { Editor } from "../editor";
import { setPlacement } from "../store/fixture-ops";
import { createIdle } from "./idle";
import { wallExtent, wallSpans, SNAP_THRESHOLD_MM } from "./neighbours";
import { snapAlongWall, snapToGrid } from "./snap";
import type { PointerInput, ToolState } from "./types";
import { alongWall } from "./wall-math";

/**
 * Dragging the selection. The grabbed fixture leads: against a wall it slides along the wall and
 * snaps; free, it follows the pointer on the grid. The rest of the selection moves by the same
 * amount. The whole drag is one undo step.
 */
export function createDragging(leadId: string, grab: Vec2): ToolState {
  let starts = new Map<string, Placement>();
  // The lead's real extent along its wall, measured once at the start (it does not change while sliding).
  let extent = { x0: 0, x1: 0 };

  function leadPlacement(ed: Editor, input: PointerInput, start: Placement): Placement {
    const snap = ed.ui.getState().snapping && !input.alt;
    const step = ed.ui.getState().gridStepMm;
    if (start.mode === "free") {
      const x = start.xMm + input.point.x - grab.x;
      const y = start.yMm + input.point.y - grab.y;
      return { ...start, xMm: snap ? snapToGrid(x, step) : x, yMm: snap ? snapToGrid(y, step) : y };
    }
    const wall = ed.wall(start.wallId);
    if (!wall) return start;
    const proposed = start.offsetMm + alongWall(wall, input.point) - alongWall(wall, grab);
    const snapped = snapAlongWall({
      offsetMm: proposed + extent.x0,
      widthMm: extent.x1 - extent.x0,
      wallLengthMm: wall.lengthMm,
      neighbours: wallSpans(ed, start.wallId, new Set(starts.keys())),
      gridStepMm: step,
      thresholdMm: SNAP_THRESHOLD_MM,
      enabled: snap,
    });
    return { ...start, offsetMm: snapped.offsetMm - extent.x0 };
  }

  return {
    id: "dragging",
    enter(ed) {
      const ids = ed.selection.includes(leadId) ? ed.selection : [leadId];
      starts = new Map();
      for (const id of ids) {
        const f = ed.fixture(id);
        if (f) starts.set(id, f.placement);
      }
      extent = wallExtent(ed, leadId);
      ed.history.beginGesture();
    },
    move(ed, input) {
      const leadStart = starts.get(leadId);
      if (!leadStart) return;
      const lead = leadPlacement(ed, input, leadStart);
      // The same shift for the followers: along the wall for wall fixtures, on the floor for free ones.
      const along = lead.mode === "wall" && leadStart.mode === "wall" ? lead.offsetMm - leadStart.offsetMm : 0;
      const dx = lead.mode === "free" && leadStart.mode === "free" ? lead.xMm - leadStart.xMm : 0;
      const dy = lead.mode === "free" && leadStart.mode === "free" ? lead.yMm - leadStart.yMm : 0;
      ed.edit((doc) => {
        let next: PlanDocument = setPlacement(doc, leadId, lead);
        for (const [id, p] of starts) {
          if (id === leadId) continue;
          if (p.mode === "wall") next = setPlacement(next, id, { ...p, offsetMm: p.offsetMm + along });
          else next = setPlacement(next, id, { ...p, xMm: p.xMm + dx, yMm: p.yMm + dy });
        }
        return next;
      });
    },
    up(ed) {
      ed.history.endGesture();
      const f = ed.fixture(leadId);
      if (f?.placement.mode === "wall") ed.announce(`Moved to ${ed.formatLength(f.placement.offsetMm)} from the wall start.`);
      ed.tools.go(createIdle());
    },
    cancel(ed) {
      ed.history.cancelGesture();
      ed.tools.go(createIdle());
    },
    exit(ed) {
      // Leaving by any path closes the gesture so history is never left paused.
      if (ed.history.inGesture) ed.history.endGesture();
    },
  };
}
