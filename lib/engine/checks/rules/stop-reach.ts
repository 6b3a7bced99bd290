import type { PlacedFixture } from "../../fixtures/types";
import type { Vec2 } from "../../geometry/types";
import type { CheckContext } from "../context";
import { finding } from "../finding";
import { centroid, expandBounds, polygonBounds } from "../geom/polygon";
import { stripThroughZone } from "../geom/strip";
import { KIND, PURPOSE, isMiterStation } from "../kinds";
import type { Finding, Rule } from "../types";

const ID = "stop-reach";

/** Cut lengths the plan sets on a track's stops, mm (read leniently: numbers or objects with a length). */
export function stopSettings(params: Record<string, unknown>): { key: string; cutMm: number }[] {
  const raw = params.stops;
  if (!Array.isArray(raw)) return [];
  const out: { key: string; cutMm: number }[] = [];
  raw.forEach((s, i) => {
    const o = (typeof s === "object" && s !== null ? s : {}) as Record<string, unknown>;
    const v = typeof s === "number" ? s : [o.cutLengthMm, o.lengthMm, o.settingMm, o.positionMm].find((x) => typeof x === "number");
    if (typeof v === "number" && Number.isFinite(v)) out.push({ key: typeof o.label === "string" && o.label ? o.label : `stop ${i + 1}`, cutMm: v });
  });
  return out;
}

/** The blade point and the cut line's direction toward `toward`, from the saw's stock-path zones or its middle. */
function bladeLine(saw: PlacedFixture, toward: Vec2): { blade: Vec2; dir: Vec2 } {
  const c = centroid(saw.body.polygon);
  const ax = { x: Math.cos(saw.rotation), y: Math.sin(saw.rotation) };
  const side = (toward.x - c.x) * ax.x + (toward.y - c.y) * ax.y >= 0 ? 1 : -1;
  const purpose = side > 0 ? PURPOSE.stockPathRight : PURPOSE.stockPathLeft;
  const z = saw.zones.find((q) => q.purpose === purpose);
  if (z) {
    const s = stripThroughZone(z.prism.polygon, c);
    return { blade: { x: s.origin.x + s.v.x * ((s.vMin + s.vMax) / 2), y: s.origin.y + s.v.y * ((s.vMin + s.vMax) / 2) }, dir: s.u };
  }
  return { blade: c, dir: { x: ax.x * side, y: ax.y * side } };
}

function check(ctx: CheckContext, ids?: ReadonlySet<string>): Finding[] {
  const out: Finding[] = [];
  for (const f of ctx.fixtures) {
    if (f.kind !== KIND.stopTrack || (ids && !ids.has(f.id))) continue;
    const doc = ctx.plan.fixtures.find((d) => d.id === f.id);
    const stops = stopSettings(doc?.params ?? {});
    if (!stops.length) continue;
    // The saw this track serves: the nearest miter station within the longest stock.
    const tc = centroid(f.body.polygon);
    let saw: PlacedFixture | undefined;
    let best = Infinity;
    for (const s of ctx.solids.query(expandBounds(polygonBounds(f.body.polygon), ctx.numbers.longestStockMm))) {
      if (!s.fixture || !isMiterStation(s.fixture)) continue;
      const c = centroid(s.prism.polygon);
      const d = Math.hypot(c.x - tc.x, c.y - tc.y);
      if (d < best) {
        best = d;
        saw = s.fixture;
      }
    }
    if (!saw) {
      out.push(finding(ID, "caution", false, f.id, `${f.label} has stops set but no miter saw within ${ctx.len(ctx.numbers.longestStockMm)} to measure from.`, { fixtureIds: [f.id] }));
      continue;
    }
    const { blade, dir } = bladeLine(saw, tc);
    const along = f.body.polygon.map((p) => (p.x - blade.x) * dir.x + (p.y - blade.y) * dir.y);
    const near = Math.max(0, Math.min(...along));
    const far = Math.max(...along);
    for (const s of stops) {
      const ok = s.cutMm >= near - 0.5 && s.cutMm <= far + 0.5;
      const short = s.cutMm > far ? s.cutMm - far : s.cutMm < near ? near - s.cutMm : 0;
      out.push(
        finding(
          ID,
          "caution",
          ok,
          f.id,
          ok
            ? `${f.label}, ${s.key}: ${ctx.len(s.cutMm)} is within the track's reach (${ctx.len(near)} to ${ctx.len(far)} from the blade).`
            : `${f.label}, ${s.key}: ${ctx.len(s.cutMm)} is outside the track's reach (${ctx.len(near)} to ${ctx.len(far)} from the blade); lengthen or move the track, or use a tape.`,
          { fixtureIds: [f.id, saw.id], measured: s.cutMm, required: s.cutMm > far ? far : near, shortfall: short, unit: "mm" },
        ),
      );
    }
  }
  return out;
}

/** Each stop setting lies within the reach of its track, measured from the blade. */
export const stopReachRule: Rule<CheckContext> = {
  id: ID,
  title: "Stop settings within the track's reach",
  protects: "A stop set past the end of its track cannot be clamped; a cut list that needs it ends up measured by hand, and repeat cuts stop matching.",
  formula: "distance from the blade to the track's near end <= cut length <= distance to its far end",
  numbers: [{ label: "Reach", value: "from the track's position and length in the plan" }],
  sources: [{ citation: "Geometry of the plan", status: "derived" }],
  severity: "caution",
  cautions: ["Set a stop with the saw unplugged; check the first cut with a tape before running a batch."],
  scope: "fixture",
  evaluate: (_plan, ctx) => check(ctx),
  evaluateFor: (_plan, ctx, ids) => check(ctx, ids),
};
