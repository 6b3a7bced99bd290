import type { CheckContext } from "../context";
import { finding } from "../finding";
import type { PlacedFixture, WorldZone } from "../../fixtures/types";
import { centroid, polygonBounds } from "../geom/polygon";
import { centreLineCover, coveredFromStart, stripThroughZone } from "../geom/strip";
import { PURPOSE, isTableSaw, worldWorkSurface } from "../kinds";
import type { Finding, Rule } from "../types";
import { zoneRunFinding } from "../zone-run";
import { perFixture } from "../per-fixture";

const ID = "saw-infeed-outfeed";
const NAMES: Record<string, string> = {
  [PURPOSE.infeed]: "infeed",
  [PURPOSE.outfeed]: "outfeed",
  [PURPOSE.sideClearance]: "side room",
  "side-left": "side room left of the blade",
  "side-right": "side room right of the blade",
};

function check(ctx: CheckContext, ids?: ReadonlySet<string>): Finding[] {
  const out: Finding[] = [];
  const n = ctx.numbers;
  for (const f of ctx.fixtures) {
    if ((ids && !ids.has(f.id)) || !isTableSaw(f)) continue;
    const table = worldWorkSurface(f) ?? f.body.zMax;
    for (const z of f.zones) {
      if (z.purpose === "outfeed-support") {
        out.push(supportFinding(ctx, f, z, table));
        continue;
      }
      const name = NAMES[z.purpose];
      if (!name) continue;
      out.push(
        zoneRunFinding(ctx, f, z, {
          ruleId: ID,
          what: name,
          zLo: table + n.flushToleranceMm,
          zHi: table + n.stockThicknessMm,
          advice: "Roll the saw out on its mobile base before cutting, and lock the casters.",
        }),
      );
    }
  }
  return out;
}

/** Outfeed support: something at table height (within the flush tolerance) under the zone, from the saw's back edge. */
function supportFinding(ctx: CheckContext, f: PlacedFixture, z: WorldZone, table: number): Finding {
  const strip = stripThroughZone(z.prism.polygon, centroid(f.body.polygon));
  const intervals: [number, number][] = [];
  for (const s of ctx.solids.query(polygonBounds(z.prism.polygon))) {
    const sf = s.fixture;
    if (!sf || sf.id === f.id) continue;
    const top = worldWorkSurface(sf);
    if (top === undefined || Math.abs(top - table) > ctx.numbers.flushToleranceMm) continue;
    const c = centreLineCover(strip, sf.body.polygon);
    if (c) intervals.push(c);
  }
  const got = Math.min(strip.length, coveredFromStart(intervals, 25, 25));
  const need = strip.length;
  const ok = got >= need - 0.5;
  return finding(
    ID,
    "caution",
    ok,
    f.id,
    ok
      ? `${f.label}: outfeed supported at table height for ${ctx.len(need)}.`
      : `${f.label}: outfeed supported for ${ctx.len(got)} of ${ctx.len(need)} past the table; add an outfeed table or roller stand at table height.`,
    { fixtureIds: [f.id], zoneIds: [z.id], measured: got, required: need, shortfall: need - got, unit: "mm" },
  );
}

/** Infeed, outfeed and side clearance around a table saw, as its zones define them. */
export const sawInfeedOutfeedRule: Rule<CheckContext> = {
  id: ID,
  title: "Infeed, outfeed and side room at the table saw",
  protects:
    "A board fed through a table saw needs its full length clear in front of the blade and behind it, and room beside the fence for wide sheets. A board that hits something mid-cut twists, binds the blade and can be thrown back.",
  formula: "clear length in each zone (nothing between table height and table + stock thickness) >= the zone's length",
  numbers: [
    { label: "Infeed and outfeed", value: "the longest stock (plan setting), as the saw's zones are sized" },
    { label: "Outfeed support with a helper", value: "about 4 ft past the blade" },
  ],
  sources: [
    { citation: "Occupational safety guidance on table-saw outfeed support (secondary copy)", status: "published" },
    { citation: "Zone lengths: common shop practice", status: "practice" },
  ],
  severity: "conflict",
  cautions: [
    "Use the blade guard, riving knife and anti-kickback pawls; stand out of line with the blade.",
    "Lock the mobile base before cutting; a saw that rolls mid-cut is a kickback waiting to happen.",
  ],
  ...perFixture(check),
};
