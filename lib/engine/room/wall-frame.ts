import type { Vec2 } from "../geometry/types";
import type { SolvedRoom, SolvedWall } from "./types";

/** A wall's own frame: origin at its start corner, `along` toward its end, `inward` into the room (unit vectors; lengths mm). */
export interface WallFrame {
  wallId: string;
  origin: Vec2;
  along: Vec2;
  inward: Vec2;
  /** Solved length of the wall, mm. */
  lengthMm: number;
}

/**
 * How thick walls are drawn, mm (our own drawing size: the plan does not measure wall thickness).
 * Walls stand outside the floor polygon, so fixtures' backs sit on the inner face.
 */
export const DRAWN_WALL_THICKNESS_MM = 100;

/** The frame of one solved wall (mm); the one wall frame every view and tool uses. */
export function frameOfWall(w: SolvedWall): WallFrame {
  return { wallId: w.id, origin: w.start, along: w.dir, inward: w.inward, lengthMm: w.solvedLengthMm ?? Math.hypot(w.end.x - w.start.x, w.end.y - w.start.y) };
}

/** The frame of a wall by id, or undefined when the room has no such wall. */
export function wallFrame(room: SolvedRoom, wallId: string): WallFrame | undefined {
  const w = room.walls.find((x) => x.id === wallId);
  return w ? frameOfWall(w) : undefined;
}

/** World point (mm) of a spot `offsetAlongMm` from the wall's start and `distanceFromWallMm` out into the room. */
export function wallToWorld(frame: WallFrame, offsetAlongMm: number, distanceFromWallMm: number): Vec2 {
  return {
    x: frame.origin.x + frame.along.x * offsetAlongMm + frame.inward.x * distanceFromWallMm,
    y: frame.origin.y + frame.along.y * offsetAlongMm + frame.inward.y * distanceFromWallMm,
  };
}

/** The inverse of wallToWorld: a world point's offset along the wall and distance out from it, mm. */
export function worldToWall(frame: WallFrame, p: Vec2): { offsetAlongMm: number; distanceFromWallMm: number } {
  const dx = p.x - frame.origin.x;
  const dy = p.y - frame.origin.y;
  return { offsetAlongMm: dx * frame.along.x + dy * frame.along.y, distanceFromWallMm: dx * frame.inward.x + dy * frame.inward.y };
}

/** Heading of the wall, radians counter-clockwise from +x: the turn a fixture set against it takes. */
export function wallHeading(frame: WallFrame): number {
  return Math.atan2(frame.along.y, frame.along.x);
}

/**
 * Where a spot `offsetAlongMm` from the wall's start lies for a person standing in the room facing
 * the wall: mm from the wall's left end as they see it. For a counter-clockwise room the start
 * corner is on their right, so this is the solved length less the offset.
 */
export function fromViewersLeft(frame: WallFrame, offsetAlongMm: number): number {
  return frame.lengthMm - offsetAlongMm;
}

/** Distance of a floor point from the wall itself (the segment between its corners, not the endless line), mm. */
export function distanceToWallSegment(frame: WallFrame, p: Vec2): number {
  const { offsetAlongMm: t, distanceFromWallMm: d } = worldToWall(frame, p);
  const past = t < 0 ? -t : t > frame.lengthMm ? t - frame.lengthMm : 0;
  return Math.hypot(past, d);
}

/** The wall nearest a floor point, within `maxMm` of its segment (mm), or undefined. */
export function nearestWall(walls: readonly SolvedWall[], p: Vec2, maxMm = Infinity): SolvedWall | undefined {
  let best: SolvedWall | undefined;
  let bestD = maxMm;
  for (const w of walls) {
    const d = distanceToWallSegment(frameOfWall(w), p);
    if (d < bestD) {
      bestD = d;
      best = w;
    }
  }
  return best;
}
