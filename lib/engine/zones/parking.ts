import type { WorldZone } from "../fixtures/types";
import type { Obstacle } from "../plan/schema";
import { rectPrism, type Frame } from "./frame";

type Bay = Extract<Obstacle, { kind: "parking-bay" }>;

/** Height kept clear over a parked car and its open doors, 6 ft (practice: most cars and small SUVs are lower; from memory). */
export const VEHICLE_HEIGHT_MM = 1828.8;

/**
 * A parking bay: the vehicle in the middle, nose toward the wall it is placed on (or along local
 * y when free), with room to open a door and step out on each side along its whole length.
 */
export function parkingZones(b: Bay, f: Frame): WorldZone[] {
  const s = b.doorSwingMm;
  const w = b.vehicleWidthMm;
  const l = b.vehicleLengthMm;
  const h = VEHICLE_HEIGHT_MM;
  const zones: WorldZone[] = [
    { id: `${b.id}:vehicle`, ownerId: b.id, purpose: "parking-vehicle", label: "Parked vehicle", prism: rectPrism(f, s, 0, s + w, l, 0, h) },
  ];
  if (s > 0) {
    zones.push(
      { id: `${b.id}:doors-left`, ownerId: b.id, purpose: "parking-doors", label: "Open car doors", prism: rectPrism(f, 0, 0, s, l, 0, h) },
      { id: `${b.id}:doors-right`, ownerId: b.id, purpose: "parking-doors", label: "Open car doors", prism: rectPrism(f, s + w, 0, 2 * s + w, l, 0, h) },
    );
  }
  return zones;
}
