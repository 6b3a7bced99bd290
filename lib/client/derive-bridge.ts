import type { Derived, PlacedObstacle } from "@/lib/engine/derive-types";
import type { FixtureContext, PlacedFixture, WorldZone } from "@/lib/engine/fixtures/types";
import type { FixtureDoc, PlanDocument } from "@/lib/engine/plan/schema";
import type { SolvedRoom } from "@/lib/engine/room/types";
import { solveRoom } from "@/lib/engine/room/solve";
import { roomZones } from "@/lib/engine/zones";
import { placementFrame, rectPrism } from "@/lib/engine/zones/frame";
import { kindOf } from "./kinds";

/**
 * Places fixtures with the engine's own pieces (room solver, placement frames, each kind's boxes
 * and zones) while the engine's derivePlan is not exported yet. Counter height of neighbours on
 * the same wall (within 5 mm) is passed to tool shelves.
 */
export function deriveWithEngineParts(doc: PlanDocument): Derived {
  const room = solveRoom(doc.room);
  const base: FixtureContext = { settings: doc.settings, materials: doc.materials };
  const surfaces = new Map<string, { wallId: string; from: number; to: number; topMm: number }>();
  for (const f of doc.fixtures) {
    const k = kindOf(f.kind);
    if (!k || f.placement.mode !== "wall" || !k.workSurfaceMm) continue;
    const p = k.paramsSchema.safeParse(f.params);
    if (!p.success) continue;
    const top = k.workSurfaceMm(p.data, base);
    if (top === undefined) continue;
    const w = k.footprint(p.data, base).widthMm;
    surfaces.set(f.id, { wallId: f.placement.wallId, from: f.placement.offsetMm, to: f.placement.offsetMm + w, topMm: top + f.placement.elevationMm });
  }
  const fixtures: PlacedFixture[] = [];
  for (const f of doc.fixtures) {
    const placed = placeOne(f, room, base, surfaces);
    if (placed) fixtures.push(placed);
  }
  const obstacles: PlacedObstacle[] = [];
  for (const o of doc.room.obstacles) {
    const fr = placementFrame(room, o.placement);
    if (!fr) continue;
    const [w, d, h] = o.kind === "water-heater" ? [o.diameterMm, o.diameterMm, o.heightMm] : o.kind === "parking-bay" ? [o.vehicleWidthMm, o.vehicleLengthMm, 1500] : o.kind === "post" ? [o.widthMm, o.depthMm, room.ceilingHeightMm] : o.kind === "panel" ? [o.widthMm, o.depthMm, o.heightMm] : [o.widthMm, 30, o.heightMm];
    const z0 = o.kind === "panel" ? Math.max(fr.z0, 1000) : fr.z0;
    obstacles.push({ id: o.id, kind: o.kind, body: rectPrism(fr, 0, 0, w, d, z0, z0 + h) });
  }
  const zones: WorldZone[] = [...roomZones(doc, room), ...fixtures.flatMap((f) => f.zones)];
  return { room, fixtures, obstacles, zones, parts: [], hardware: [] };
}

function placeOne(f: FixtureDoc, room: SolvedRoom, base: FixtureContext, surfaces: Map<string, { wallId: string; from: number; to: number; topMm: number }>): PlacedFixture | null {
  const k = kindOf(f.kind);
  const fr = placementFrame(room, f.placement);
  if (!k || !fr) return null;
  const parsed = k.paramsSchema.safeParse(f.params);
  if (!parsed.success) return null;
  const p = parsed.data;
  let ctx = base;
  if (f.placement.mode === "wall") {
    const me = f.placement;
    const w = k.footprint(p, base).widthMm;
    const n = [...surfaces.entries()].find(([id, s]) => id !== f.id && s.wallId === me.wallId && (Math.abs(s.to - me.offsetMm) < 5 || Math.abs(s.from - (me.offsetMm + w)) < 5));
    if (n) ctx = { ...base, neighbourCounterHeightMm: n[1].topMm - me.elevationMm };
  }
  const fp = k.footprint(p, ctx);
  const boxes = k.boxes(p, ctx);
  const zones: WorldZone[] = k.zones(p, ctx).map((z) => ({
    id: `${f.id}:${z.key}`,
    ownerId: f.id,
    purpose: z.purpose,
    label: z.label,
    prism: rectPrism(fr, z.box.x, z.box.y, z.box.x + z.box.w, z.box.y + z.box.d, fr.z0 + z.box.z, fr.z0 + z.box.z + z.box.h),
  }));
  const surface = k.workSurfaceMm?.(p, ctx);
  return {
    id: f.id,
    kind: f.kind,
    label: f.label || k.title,
    footprint: fp,
    origin: { x: fr.origin.x, y: fr.origin.y, z: fr.z0 },
    rotation: Math.atan2(fr.x.y, fr.x.x),
    body: rectPrism(fr, 0, 0, fp.widthMm, fp.depthMm, fr.z0, fr.z0 + fp.heightMm),
    boxes,
    zones,
    workSurfaceMm: surface,
  };
}
