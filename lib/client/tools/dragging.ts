import type { Vec2 } from "@/lib/engine/geometry/types";
import type { Placement } from "@/lib/engine/plan/schema";
import type { SolvedWall } from "@/lib/engine/room/types";
import { distanceToWallSegment, frameOfWall, worldToWall } from "@/lib/engine/room/wall-frame";
import type { Editor } from "../editor";
import { setPlacement } from "../store/fixture-ops";
import { groupMembers, moveGroup, type GroupMember } from "./group-move";
import { createIdle } from "./idle";
import { wallSpans, SNAP_THRESHOLD_MM } from "./neighbours";
import { snapAlongWall, snapToGrid } from "./snap";
import type { PointerInput, ToolState } from "./types";

/**
 * How near (mm) the pointer must come to another wall for a fixture dragged alone to move onto it
 * (about 10 in: closer than the middle of a base cabinet's depth, so sliding along a wall does not jump).
 */
export const REATTACH_MM = 250;
/** The other wall must be this much nearer than the fixture's own wall, so the choice does not flicker in a corner. */
const REATTACH_MARGIN_MM = 20;

/**
 * The wall a fixture dragged to `p` should move onto, if any: the pointer has left the band in front
 * of its own wall (past either end, or farther out than `bandMm`), and another wall is within
 * REATTACH_MM and clearly nearer. Pushing a cabinet into a corner therefore never turns it.
 */
export function wallToJoin(walls: readonly SolvedWall[], p: Vec2, currentId: string, bandMm: number): SolvedWall | undefined {
  const current = walls.find((w) => w.id === currentId);
  if (current) {
    const f = frameOfWall(current);
    const { offsetAlongMm: t, distanceFromWallMm: out } = worldToWall(f, p);
    if (t >= 0 && t <= f.lengthMm && out <= bandMm) return undefined;
  }
  const dCurrent = current ? distanceToWallSegment(frameOfWall(current), p) : Infinity;
  let best: SolvedWall | undefined;
  let bestD = Math.min(REATTACH_MM, dCurrent - REATTACH_MARGIN_MM);
  for (const w of walls) {
    if (w.id === currentId) continue;
    const d = distanceToWallSegment(frameOfWall(w), p);
    if (d < bestD) {
      bestD = d;
      best = w;
    }
  }
  return best;
}

/**
 * Dragging the selection. The grabbed fixture leads: against a wall it slides along the wall and
 * snaps, and dragged alone it moves onto another wall the pointer comes near; free, it follows the
 * pointer on the grid. The rest of the selection moves with it: free fixtures by the same floor
 * vector, wall fixtures along their own walls by that vector's share along them. One undo step.
 */
export function createDragging(leadId: string, grab: Vec2): ToolState {
  let members: GroupMember[] = [];
  let lead: GroupMember | undefined;
  // Where along the fixture (mm from its offset) the pointer holds it; it keeps that hold on another wall.
  let holdAlong = 0;
  let wallId = "";
  // The lead's depth off its wall, mm: the pointer must leave that band (plus REATTACH_MM) to change walls.
  let depth = 0;
  // Neighbours' spans per wall, measured once: nothing but the dragged fixtures moves during a drag.
  const spans = new Map<string, { startMm: number; endMm: number }[]>();

  function spansOn(ed: Editor, id: string) {
    let s = spans.get(id);
    if (!s) {
      s = wallSpans(ed, id, new Set(members.map((m) => m.id)));
      spans.set(id, s);
    }
    return s;
  }

  function leadPlacement(ed: Editor, input: PointerInput, m: GroupMember): Placement {
    const ui = ed.ui.getState();
    const snap = ui.snapping && !input.alt;
    const step = ed.gridStepMm();
    const start = m.start;
    if (start.mode === "free") {
      const x = start.xMm + input.point.x - grab.x;
      const y = start.yMm + input.point.y - grab.y;
      return { ...start, xMm: snap ? snapToGrid(x, step) : x, yMm: snap ? snapToGrid(y, step) : y };
    }
    let wall = ed.wall(wallId);
    if (members.length === 1) {
      const other = wallToJoin(ed.derived.getState().derived?.room.walls ?? [], input.point, wallId, depth + REATTACH_MM);
      if (other) wall = other;
    }
    if (!wall) return start;
    wallId = wall.id;
    const snapped = snapAlongWall({
      offsetMm: worldToWall(frameOfWall(wall), input.point).offsetAlongMm - holdAlong + m.extent.x0,
      widthMm: m.extent.x1 - m.extent.x0,
      wallLengthMm: wall.lengthMm,
      neighbours: spansOn(ed, wall.id),
      gridStepMm: step,
      thresholdMm: SNAP_THRESHOLD_MM,
      enabled: snap,
    });
    return { ...start, wallId: wall.id, offsetMm: snapped.offsetMm - m.extent.x0 };
  }

  /** The floor vector the followers move by: the lead's own move, plus the pointer's move across a wall lead's wall. */
  function groupVector(ed: Editor, input: PointerInput, start: Placement, now: Placement): Vec2 {
    if (start.mode === "free" && now.mode === "free") return { x: now.xMm - start.xMm, y: now.yMm - start.yMm };
    if (start.mode !== "wall" || now.mode !== "wall") return { x: 0, y: 0 };
    const wall = ed.wall(start.wallId);
    if (!wall) return { x: 0, y: 0 };
    const along = now.offsetMm - start.offsetMm;
    const snap = ed.ui.getState().snapping && !input.alt;
    const frame = frameOfWall(wall);
    const acrossRaw = worldToWall(frame, input.point).distanceFromWallMm - worldToWall(frame, grab).distanceFromWallMm;
    const across = snap ? snapToGrid(acrossRaw, ed.gridStepMm()) : acrossRaw;
    return { x: wall.dir.x * along + wall.inward.x * across, y: wall.dir.y * along + wall.inward.y * across };
  }

  return {
    id: "dragging",
    enter(ed) {
      const ids = ed.selection.includes(leadId) ? [leadId, ...ed.selection.filter((id) => id !== leadId)] : [leadId];
      members = groupMembers(ed, ids);
      lead = members.find((m) => m.id === leadId);
      spans.clear();
      if (lead?.start.mode === "wall") {
        const wall = ed.wall(lead.start.wallId);
        wallId = lead.start.wallId;
        holdAlong = wall ? worldToWall(frameOfWall(wall), grab).offsetAlongMm - lead.start.offsetMm : 0;
        depth = ed.footprint(leadId)?.depthMm ?? 0;
      }
      ed.history.beginGesture();
    },
    move(ed, input) {
      if (!lead) return;
      const m = lead;
      const now = leadPlacement(ed, input, m);
      const v = members.length > 1 ? groupVector(ed, input, m.start, now) : { x: 0, y: 0 };
      ed.edit((doc) => moveGroup(setPlacement(doc, m.id, now), members, (id) => ed.wall(id), v, m.id));
    },
    up(ed) {
      ed.history.endGesture();
      const f = ed.fixture(leadId);
      const start = lead?.start;
      if (f?.placement.mode === "wall") {
        const moved = start?.mode === "wall" && start.wallId !== f.placement.wallId;
        const wallNo = (ed.wall(f.placement.wallId)?.index ?? 0) + 1;
        ed.announce(moved ? `Moved to wall ${wallNo}, ${ed.formatLength(f.placement.offsetMm)} from its start.` : `Moved to ${ed.formatLength(f.placement.offsetMm)} from the wall start.`);
      }
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

