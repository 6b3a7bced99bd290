import type { PlacedFixture } from "../fixtures/types";
import type { LocalBox, Vec2 } from "../geometry/types";
import { fromViewersLeft, worldToWall, type WallFrame } from "../room/wall-frame";
import type { FillRole } from "./types";

/** A box of a fixture seen from the room: its front face on the elevation sheet and how far it stands out from the wall. */
export interface FrontFace {
  /** Sheet box, mm: x from the viewer's left, y down (floor at 0). */
  x0: number;
  x1: number;
  y0: number;
  y1: number;
  /** Distance of its front from the wall, mm: nearer the viewer draws later. */
  frontMm: number;
  role: FillRole;
  fixtureId: string;
}

/** What each kind of box is drawn as: one table for every elevation. */
const FACE_ROLES: Record<string, FillRole> = {
  carcass: "carcass",
  back: "carcass",
  "toe-kick": "carcass",
  platform: "carcass",
  base: "carcass",
  frame: "carcass",
  leg: "carcass",
  upright: "carcass",
  "face-frame": "carcass",
  "drawer-front": "front",
  door: "front",
  countertop: "counter",
  "countertop-edge": "counter",
  counter: "counter",
  bench: "counter",
  shelf: "shelf",
  tool: "tool",
  track: "track",
  fence: "track",
  "stop-block": "track",
  stop: "track",
  arm: "rack",
  rack: "rack",
  cleat: "rack",
  panel: "rack",
  pegboard: "rack",
};

/** A fixture's local point on the floor in world mm. */
function toWorld(f: PlacedFixture, lx: number, ly: number): Vec2 {
  const c = Math.cos(f.rotation);
  const s = Math.sin(f.rotation);
  return { x: f.origin.x + lx * c - ly * s, y: f.origin.y + lx * s + ly * c };
}

function faceOf(f: PlacedFixture, b: LocalBox, frame: WallFrame): FrontFace {
  let a0 = Infinity, a1 = -Infinity, front = -Infinity;
  for (const [lx, ly] of [[b.x, b.y], [b.x + b.w, b.y], [b.x + b.w, b.y + b.d], [b.x, b.y + b.d]]) {
    const w = worldToWall(frame, toWorld(f, lx, ly));
    a0 = Math.min(a0, w.offsetAlongMm);
    a1 = Math.max(a1, w.offsetAlongMm);
    front = Math.max(front, w.distanceFromWallMm);
  }
  // Seen from the room the wall's start is on the right: sheet x runs from the viewer's left.
  const x0 = fromViewersLeft(frame, a1);
  const x1 = fromViewersLeft(frame, a0);
  return { x0, x1, y0: -(f.origin.z + b.z + b.h), y1: -(f.origin.z + b.z), frontMm: front, role: FACE_ROLES[b.role] ?? "fixture", fixtureId: f.id };
}

/** Whether face a is wholly behind face b (b nearer the viewer and covering it). */
const coveredBy = (a: FrontFace, b: FrontFace) => b.frontMm > a.frontMm && b.x0 <= a.x0 && b.x1 >= a.x1 && b.y0 <= a.y0 && b.y1 >= a.y1;

/** The front faces of one fixture as seen from the room, without those its own nearer boxes hide, back to front. */
export function frontFaces(f: PlacedFixture, frame: WallFrame): FrontFace[] {
  const faces = f.boxes.filter((b) => b.w > 0 && b.h > 0).map((b) => faceOf(f, b, frame));
  const seen = faces.filter((a) => !faces.some((b) => b !== a && coveredBy(a, b)));
  return seen.sort((p, q) => p.frontMm - q.frontMm);
}
