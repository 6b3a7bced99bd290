import type { WorldZone } from "../fixtures/types";
import type { CheckContext, SolidItem } from "./context";
import { polygonBounds, prismPenetration } from "./geom/polygon";

export interface Intrusion {
  solid: SolidItem;
  /** How deep it reaches into the zone, mm. */
  depthMm: number;
}

/** Solids reaching into a zone deeper than the collision tolerance (the zone's owner excluded). */
export function intrusions(ctx: CheckContext, zone: WorldZone, skip?: (s: SolidItem) => boolean): Intrusion[] {
  const out: Intrusion[] = [];
  for (const s of ctx.solids.query(polygonBounds(zone.prism.polygon))) {
    if (s.id === zone.ownerId || skip?.(s)) continue;
    const d = prismPenetration(zone.prism, s.prism);
    if (d > ctx.numbers.collisionToleranceMm) out.push({ solid: s, depthMm: d });
  }
  return out.sort((a, b) => b.depthMm - a.depthMm);
}
