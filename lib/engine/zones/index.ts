import type { WorldZone } from "../fixtures/types";
import type { PlanDocument } from "../plan/schema";
import type { SolvedRoom } from "../room/types";
import { placementFrame, wallFrame } from "./frame";
import { openingZones } from "./openings";
import { panelZones } from "./panel";
import { parkingZones } from "./parking";

/** Keep-clear zones owned by the room itself: obstacles and openings (panel working space, door swings, garage door track, parking bay, windows). World mm. */
export function roomZones(plan: PlanDocument, room: SolvedRoom): WorldZone[] {
  const out: WorldZone[] = [];
  const ceiling = room.ceilingHeightMm;
  for (const op of plan.room.openings) {
    const f = wallFrame(room, op.wallId, op.offsetMm);
    if (f) out.push(...openingZones(op, f, ceiling));
  }
  for (const ob of plan.room.obstacles) {
    const f = placementFrame(room, ob.placement);
    if (!f) continue;
    if (ob.kind === "panel") out.push(...panelZones(ob, f, ceiling));
    else if (ob.kind === "parking-bay") out.push(...parkingZones(ob, f));
  }
  return out;
}
