import type { Derived } from "../derive-types";
import type { WorldZone } from "../fixtures/types";
import type { Vec2 } from "../geometry/types";
import type { PlanDocument } from "../plan/schema";
import { DRAWN_WALL_THICKNESS_MM, frameOfWall, wallToWorld } from "../room/wall-frame";
import { formatLength } from "../units/format-length";
import { dimension } from "./dimensions";
import { freeLabel, legendLabels, placeLabel, type LabelContext } from "./labels";
import { OBSTACLE_NAMES, OPENING_NAMES, wallName } from "./names";
import { planDetailDimensions } from "./plan-details";
import { toPlanSheet, wallShapes } from "./plan-walls";
import { finishDrawing, textSizeFor } from "./sheet";
import { rectAround, RectIndex } from "./text-fit";
import type { DimensionLine, Drawing, DrawingShape, SheetPoint } from "./types";

/** Options for the plan view. */
export interface PlanViewOptions {
  /** Draw the keep-clear zones (on their own layer, which a viewer may hide). Default true. */
  keepClear?: boolean;
  /** Add each wall fixture's depth, the walkways in front of what stands on the floor and the clear length each side of a miter saw's blade. Default false. */
  detail?: boolean;
  /** Lay the text out at this height instead of the drawing's own, sheet mm (a live view sets it from its zoom). */
  textSizeMm?: number;
}

/** A fixture hangs above the floor (drawn dashed in plan) when its lowest point is this high, mm. */
const OFF_FLOOR_MM = 1;

const upright = (deg: number) => (deg > 90 ? deg - 180 : deg <= -90 ? deg + 180 : deg);
const sheetAngle = (a: SheetPoint, b: SheetPoint) => (Math.atan2(b.y - a.y, b.x - a.x) * 180) / Math.PI;

/**
 * A door's swing from its keep-clear zone (the engine's one account of which jamb is hinged): the
 * hinge is the jamb every point of the arc is one door width from. Arc and open leaf, plan sheet mm.
 */
function swingMarks(zone: WorldZone, jambs: [Vec2, Vec2], ref: string): DrawingShape[] {
  const poly = zone.prism.polygon;
  const far = (j: Vec2) => Math.max(...poly.map((p) => Math.hypot(p.x - j.x, p.y - j.y)));
  const hinge = far(jambs[0]) <= far(jambs[1]) ? jambs[0] : jambs[1];
  const closed = hinge === jambs[0] ? jambs[1] : jambs[0];
  const h = poly.reduce((best, p, i) => (Math.hypot(p.x - hinge.x, p.y - hinge.y) < Math.hypot(poly[best].x - hinge.x, poly[best].y - hinge.y) ? i : best), 0);
  const arc = [...poly.slice(h + 1), ...poly.slice(0, h)];
  const open = arc.reduce((best, p) => (Math.hypot(p.x - closed.x, p.y - closed.y) > Math.hypot(best.x - closed.x, best.y - closed.y) ? p : best), arc[0]);
  return [
    { type: "polyline", points: arc.map(toPlanSheet), role: "door-swing", ref },
    { type: "polyline", points: [hinge, open].map(toPlanSheet), role: "door-swing", ref },
  ];
}

/** The plan view's own text height for this room, sheet mm. */
function planTextSize(derived: Derived): number {
  const box = rectAround(derived.room.corners.map(toPlanSheet));
  return textSizeFor(Math.max(box.x1 - box.x0, box.y1 - box.y0) + 2 * DRAWN_WALL_THICKNESS_MM);
}

/** Each wall's solved length, outside the room (plan sheet mm). */
function wallLengthDimensions(derived: Derived, size: number, format: (mm: number) => string): DimensionLine[] {
  const t = DRAWN_WALL_THICKNESS_MM;
  return derived.room.walls.map((w) => {
    const f = frameOfWall(w);
    const out = { x: -f.inward.x, y: f.inward.y };
    return dimension(toPlanSheet(w.start), toPlanSheet(w.end), out, t + size * 1.5, f.lengthMm, { sizeMm: size, format, chain: "overall", ref: w.id });
  });
}

/**
 * The plan view's dimensions alone, as planView lays them out (plan sheet mm), for a live view
 * that draws its own marks: each wall's solved length.
 */
export function planViewDimensions(plan: PlanDocument, derived: Derived, opts: PlanViewOptions = {}): DimensionLine[] {
  const size = opts.textSizeMm ?? planTextSize(derived);
  const format = (v: number) => formatLength(v, { units: plan.settings.units, precision: plan.settings.precision });
  const walls = wallLengthDimensions(derived, size, format);
  return opts.detail ? [...walls, ...planDetailDimensions(plan, derived, { sizeMm: size, format, chain: "" })] : walls;
}

/**
 * The room from above, in sheet mm (x as in the room, y down the sheet): walls with their
 * thickness and openings, door swings, obstacles, fixtures' footprints (wall-hung ones dashed),
 * keep-clear zones on their own layer, every fixture named, and each wall's solved length.
 */
export function planView(plan: PlanDocument, derived: Derived, opts: PlanViewOptions = {}): Drawing {
  const room = derived.room;
  const t = DRAWN_WALL_THICKNESS_MM;
  const size = opts.textSizeMm ?? planTextSize(derived);
  const format = (v: number) => formatLength(v, { units: plan.settings.units, precision: plan.settings.precision });
  const shapes: DrawingShape[] = [{ type: "polygon", points: room.corners.map(toPlanSheet), role: "floor" }];

  if (opts.keepClear ?? true) for (const z of derived.zones) shapes.push({ type: "polygon", points: z.prism.polygon.map(toPlanSheet), role: "keep-clear", ref: z.id, layer: "keep-clear" });
  shapes.push(...wallShapes(room, plan.room.openings));
  for (const o of plan.room.openings) {
    const w = room.walls.find((x) => x.id === o.wallId);
    const zone = derived.zones.find((z) => z.ownerId === o.id && z.purpose === "entry-door-swing");
    if (!w || !zone) continue;
    const f = frameOfWall(w);
    shapes.push(...swingMarks(zone, [wallToWorld(f, o.offsetMm, 0), wallToWorld(f, o.offsetMm + o.widthMm, 0)], o.id));
  }
  for (const ob of derived.obstacles) shapes.push({ type: "polygon", points: ob.body.polygon.map(toPlanSheet), role: "obstacle", ref: ob.id });
  const onFloor = derived.fixtures.filter((f) => f.body.zMin <= OFF_FLOOR_MM);
  const above = derived.fixtures.filter((f) => f.body.zMin > OFF_FLOOR_MM);
  for (const f of onFloor) shapes.push({ type: "polygon", points: f.body.polygon.map(toPlanSheet), role: "fixture", ref: f.id });
  for (const f of above) shapes.push({ type: "polygon", points: f.body.polygon.map(toPlanSheet), role: "fixture-above", ref: f.id });

  // Dimensions and wall names outside each wall.
  const dimensions = planViewDimensions(plan, derived, { ...opts, textSizeMm: size });
  const ctx: LabelContext = { sizeMm: size, taken: new RectIndex(size * 8), blockers: new RectIndex(size * 8), labels: [], leaders: [], legend: [] };
  room.walls.forEach((w, i) => {
    const f = frameOfWall(w);
    const mid = toPlanSheet(wallToWorld(f, f.lengthMm / 2, -(t + size * 4.2)));
    const label = freeLabel(wallName(plan.room.walls.find((x) => x.id === w.id)?.label, i), mid, size, upright(sheetAngle(toPlanSheet(w.start), toPlanSheet(w.end))), "wall-name", w.id);
    ctx.labels.push(label);
  });

  // Names: what stands on the floor first, then what hangs above it, then obstacles.
  for (const f of derived.fixtures) ctx.blockers.add(rectAround(f.body.polygon.map(toPlanSheet)));
  const sites = [...onFloor, ...above].map((f) => {
    const [p0, p1, , p3] = f.body.polygon.map(toPlanSheet);
    const at = (u: number, v: number) => ({ x: p0.x + (p1.x - p0.x) * u + (p3.x - p0.x) * v, y: p0.y + (p1.y - p0.y) * u + (p3.y - p0.y) * v });
    const depth = Math.hypot(p3.x - p0.x, p3.y - p0.y) || 1;
    return {
      text: f.label,
      ref: f.id,
      region: [p0, p1, f.body.polygon.map(toPlanSheet)[2], p3],
      centres: [0.5, 0.3, 0.7, 0.2, 0.8].map((v) => at(0.5, v)),
      angles: [0, upright(sheetAngle(p0, p1))].filter((a, i, all) => all.indexOf(a) === i),
      anchor: at(0.5, 1),
      outward: { x: (p3.x - p0.x) / depth, y: (p3.y - p0.y) / depth },
    };
  });
  for (const s of sites) placeLabel(s, ctx);
  for (const ob of derived.obstacles) {
    const kind = plan.room.obstacles.find((o) => o.id === ob.id)?.kind;
    const region = ob.body.polygon.map(toPlanSheet);
    const r = rectAround(region);
    const c = { x: (r.x0 + r.x1) / 2, y: (r.y0 + r.y1) / 2 };
    placeLabel({ text: kind ? OBSTACLE_NAMES[kind] : "Obstacle", ref: ob.id, region, centres: [c], angles: [0], anchor: c, outward: { x: 0, y: -1 } }, ctx);
  }
  for (const l of ctx.leaders) shapes.push({ type: "polyline", points: l.points, role: "leader", ...(l.ref ? { ref: l.ref } : {}) });
  const extent = rectAround([...shapes.flatMap((s) => s.points), ...dimensions.map((d) => d.textAt)]);
  const labels = [...ctx.labels, ...legendLabels(ctx.legend, { x: extent.x0, y: extent.y1 + size * 5.5 }, size)];
  const openingWords = plan.room.openings.map((o) => OPENING_NAMES[o.kind].toLowerCase());
  return finishDrawing({
    kind: "plan",
    title: "Floor plan of the room",
    description: `The room from above: ${room.walls.length} walls (${room.walls.map((w) => format(frameOfWall(w).lengthMm)).join(", ")})${openingWords.length ? `, ${openingWords.join(", ")}` : ""}${derived.fixtures.length ? `, and ${derived.fixtures.map((f) => f.label).join(", ")}` : ", no fixtures yet"}.`,
    textSizeMm: size,
    shapes,
    labels,
    dimensions,
    legend: ctx.legend,
  });
}
