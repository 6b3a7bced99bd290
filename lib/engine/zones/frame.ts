import type { Prism, Vec2 } from "../geometry/types";
import type { Placement } from "../plan/schema";
import type { SolvedRoom } from "../room/types";
import { mm } from "../units/length";

/** A local frame on the floor: x along a wall (or rotated), y into the room, mm. */
export interface Frame {
  origin: Vec2;
  x: Vec2;
  y: Vec2;
  /** Elevation of the frame's base above the floor, mm. */
  z0: number;
  /** Room for the thing along its wall: from -before to +after of the origin, mm (Infinity when free). */
  before: number;
  after: number;
}

/** Frame at a distance along a wall from its start corner, facing into the room. */
export function wallFrame(room: SolvedRoom, wallId: string, offsetMm: number, elevationMm = 0): Frame | null {
  const w = room.walls.find((x) => x.id === wallId);
  if (!w) return null;
  return {
    origin: { x: w.start.x + w.dir.x * offsetMm, y: w.start.y + w.dir.y * offsetMm },
    x: w.dir,
    y: w.inward,
    z0: elevationMm,
    before: offsetMm,
    after: w.lengthMm - offsetMm,
  };
}

/** Frame for a placement: on a wall, or free on the floor with a rotation (degrees, counter-clockwise). */
export function placementFrame(room: SolvedRoom, p: Placement): Frame | null {
  if (p.mode === "wall") return wallFrame(room, p.wallId, p.offsetMm, p.elevationMm);
  const r = (p.rotationDeg * Math.PI) / 180;
  const c = Math.cos(r);
  const s = Math.sin(r);
  return { origin: { x: p.xMm, y: p.yMm }, x: { x: c, y: s }, y: { x: -s, y: c }, z0: p.elevationMm, before: Infinity, after: Infinity };
}

/** A local point in world coordinates. */
export function toWorld(f: Frame, lx: number, ly: number): Vec2 {
  return { x: f.origin.x + f.x.x * lx + f.y.x * ly, y: f.origin.y + f.x.y * lx + f.y.y * ly };
}

/** A local rectangle [x0, x1] x [y0, y1] as a world prism from zMin to zMax (mm above the floor). */
export function rectPrism(f: Frame, x0: number, y0: number, x1: number, y1: number, zMin: number, zMax: number): Prism {
  return { polygon: [toWorld(f, x0, y0), toWorld(f, x1, y0), toWorld(f, x1, y1), toWorld(f, x0, y1)], zMin: mm(zMin), zMax: mm(zMax) };
}
