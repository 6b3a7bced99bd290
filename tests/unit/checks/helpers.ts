// Hand-built derived plans for the rule tests: a rectangular room and fixtures as boxes.
import type { Derived, PlacedObstacle } from "@/lib/engine/derive-types";
import type { LocalBox } from "@/lib/engine/geometry/types";
import type { Part, PlacedFixture, WorldZone } from "@/lib/engine/fixtures/types";
import { PLAN_SCHEMA_VERSION, planDocumentSchema, type PlanDocument, type PlanDocumentInput } from "@/lib/engine/plan/schema";
import type { SolvedRoom } from "@/lib/engine/room/types";
import { mm } from "@/lib/engine/units/length";
import { roomZones } from "@/lib/engine/zones";

export const IN = 25.4;
export const FT = 304.8;

/** A W x D rectangular room, corners counter-clockwise from the origin; walls w1..w4. */
export function rectRoom(W: number, D: number, ceiling = 2743): SolvedRoom {
  const c = [
    { x: 0, y: 0 },
    { x: W, y: 0 },
    { x: W, y: D },
    { x: 0, y: D },
  ];
  const walls = c.map((start, i) => {
    const end = c[(i + 1) % 4];
    const len = Math.hypot(end.x - start.x, end.y - start.y);
    const dir = { x: (end.x - start.x) / len, y: (end.y - start.y) / len };
    return { id: `w${i + 1}`, index: i, start, end, dir, inward: { x: -dir.y, y: dir.x }, lengthMm: len };
  });
  return {
    corners: c,
    walls,
    ceilingHeightMm: ceiling,
    report: { cornerAnglesDeg: [90, 90, 90, 90], offSquareDeg: [0, 0, 0, 0], diagonalDifferenceMm: 0, closureErrorMm: 0, method: "assumed-square", notes: [] },
  };
}

type RoomInput = PlanDocumentInput["room"];

/** A valid plan for a W x D room (defaults filled by the schema). */
export function makePlan(W: number, D: number, over: { room?: Partial<RoomInput>; settings?: PlanDocumentInput["settings"]; fixtures?: PlanDocumentInput["fixtures"]; materials?: PlanDocumentInput["materials"] } = {}): PlanDocument {
  return planDocumentSchema.parse({
    schemaVersion: PLAN_SCHEMA_VERSION,
    settings: over.settings ?? {},
    room: {
      walls: [
        { id: "w1", lengthMm: W },
        { id: "w2", lengthMm: D },
        { id: "w3", lengthMm: W },
        { id: "w4", lengthMm: D },
      ],
      ...over.room,
    },
    materials: over.materials ?? [],
    fixtures: over.fixtures ?? [],
  });
}

export interface LocalZoneSpec {
  purpose: string;
  x: number;
  y: number;
  z: number;
  w: number;
  d: number;
  h: number;
}

export interface BoxSpec {
  kind?: string;
  label?: string;
  /** Origin: back-left corner, world mm. */
  x: number;
  y: number;
  z?: number;
  w: number;
  d: number;
  h: number;
  /** Radians, counter-clockwise. */
  rot?: number;
  /** Work surface above the fixture's base, mm. */
  work?: number;
  zones?: LocalZoneSpec[];
  boxes?: LocalBox[];
}

function worldRect(ox: number, oy: number, rot: number, x0: number, y0: number, x1: number, y1: number) {
  const c = Math.cos(rot);
  const s = Math.sin(rot);
  const p = (x: number, y: number) => ({ x: ox + c * x - s * y, y: oy + s * x + c * y });
  return [p(x0, y0), p(x1, y0), p(x1, y1), p(x0, y1)];
}

/** A fixture as one box, with optional zones in its local frame. */
export function fixture(id: string, b: BoxSpec): PlacedFixture {
  const rot = b.rot ?? 0;
  const z = b.z ?? 0;
  const zones: WorldZone[] = (b.zones ?? []).map((lz, i) => ({
    id: `${id}:${lz.purpose}-${i}`,
    ownerId: id,
    purpose: lz.purpose,
    label: lz.purpose,
    prism: { polygon: worldRect(b.x, b.y, rot, lz.x, lz.y, lz.x + lz.w, lz.y + lz.d), zMin: mm(z + lz.z), zMax: mm(z + lz.z + lz.h) },
  }));
  return {
    id,
    kind: b.kind ?? "base-cabinet",
    label: b.label ?? id,
    footprint: { widthMm: b.w, depthMm: b.d, heightMm: b.h },
    origin: { x: b.x, y: b.y, z },
    rotation: rot,
    body: { polygon: worldRect(b.x, b.y, rot, 0, 0, b.w, b.d), zMin: mm(z), zMax: mm(z + b.h) },
    boxes: b.boxes ?? [],
    zones,
    workSurfaceMm: b.work,
  };
}

/** An obstacle as an axis-aligned box. */
export function obstacle(id: string, kind: string, x: number, y: number, w: number, d: number, zMin: number, zMax: number): PlacedObstacle {
  return { id, kind, body: { polygon: worldRect(x, y, 0, 0, 0, w, d), zMin: mm(zMin), zMax: mm(zMax) } };
}

/** Derived results by hand: fixture zones plus the room's own zones. */
export function derive(plan: PlanDocument, room: SolvedRoom, fixtures: PlacedFixture[], obstacles: PlacedObstacle[] = [], parts: Part[] = []): Derived {
  return { room, fixtures, obstacles, zones: [...fixtures.flatMap((f) => f.zones), ...roomZones(plan, room)], parts, hardware: [] };
}

/** A counter: 24 in deep, 36 in high (kitchen cabinet convention, practice). */
export const counter = (id: string, x: number, w: number, extra: Partial<BoxSpec> = {}) =>
  fixture(id, { kind: "base-cabinet", x, y: 0, w, d: 24 * IN, h: 36 * IN, work: 36 * IN, ...extra });
