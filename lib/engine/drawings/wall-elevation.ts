import type { Derived } from "../derive-types";
import type { PlacedFixture } from "../fixtures/types";
import type { PlanDocument } from "../plan/schema";
import { DRAWN_WALL_THICKNESS_MM, frameOfWall, fromViewersLeft, worldToWall, type WallFrame } from "../room/wall-frame";
import { formatLength } from "../units/format-length";
import { breakpoints, chainAlong, type DimensionStyle } from "./dimensions";
import { elevationLevelDimensions } from "./elevation-levels";
import { frontFaces, type FrontFace } from "./fixture-faces";
import { legendLabels, placeLabel, type LabelContext } from "./labels";
import { OBSTACLE_NAMES, OPENING_NAMES, wallName } from "./names";
import { finishDrawing, textSizeFor } from "./sheet";
import { RectIndex, type SheetRect } from "./text-fit";
import type { DimensionLine, Drawing, DrawingShape } from "./types";

/** Obstacles standing free within this distance of a wall are drawn on its elevation, mm (our own choice). */
const NEAR_WALL_MM = 300;
/** A fixture whose lowest box is this far above the floor hangs on the wall (its own dimension chain), mm. */
const OFF_FLOOR_MM = 1;

const rectShape = (r: SheetRect, role: DrawingShape["role"], ref?: string): DrawingShape => ({
  type: "polygon",
  points: [{ x: r.x0, y: r.y0 }, { x: r.x1, y: r.y0 }, { x: r.x1, y: r.y1 }, { x: r.x0, y: r.y1 }],
  role,
  ...(ref ? { ref } : {}),
});

/** A span along the wall as a sheet box: x from the viewer's left, y down from the floor (mm). */
function spanRect(frame: WallFrame, along0: number, along1: number, z0: number, z1: number): SheetRect {
  return { x0: fromViewersLeft(frame, along1), x1: fromViewersLeft(frame, along0), y0: -z1, y1: -z0 };
}

interface Item {
  ref: string;
  text: string;
  rect: SheetRect;
}

/** Options for a wall elevation. */
export interface WallElevationOptions {
  /** Add the detail a woodworker checks with a tape: counter heights, tool shelf and table, shelf and arm heights, counter-to-upper gaps. Default false. */
  detail?: boolean;
  /** Lay the text out at this height instead of the drawing's own, sheet mm (a live view sets it from its zoom). */
  textSizeMm?: number;
}

/**
 * One wall seen from inside the room, in sheet mm: the viewer faces the wall, so the drawing's left
 * is their left (the wall's end corner in a counter-clockwise room). Its solved length, the front
 * faces of the fixtures against it, its openings and obstacles, dimension chains along the floor
 * that add up to the solved length, and a height chain. Null when the wall is not in the room.
 */
export function wallElevation(plan: PlanDocument, derived: Derived, wallId: string, opts: WallElevationOptions = {}): Drawing | null {
  const wall = derived.room.walls.find((w) => w.id === wallId);
  if (!wall) return null;
  const frame = frameOfWall(wall);
  const L = frame.lengthMm;
  const H = derived.room.ceilingHeightMm;
  const t = DRAWN_WALL_THICKNESS_MM;
  const size = opts.textSizeMm ?? textSizeFor(Math.max(L, H));
  const format = (v: number) => formatLength(v, { units: plan.settings.units, precision: plan.settings.precision });
  const name = wallName(plan.room.walls.find((w) => w.id === wallId)?.label, wall.index);
  const shapes: DrawingShape[] = [
    rectShape({ x0: 0, y0: -H, x1: L, y1: 0 }, "wall-face", wallId),
    // The walls at either corner, cut through, and the floor.
    rectShape({ x0: -t, y0: -H, x1: 0, y1: 0 }, "wall"),
    rectShape({ x0: L, y0: -H, x1: L + t, y1: 0 }, "wall"),
    rectShape({ x0: -t, y0: 0, x1: L + t, y1: t / 2 }, "wall"),
  ];

  const openings: Item[] = plan.room.openings
    .filter((o) => o.wallId === wallId)
    .map((o) => {
      const bottom = o.kind === "window" ? o.sillMm : 0;
      return { ref: o.id, text: OPENING_NAMES[o.kind], rect: spanRect(frame, o.offsetMm, o.offsetMm + o.widthMm, bottom, Math.min(H, bottom + o.heightMm)) };
    });
  for (const o of openings) shapes.push(rectShape(o.rect, "opening", o.ref));

  const obstacles: Item[] = [];
  for (const ob of derived.obstacles) {
    const doc = plan.room.obstacles.find((o) => o.id === ob.id);
    const onThis = doc?.placement.mode === "wall" && doc.placement.wallId === wallId;
    const pts = ob.body.polygon.map((p) => worldToWall(frame, p));
    const near = Math.min(...pts.map((p) => p.distanceFromWallMm));
    const a0 = Math.max(0, Math.min(...pts.map((p) => p.offsetAlongMm)));
    const a1 = Math.min(L, Math.max(...pts.map((p) => p.offsetAlongMm)));
    if (!onThis && (doc?.placement.mode === "wall" || near > NEAR_WALL_MM || near < -1 || a1 <= a0)) continue;
    obstacles.push({ ref: ob.id, text: OBSTACLE_NAMES[(doc?.kind ?? "post") as keyof typeof OBSTACLE_NAMES] ?? "Obstacle", rect: spanRect(frame, a0, a1, ob.body.zMin, Math.min(H, ob.body.zMax)) });
  }
  for (const o of obstacles) shapes.push(rectShape(o.rect, "obstacle", o.ref));

  const docs = new Map(plan.fixtures.map((f) => [f.id, f]));
  const onWall = derived.fixtures.filter((f) => {
    const p = docs.get(f.id)?.placement;
    return p?.mode === "wall" && p.wallId === wallId;
  });
  const facesOf = new Map(onWall.map((f) => [f.id, frontFaces(f, frame)]));
  const faces: FrontFace[] = [...facesOf.values()].flat();
  // Back to front across fixtures too, so a counter's edge covers what stands behind it.
  faces.sort((p, q) => p.frontMm - q.frontMm);
  for (const f of faces) shapes.push(rectShape(f, f.role, f.fixtureId));
  const fixtures = onWall.map((f) => {
    const mine = facesOf.get(f.id) ?? [];
    const rect = mine.length
      ? { x0: Math.min(...mine.map((x) => x.x0)), x1: Math.max(...mine.map((x) => x.x1)), y0: Math.min(...mine.map((x) => x.y0)), y1: Math.max(...mine.map((x) => x.y1)) }
      : spanRect(frame, 0, 0, 0, 0);
    return { placed: f, item: { ref: f.id, text: f.label, rect } };
  });

  // Labels: openings and obstacles first (they are few and large), then fixtures in plan order.
  const ctx: LabelContext = { sizeMm: size, taken: new RectIndex(size * 8), blockers: new RectIndex(size * 8), labels: [], leaders: [], legend: [] };
  for (const f of fixtures) ctx.blockers.add(f.item.rect);
  for (const it of [...openings, ...obstacles, ...fixtures.map((f) => f.item)]) {
    const r = it.rect;
    const c = { x: (r.x0 + r.x1) / 2, y: (r.y0 + r.y1) / 2 };
    placeLabel({ text: it.text, ref: it.ref, region: rectShape(r, "fixture").points, centres: [c, { x: c.x, y: r.y0 + (r.y1 - r.y0) * 0.3 }, { x: c.x, y: r.y0 + (r.y1 - r.y0) * 0.7 }], angles: [0], anchor: { x: c.x, y: r.y0 }, outward: { x: 0, y: -1 } }, ctx);
  }
  for (const l of ctx.leaders) shapes.push({ type: "polyline", points: l.points, role: "leader", ...(l.ref ? { ref: l.ref } : {}) });

  const dimensions = elevationDimensions(frame, H, fixtures, [...openings, ...obstacles], { sizeMm: size, format, chain: "" });
  if (opts.detail) dimensions.push(...elevationLevelDimensions(fixtures.map((f) => ({ placed: f.placed, rect: f.item.rect })), { sizeMm: size, format, chain: "" }));
  const labels = [...ctx.labels];
  const chainsBottom = Math.max(t, ...dimensions.filter((d) => d.chain !== "heights" && d.textAt.y > 0).map((d) => d.textAt.y)) + size * 1.5;
  labels.push(...legendLabels(ctx.legend, { x: 0, y: chainsBottom }, size));
  const listed = fixtures.map((f) => f.item.text);
  return finishDrawing({
    kind: "elevation",
    title: `Elevation of ${name}`,
    description: `${name} seen from inside the room, ${format(L)} long (solved)${listed.length ? `, with ${listed.join(", ")}` : ", with no fixtures"}.`,
    wallId,
    wallName: name,
    textSizeMm: size,
    shapes,
    labels,
    dimensions,
    legend: ctx.legend,
    photoAnchor: { x: 0, y: 0 },
  });
}

/** Rows of dimensions under the floor (fixtures on the floor, wall-hung fixtures, openings and obstacles, overall) and the heights at the right. */
function elevationDimensions(frame: WallFrame, H: number, fixtures: { placed: PlacedFixture; item: Item }[], others: Item[], base: DimensionStyle): DimensionLine[] {
  const L = frame.lengthMm;
  const size = base.sizeMm;
  const floor = fixtures.filter((f) => -f.item.rect.y1 <= OFF_FLOOR_MM);
  const hung = fixtures.filter((f) => -f.item.rect.y1 > OFF_FLOOR_MM);
  const rows: { chain: string; items: Item[] }[] = [
    { chain: "fixtures", items: floor.map((f) => f.item) },
    { chain: "wall-hung", items: hung.map((f) => f.item) },
    { chain: "openings", items: others },
  ].filter((r) => r.items.length > 0);
  rows.push({ chain: "overall", items: [] });
  const out: DimensionLine[] = [];
  const down = { x: 0, y: 1 };
  rows.forEach((row, k) => {
    const ts = breakpoints(row.items.flatMap((i) => [i.rect.x0, i.rect.x1]), 0, L);
    out.push(...chainAlong({ x: 0, y: 0 }, { x: 1, y: 0 }, down, ts, DRAWN_WALL_THICKNESS_MM / 2 + size * (1.5 + 4.5 * k), { ...base, chain: row.chain }));
  });
  // Heights: counter tops, the bottom and top of what hangs on the wall, the ceiling.
  const zs: number[] = [];
  for (const f of floor) if (f.placed.workSurfaceMm !== undefined) zs.push(f.placed.origin.z + f.placed.workSurfaceMm);
  for (const f of hung) zs.push(-f.item.rect.y1, -f.item.rect.y0);
  const hs = breakpoints(zs, 0, H);
  const right = { x: 1, y: 0 };
  const heights = chainAlong({ x: L, y: 0 }, { x: 0, y: -1 }, right, hs, DRAWN_WALL_THICKNESS_MM + size * 1.5, { ...base, chain: "heights" });
  return [...out, ...heights];
}

