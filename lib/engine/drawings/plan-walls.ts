import type { Opening } from "../plan/schema";
import type { SolvedRoom } from "../room/types";
import { DRAWN_WALL_THICKNESS_MM, frameOfWall, wallToWorld, type WallFrame } from "../room/wall-frame";
import type { Vec2 } from "../geometry/types";
import type { DrawingShape, SheetPoint } from "./types";

/** Floor point to plan sheet: x as it is, y turned down the sheet (mm). */
export const toPlanSheet = (p: Vec2): SheetPoint => ({ x: p.x, y: -p.y });

/** Longest a corner's mitre may reach, in wall thicknesses (a very sharp corner is cut short). */
const MAX_MITRE = 3;

/** The outer corner of the walls meeting at corner i (wall i-1 ends, wall i starts), mm. */
function outerCorner(room: SolvedRoom, i: number, t: number): Vec2 {
  const n = room.walls.length;
  const a = room.walls[(i + n - 1) % n].inward;
  const b = room.walls[i].inward;
  const c = room.corners[i];
  const k = 1 + a.x * b.x + a.y * b.y;
  if (k < 2 / (MAX_MITRE * MAX_MITRE)) return { x: c.x - b.x * t, y: c.y - b.y * t };
  return { x: c.x - (t * (a.x + b.x)) / k, y: c.y - (t * (a.y + b.y)) / k };
}

/** A piece of wall from `a` to `b` mm along it, as a polygon on the plan sheet; ends at a corner take the corner's mitre. */
function piece(frame: WallFrame, a: number, b: number, startOuter: Vec2 | null, endOuter: Vec2 | null, t: number): SheetPoint[] {
  const inA = wallToWorld(frame, a, 0);
  const inB = wallToWorld(frame, b, 0);
  const outA = startOuter ?? wallToWorld(frame, a, -t);
  const outB = endOuter ?? wallToWorld(frame, b, -t);
  return [inA, inB, outB, outA].map(toPlanSheet);
}

/** Walls with their thickness, cut where openings are; the openings themselves as their own marks (plan sheet, mm). */
export function wallShapes(room: SolvedRoom, openings: readonly Opening[]): DrawingShape[] {
  const t = DRAWN_WALL_THICKNESS_MM;
  const n = room.walls.length;
  const out: DrawingShape[] = [];
  room.walls.forEach((w, i) => {
    const frame = frameOfWall(w);
    const L = frame.lengthMm;
    const spans = openings
      .filter((o) => o.wallId === w.id)
      .map((o) => ({ id: o.id, a: Math.max(0, o.offsetMm), b: Math.min(L, o.offsetMm + o.widthMm) }))
      .filter((s) => s.b > s.a)
      .sort((p, q) => p.a - q.a || p.b - q.b);
    const startOuter = outerCorner(room, i, t);
    const endOuter = outerCorner(room, (i + 1) % n, t);
    let at = 0;
    for (const s of spans) {
      if (s.a > at) out.push({ type: "polygon", points: piece(frame, at, s.a, at === 0 ? startOuter : null, null, t), role: "wall", ref: w.id });
      out.push({ type: "polygon", points: piece(frame, s.a, s.b, s.a === 0 ? startOuter : null, s.b === L ? endOuter : null, t), role: "opening", ref: s.id });
      at = Math.max(at, s.b);
    }
    if (at < L) out.push({ type: "polygon", points: piece(frame, at, L, at === 0 ? startOuter : null, endOuter, t), role: "wall", ref: w.id });
  });
  return out;
}
