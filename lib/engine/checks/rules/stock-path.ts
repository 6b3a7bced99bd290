import type { PlacedFixture } from "../../fixtures/types";
import type { Vec2 } from "../../geometry/types";
import { clearRun, type RunResult } from "../clear-run";
import type { CheckContext } from "../context";
import { finding } from "../finding";
import { centroid } from "../geom/polygon";
import { centreLineCover, coveredFromStart, makeStrip, stripBounds, stripThroughZone, type Strip } from "../geom/strip";
import { KIND, PURPOSE, hasZone, isMiterStation, worldWorkSurface } from "../kinds";
import type { Finding, Rule } from "../types";
import { perFixture } from "../per-fixture";

const ID = "stock-path";
/** Gaps a board bridges without noticing, mm (our own choice: 1 in). */
const SUPPORT_GAP_MM = 25;
/** Stock width assumed when a tool shelf gives no stock-path zone: 5-1/2 in, a 1x6 (practice). */
const FALLBACK_STOCK_WIDTH_MM = 140;

/** The band the stock runs along on one side of a miter saw's blade, from the blade out, `lengthMm` long. */
export function sideStrip(f: PlacedFixture, side: "left" | "right", lengthMm: number): { strip: Strip; zoneId?: string } {
  const purpose = side === "left" ? PURPOSE.stockPathLeft : PURPOSE.stockPathRight;
  const zone = f.zones.find((z) => z.purpose === purpose);
  if (zone) {
    const s = stripThroughZone(zone.prism.polygon, centroid(f.body.polygon));
    return { strip: { ...s, length: lengthMm }, zoneId: zone.id };
  }
  // No zone: the blade at the middle of the shelf, the cut line along the shelf's width.
  const c = Math.cos(f.rotation);
  const sn = Math.sin(f.rotation);
  const local = { x: f.footprint.widthMm / 2, y: f.footprint.depthMm / 2 };
  const origin: Vec2 = { x: f.origin.x + c * local.x - sn * local.y, y: f.origin.y + sn * local.x + c * local.y };
  // Local +x is the left of the person facing the saw (and the wall behind it).
  const dir = side === "left" ? { x: c, y: sn } : { x: -c, y: -sn };
  return { strip: makeStrip(origin, dir, FALLBACK_STOCK_WIDTH_MM, lengthMm) };
}

/** The clear run for stock along a strip at the saw's table height: what stands above the table in its path (mm). */
export function stockRun(ctx: CheckContext, f: PlacedFixture, strip: Strip, tableMm: number): RunResult {
  const n = ctx.numbers;
  return clearRun(ctx, strip, {
    zLo: tableMm + n.flushToleranceMm,
    zHi: tableMm + n.stockThicknessMm,
    excludeId: f.id,
    // The stop track rides beside the stock, on the counter; it guides rather than blocks.
    blocks: (s) => s.kind !== KIND.stopTrack,
  });
}

function check(ctx: CheckContext, ids?: ReadonlySet<string>): Finding[] {
  const out: Finding[] = [];
  const n = ctx.numbers;
  const note = ctx.presetNote("longestStockMm", "stockSupportFraction");
  for (const f of ctx.fixtures) {
    // Only crosscut tools have a stock path along the run (a planer on a tool shelf feeds front to back).
    if ((ids && !ids.has(f.id)) || !isMiterStation(f) || !hasZone(f, PURPOSE.stockPathLeft, PURPOSE.stockPathRight)) continue;
    const table = worldWorkSurface(f);
    if (table === undefined) continue;
    for (const side of ["left", "right"] as const) {
      const { strip, zoneId } = sideStrip(f, side, n.longestStockMm);
      const run = stockRun(ctx, f, strip, table);
      const zoneIds = zoneId ? [zoneId] : [];
      const clearOk = run.clearMm >= n.longestStockMm - 0.5;
      const by = run.blocker ? `, blocked by ${run.blocker.label}` : "";
      out.push(
        finding(
          ID,
          "conflict",
          clearOk,
          f.id,
          clearOk
            ? `${f.label}: ${ctx.len(run.clearMm)} clear ${side} of the blade for ${ctx.len(n.longestStockMm)} stock${note}.`
            : `${f.label}: only ${ctx.len(run.clearMm)} clear ${side} of the blade${by}; ${ctx.len(n.longestStockMm)} stock needs ${ctx.len(n.longestStockMm)}${note}.`,
          {
            fixtureIds: run.blocker && run.blocker.source === "fixture" ? [f.id, run.blocker.id] : [f.id],
            zoneIds,
            measured: run.clearMm,
            required: n.longestStockMm,
            shortfall: n.longestStockMm - run.clearMm,
            unit: "mm",
            at: clearOk ? undefined : run.at,
          },
        ),
      );
      // Support: counters (and the tool shelf itself) whose top is at table height, along the cut line.
      const intervals: [number, number][] = [];
      for (const s of ctx.solids.query(stripBounds(strip))) {
        const sf = s.fixture;
        if (!sf) continue;
        const top = worldWorkSurface(sf);
        if (top === undefined || Math.abs(top - table) > n.flushToleranceMm) continue;
        const cover = centreLineCover(strip, sf.body.polygon);
        if (cover) intervals.push(cover);
      }
      const supported = Math.min(run.clearMm, coveredFromStart(intervals, SUPPORT_GAP_MM, SUPPORT_GAP_MM));
      const needed = n.longestStockMm * n.stockSupportFraction;
      const supOk = supported >= needed - 0.5;
      out.push(
        finding(
          ID,
          "caution",
          supOk,
          f.id,
          supOk
            ? `${f.label}: ${ctx.len(supported)} of support at table height ${side} of the blade (${ctx.len(needed)} needed${note}).`
            : `${f.label}: ${ctx.len(supported)} of support at table height ${side} of the blade; a ${ctx.len(n.longestStockMm)} board needs ${ctx.len(needed)} so it cannot tip${note}. Add counter or an outfeed stand.`,
          { fixtureIds: [f.id], zoneIds, measured: supported, required: needed, shortfall: needed - supported, unit: "mm" },
        ),
      );
    }
  }
  return out;
}

/** Clear path and support for the longest stock each side of a miter saw's blade. */
export const stockPathRule: Rule<CheckContext> = {
  id: ID,
  title: "Stock path and support at the miter saw",
  protects:
    "A long board must lie flat on the saw table and slide along the fence on both sides of the blade. Anything standing above the table in its path stops the cut; too little support lets the offcut tip, pinch the blade and kick.",
  formula:
    "clear length each side (nothing between table height and table + stock thickness) >= longest stock; supported length at table height each side >= longest stock x support share",
  numbers: [
    { label: "Longest stock (plan setting)", value: "8 ft (2438 mm) by default" },
    { label: "Support share each side", value: "1/2 of the longest stock" },
    { label: "Stock band above the table", value: "1-1/2 in" },
  ],
  sources: [
    { citation: "Statics: a board stays put while its centre of mass is over its support", status: "derived" },
    { citation: "Common shop practice for miter-saw stations", status: "practice" },
  ],
  severity: "conflict",
  cautions: [
    "Support long offcuts as well as the workpiece: an unsupported offcut can drop, pinch the blade and throw.",
    "Keep hands out of the marked blade zone and let the blade stop before lifting the head.",
  ],
  ...perFixture(check),
};
