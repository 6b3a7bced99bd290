import type { Derived } from "../derive-types";
import type { PlacedFixture } from "../fixtures/types";
import type { PlanDocument } from "../plan/schema";
import { frameOfWall, fromViewersLeft, worldToWall, type WallFrame } from "../room/wall-frame";
import { dimension, type DimensionStyle } from "./dimensions";
import { toPlanSheet } from "./plan-walls";
import { elevationSheetToRoom } from "./sheet-to-world";
import type { DimensionLine } from "./types";
import { OPENING_NAMES } from "./names";

/** What a gap along the wall runs to: the next fixture at the same height, an opening, or the corner. */
export type GapEnd = { kind: "fixture" | "opening"; id: string; label: string } | { kind: "corner" };

/** A gap along the wall on one side of a fixture, as a person facing the wall sees it, mm. */
export interface SideGap {
  gapMm: number;
  to: GapEnd;
}

/** A wall fixture's own size and its clear distances along the wall to its neighbours, mm. */
export interface FixtureDistances {
  fixtureId: string;
  wallId: string;
  /** Its extent along the wall, mm from the wall's start (what it really takes, overhangs included). */
  fromMm: number;
  toMm: number;
  widthMm: number;
  depthMm: number;
  heightMm: number;
  /** Toward the wall's end corner (the viewer's left) and toward its start corner (their right). */
  left: SideGap;
  right: SideGap;
}

/** Things this close are touching, not overlapping, mm. */
const TOUCH_MM = 1;

function extentAlong(frame: WallFrame, f: PlacedFixture): { a0: number; a1: number; front: number } {
  const pts = f.body.polygon.map((p) => worldToWall(frame, p));
  return { a0: Math.min(...pts.map((p) => p.offsetAlongMm)), a1: Math.max(...pts.map((p) => p.offsetAlongMm)), front: Math.max(...pts.map((p) => p.distanceFromWallMm)) };
}

/**
 * A wall fixture's size and the gaps either side of it along its wall to the nearest fixture whose
 * height range meets its own (a base cabinet's neighbours are base cabinets, not the uppers over
 * them), or to an opening, or to the corner. Null for a fixture standing free or not in the plan.
 */
export function fixtureDistances(plan: PlanDocument, derived: Derived, fixtureId: string): FixtureDistances | null {
  const doc = plan.fixtures.find((f) => f.id === fixtureId);
  const self = derived.fixtures.find((f) => f.id === fixtureId);
  if (!doc || !self || doc.placement.mode !== "wall" || !self.body.polygon.length) return null;
  const wallId = doc.placement.wallId;
  const wall = derived.room.walls.find((w) => w.id === wallId);
  if (!wall) return null;
  const frame = frameOfWall(wall);
  const me = extentAlong(frame, self);
  const L = frame.lengthMm;
  const others: { a0: number; a1: number; end: GapEnd }[] = [];
  for (const f of plan.fixtures) {
    if (f.id === fixtureId || f.placement.mode !== "wall" || f.placement.wallId !== wallId) continue;
    const p = derived.fixtures.find((x) => x.id === f.id);
    if (!p || !p.body.polygon.length || p.body.zMax <= self.body.zMin + TOUCH_MM || p.body.zMin >= self.body.zMax - TOUCH_MM) continue;
    const e = extentAlong(frame, p);
    others.push({ a0: e.a0, a1: e.a1, end: { kind: "fixture", id: p.id, label: p.label } });
  }
  for (const o of plan.room.openings) {
    if (o.wallId !== wallId) continue;
    const bottom = o.kind === "window" ? o.sillMm : 0;
    if (bottom >= self.body.zMax - TOUCH_MM || bottom + o.heightMm <= self.body.zMin + TOUCH_MM) continue;
    others.push({ a0: o.offsetMm, a1: o.offsetMm + o.widthMm, end: { kind: "opening", id: o.id, label: OPENING_NAMES[o.kind] } });
  }
  let left: SideGap = { gapMm: L - me.a1, to: { kind: "corner" } };
  let right: SideGap = { gapMm: me.a0, to: { kind: "corner" } };
  for (const o of others) {
    if (o.a0 >= me.a1 - TOUCH_MM && o.a0 - me.a1 < left.gapMm) left = { gapMm: Math.max(0, o.a0 - me.a1), to: o.end };
    if (o.a1 <= me.a0 + TOUCH_MM && me.a0 - o.a1 < right.gapMm) right = { gapMm: Math.max(0, me.a0 - o.a1), to: o.end };
  }
  return { fixtureId, wallId, fromMm: me.a0, toMm: me.a1, widthMm: me.a1 - me.a0, depthMm: me.front, heightMm: self.body.zMax - self.body.zMin, left, right };
}

/** The offset from the wall's start (mm) that leaves `gapMm` on one side of the fixture, its neighbour staying put. */
export function offsetForGap(d: FixtureDistances, currentOffsetMm: number, side: "left" | "right", gapMm: number): number {
  return side === "left" ? currentOffsetMm + (d.left.gapMm - gapMm) : currentOffsetMm + (gapMm - d.right.gapMm);
}

/** The gap's far end in words: "the corner", "Upper cabinet", "Garage door". */
export function gapEndName(end: GapEnd): string {
  return end.kind === "corner" ? "the corner" : end.label;
}

/**
 * The selected fixture's dimensions on an elevation (sheet mm): the gaps to its neighbours and its
 * width in a row just above it, and its height at its left edge (chain "selection").
 */
export function selectionElevationDimensions(d: FixtureDistances, frame: WallFrame, zMinMm: number, style: DimensionStyle): DimensionLine[] {
  const s = { ...style, chain: "selection", ref: d.fixtureId };
  const top = -(zMinMm + d.heightMm);
  const x0 = fromViewersLeft(frame, d.toMm);
  const x1 = fromViewersLeft(frame, d.fromMm);
  const up = { x: 0, y: -1 };
  const off = style.sizeMm * 1.2;
  const at = (x: number) => ({ x, y: top });
  const out = [
    { ...dimension(at(x0 - d.left.gapMm), at(x0), up, off, d.left.gapMm, s), note: `Gap on the left to ${gapEndName(d.left.to)}` },
    { ...dimension(at(x0), at(x1), up, off, d.widthMm, s), note: "Width" },
    { ...dimension(at(x1), at(x1 + d.right.gapMm), up, off, d.right.gapMm, s), note: `Gap on the right to ${gapEndName(d.right.to)}` },
    { ...dimension({ x: x0, y: -zMinMm }, { x: x0, y: top }, { x: -1, y: 0 }, style.sizeMm * 0.6, d.heightMm, s), note: "Height" },
  ];
  return out.filter((x) => x.valueMm > 0);
}

/** The selected fixture's gaps and width along its wall on the plan view, in a row in front of it (plan sheet mm). */
export function selectionPlanDimensions(d: FixtureDistances, frame: WallFrame, style: DimensionStyle): DimensionLine[] {
  const s = { ...style, chain: "selection", ref: d.fixtureId };
  const front = d.depthMm + style.sizeMm * 1.2;
  const on = (a: number) => {
    const p = elevationSheetToRoom(frame, { x: frame.lengthMm - a, y: 0 }, front);
    return toPlanSheet(p);
  };
  const n = { x: frame.inward.x, y: -frame.inward.y };
  const out = [
    { ...dimension(on(d.toMm), on(d.toMm + d.left.gapMm), n, 0, d.left.gapMm, s), note: `Gap on the left to ${gapEndName(d.left.to)}` },
    { ...dimension(on(d.fromMm), on(d.toMm), n, 0, d.widthMm, s), note: "Width" },
    { ...dimension(on(d.fromMm - d.right.gapMm), on(d.fromMm), n, 0, d.right.gapMm, s), note: `Gap on the right to ${gapEndName(d.right.to)}` },
  ];
  return out.filter((x) => x.valueMm > 0);
}
