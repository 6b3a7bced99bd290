import { wallToWorld, type WallFrame } from "../room/wall-frame";
import type { SheetPoint } from "./types";

/** A point in the room, mm (x, y on the floor, z up). */
export interface RoomPoint {
  x: number;
  y: number;
  z: number;
}

/** A plan-view sheet point back on the floor plan at height `zMm` (the inverse of toPlanSheet), mm. */
export function planSheetToRoom(p: SheetPoint, zMm: number): RoomPoint {
  return { x: p.x, y: -p.y, z: zMm };
}

/**
 * An elevation sheet point (x from the viewer's left, y down from the floor) back on the wall,
 * `distanceFromWallMm` out into the room, mm: where a live view draws the elevation's marks.
 */
export function elevationSheetToRoom(frame: WallFrame, p: SheetPoint, distanceFromWallMm: number): RoomPoint {
  const w = wallToWorld(frame, frame.lengthMm - p.x, distanceFromWallMm);
  return { x: w.x, y: w.y, z: -p.y };
}
