import type { WorldZone } from "../fixtures/types";
import type { PlanDocument } from "../plan/schema";
import type { SolvedRoom } from "../room/types";

/** Keep-clear zones owned by the room itself: obstacles and openings (panel working space, door swings, garage door track, parking bay). */
export function roomZones(_plan: PlanDocument, _room: SolvedRoom): WorldZone[] {
  return [];
}
