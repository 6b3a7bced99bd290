import type { SolvedWall } from "@/lib/engine/room/types";
import type { Vec2 } from "@/lib/engine/geometry/types";
import type { Placement, PlanDocument } from "@/lib/engine/plan/schema";
import type { Editor } from "../editor";
import { setPlacement } from "../store/fixture-ops";
import { wallExtent } from "./neighbours";

/** A fixture of a moving group: where it started and, against a wall, its extent along the wall (mm from its offset). */
export interface GroupMember {
  id: string;
  start: Placement;
  extent: { x0: number; x1: number };
}

/** The members of a group move, measured once when the move starts. */
export function groupMembers(ed: Editor, ids: readonly string[]): GroupMember[] {
  const out: GroupMember[] = [];
  for (const id of ids) {
    const f = ed.fixture(id);
    if (f) out.push({ id, start: f.placement, extent: wallExtent(ed, id) });
  }
  return out;
}

/** Keeps a fixture's real extent on its wall: its offset stays between the wall's start and end, mm. */
export function clampOnWall(offsetMm: number, extent: { x0: number; x1: number }, wallLengthMm: number): number {
  const lo = -extent.x0;
  const hi = Math.max(lo, wallLengthMm - extent.x1);
  return Math.min(hi, Math.max(lo, offsetMm));
}

/**
 * Moves a group by a floor vector (mm): free fixtures translate by it; fixtures against a wall slide
 * along their own wall by its component along that wall, and stay on the wall. Returns the new document.
 */
export function moveGroup(doc: PlanDocument, members: readonly GroupMember[], wallOf: (id: string) => SolvedWall | undefined, v: Vec2, skip?: string): PlanDocument {
  let next = doc;
  for (const m of members) {
    if (m.id === skip) continue;
    const p = m.start;
    if (p.mode === "free") {
      next = setPlacement(next, m.id, { ...p, xMm: p.xMm + v.x, yMm: p.yMm + v.y });
      continue;
    }
    const wall = wallOf(p.wallId);
    if (!wall) continue;
    const along = v.x * wall.dir.x + v.y * wall.dir.y;
    next = setPlacement(next, m.id, { ...p, offsetMm: clampOnWall(p.offsetMm + along, m.extent, wall.lengthMm) });
  }
  return next;
}
