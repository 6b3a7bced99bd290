import { buildContext } from "../checks/context";
import { isFloorStanding, isMiterStation, worldWorkSurface } from "../checks/kinds";
import { sideStrip, stockRun } from "../checks/rules/stock-path";
import { frontStrip, walkwayInFront } from "../checks/rules/walkway";
import type { Derived } from "../derive-types";
import type { PlacedFixture } from "../fixtures/types";
import type { Vec2 } from "../geometry/types";
import type { PlanDocument } from "../plan/schema";
import { frameOfWall, wallToWorld, worldToWall } from "../room/wall-frame";
import { dimension, type DimensionStyle } from "./dimensions";
import { toPlanSheet } from "./plan-walls";
import type { DimensionLine } from "./types";

/** Walkways within this much of one another in front of neighbours in a run are one dimension, mm. */
const SAME_MM = 1;

const sheetDir = (v: Vec2) => ({ x: v.x, y: -v.y });
const along = (o: Vec2, u: Vec2, t: number): Vec2 => ({ x: o.x + u.x * t, y: o.y + u.y * t });

/** A dimension on the floor from a along unit u for `lengthMm`, its text beside it (plan sheet mm). */
function floorDim(a: Vec2, u: Vec2, lengthMm: number, style: DimensionStyle, note: string): DimensionLine {
  const n = sheetDir({ x: -u.y, y: u.x });
  return { ...dimension(toPlanSheet(a), toPlanSheet(along(a, u, lengthMm)), n, 0, lengthMm, style), note };
}

/** Depths of the fixtures set against walls, from the wall's face to their front, drawn across them. */
function depthDims(plan: PlanDocument, derived: Derived, base: DimensionStyle): DimensionLine[] {
  const out: DimensionLine[] = [];
  const docs = new Map(plan.fixtures.map((f) => [f.id, f]));
  for (const f of derived.fixtures) {
    const p = docs.get(f.id)?.placement;
    const wall = p?.mode === "wall" ? derived.room.walls.find((w) => w.id === p.wallId) : undefined;
    if (!wall || !f.body.polygon.length) continue;
    const frame = frameOfWall(wall);
    const pts = f.body.polygon.map((q) => worldToWall(frame, q));
    const a0 = Math.min(...pts.map((q) => q.offsetAlongMm));
    const a1 = Math.max(...pts.map((q) => q.offsetAlongMm));
    const front = Math.max(...pts.map((q) => q.distanceFromWallMm));
    if (!(front > 0)) continue;
    // Floor fixtures at a quarter of their width, wall-hung ones at three quarters: a base and the upper over it both read.
    const at = a0 + (a1 - a0) * (isFloorStanding(f) ? 0.25 : 0.75);
    out.push(floorDim(wallToWorld(frame, at, 0), frame.inward, front, { ...base, chain: "depths", ref: f.id }, `${f.label}: depth from the wall`));
  }
  return out;
}

/** Clear walkway in front of each floor-standing fixture (one dimension for neighbours in a run with the same way clear). */
function walkwayDims(derived: Derived, ctx: ReturnType<typeof buildContext>, reach: number, base: DimensionStyle, format: (mm: number) => string): DimensionLine[] {
  const runs: { f: PlacedFixture; clear: number; blocker?: string; key: string }[] = [];
  for (const f of derived.fixtures) {
    if (!isFloorStanding(f)) continue;
    const r = walkwayInFront(ctx, f, reach);
    if (!(r.clearMm > 0)) continue;
    runs.push({ f, clear: r.clearMm, blocker: r.blockerLabel, key: `${Math.round(f.rotation * 1000)}` });
  }
  const out: DimensionLine[] = [];
  const used = new Set<number>();
  runs.forEach((r, i) => {
    if (used.has(i)) return;
    const strip = frontStrip(r.f, r.clear);
    // Neighbours facing the same way, whose fronts line up and whose way is as clear, share one dimension.
    const group = runs
      .map((s, j) => ({ s, j }))
      .filter(({ s, j }) => {
        if (used.has(j) || s.key !== r.key || Math.abs(s.clear - r.clear) > SAME_MM) return false;
        const o = frontStrip(s.f, s.clear).origin;
        return Math.abs((o.x - strip.origin.x) * strip.u.x + (o.y - strip.origin.y) * strip.u.y) <= SAME_MM;
      });
    for (const g of group) used.add(g.j);
    const mid = group[Math.floor((group.length - 1) / 2)].s;
    const start = frontStrip(mid.f, mid.clear).origin;
    const names = group.map((g) => g.s.f.label).join(", ");
    out.push(floorDim(start, strip.u, r.clear, { ...base, chain: "walkways", ref: mid.f.id }, `Walkway in front of ${names}: ${format(r.clear)}${r.blocker ? ` to ${r.blocker}` : ""}`));
  });
  return out;
}

/** Clear length for stock each side of each miter saw's blade, at table height, to what first stands in its way. */
function bladeDims(plan: PlanDocument, derived: Derived, ctx: ReturnType<typeof buildContext>, reach: number, base: DimensionStyle, format: (mm: number) => string): DimensionLine[] {
  const out: DimensionLine[] = [];
  for (const f of derived.fixtures) {
    const table = worldWorkSurface(f);
    const p = plan.fixtures.find((x) => x.id === f.id)?.placement;
    const wall = p?.mode === "wall" ? derived.room.walls.find((w) => w.id === p.wallId) : undefined;
    if (!isMiterStation(f) || table === undefined) continue;
    for (const side of ["left", "right"] as const) {
      const { strip } = sideStrip(f, side, reach);
      const run = stockRun(ctx, f, strip, table);
      if (!(run.clearMm > 0)) continue;
      const by = run.blocker ? ` to ${run.blocker.label}` : "";
      // Left and right as a person facing the wall sees them: toward the wall's end corner is their left.
      const facing = wall ? (strip.u.x * wall.dir.x + strip.u.y * wall.dir.y > 0 ? "left" : "right") : undefined;
      const where = facing ? `on the ${facing} of the blade (facing the wall)` : "beside the blade";
      out.push(floorDim(strip.origin, strip.u, run.clearMm, { ...base, chain: "blade-clear", ref: f.id }, `${f.label}: ${format(run.clearMm)} clear ${where}${by}`));
    }
  }
  return out;
}

/**
 * The plan view's detail for checking a layout with a tape (plan sheet mm): each wall fixture's
 * depth, the clear walkway in front of what stands on the floor, and the clear length each side of
 * a miter saw's blade; measured as the checks measure them.
 */
export function planDetailDimensions(plan: PlanDocument, derived: Derived, base: DimensionStyle): DimensionLine[] {
  const ctx = buildContext(plan, derived);
  const xs = derived.room.corners.map((c) => c.x);
  const ys = derived.room.corners.map((c) => c.y);
  const reach = Math.max(1, Math.max(...xs) - Math.min(...xs) + Math.max(...ys) - Math.min(...ys));
  return [...depthDims(plan, derived, base), ...walkwayDims(derived, ctx, reach, base, base.format), ...bladeDims(plan, derived, ctx, reach, base, base.format)];
}
