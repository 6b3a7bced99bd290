import type { Object3D, Raycaster } from "three";
import type { Finding } from "@/lib/engine/checks/types";
import { pickHoveredZone } from "./zone-info";
import { zoneStates, type ZoneState } from "./zone-states";

let lastFindings: readonly Finding[] | null = null;
let lastStates = new Map<string, ZoneState>();

/** Zone states, remembered for the last findings list (a hover asks many times between edits). */
function statesOf(findings: readonly Finding[]): ReadonlyMap<string, ZoneState> {
  if (findings !== lastFindings) {
    lastFindings = findings;
    lastStates = zoneStates(findings);
  }
  return lastStates;
}

/** The drawn keep-clear zone under the ray (worst state first, then nearest), or null. */
export function zoneUnderRay(ray: Raycaster, zonesGroup: Object3D | undefined, findings: readonly Finding[]): string | null {
  if (!zonesGroup) return null;
  const hits = ray.intersectObjects(zonesGroup.children, false);
  const ids: string[] = [];
  for (const h of hits) {
    const id = (h.object.userData as { zoneId?: string }).zoneId;
    if (id && !ids.includes(id)) ids.push(id);
  }
  return pickHoveredZone(ids, statesOf(findings));
}
