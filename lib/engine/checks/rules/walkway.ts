import type { PlacedFixture } from "../../fixtures/types";
import type { Vec2 } from "../../geometry/types";
import { clearRun } from "../clear-run";
import type { CheckContext } from "../context";
import { finding } from "../finding";
import { firstHitConvex, fromStrip, makeStrip, stripBounds, type Strip } from "../geom/strip";
import { isFloorStanding } from "../kinds";
import type { Finding, Rule } from "../types";
import { perFixture } from "../per-fixture";

const ID = "walkway";
/** Things below this height narrow a walkway (6-1/2 ft, the same headroom NEC 110.26(A)(3) asks). */
const HEAD_HEIGHT_MM = 1981.2;
/** Zones that stand for a parked vehicle. */
const VEHICLE_PURPOSES = new Set(["parking-vehicle"]);

/** The band in front of a fixture: from its front face into the room, as wide as the fixture. */
export function frontStrip(f: PlacedFixture, lengthMm: number): Strip {
  const c = Math.cos(f.rotation);
  const s = Math.sin(f.rotation);
  const lx = f.footprint.widthMm / 2;
  const ly = f.footprint.depthMm;
  const origin = { x: f.origin.x + c * lx - s * ly, y: f.origin.y + s * lx + c * ly };
  return makeStrip(origin, { x: -s, y: c }, f.footprint.widthMm, lengthMm);
}

/** What stands in front of a fixture: the clear width up to `lengthMm`, what ends it, and where (mm). */
export interface WalkwayRun {
  clearMm: number;
  blockerLabel?: string;
  blockerFixture?: string;
  at?: Vec2;
}

/** The clear way in front of a floor-standing fixture, up to `lengthMm`: to the next fixture, obstacle, wall or parked vehicle below head height. */
export function walkwayInFront(ctx: CheckContext, f: PlacedFixture, lengthMm: number): WalkwayRun {
  const strip = frontStrip(f, lengthMm);
  const run = clearRun(ctx, strip, { zLo: 1, zHi: HEAD_HEIGHT_MM, excludeId: f.id });
  let clear = run.clearMm;
  let blockerLabel = run.blocker?.label;
  let blockerFixture = run.blocker?.source === "fixture" ? run.blocker.id : undefined;
  let at = run.at;
  for (const zi of ctx.zoneIndex.query(stripBounds(strip, 1))) {
    if (!VEHICLE_PURPOSES.has(zi.zone.purpose)) continue;
    const d = firstHitConvex(strip, zi.zone.prism.polygon);
    if (d < clear) {
      clear = Math.max(0, d);
      blockerLabel = "the parked vehicle";
      blockerFixture = undefined;
      at = fromStrip(strip, clear, 0);
    }
  }
  return { clearMm: clear, blockerLabel, blockerFixture, at };
}

function check(ctx: CheckContext, ids?: ReadonlySet<string>): Finding[] {
  const out: Finding[] = [];
  const n = ctx.numbers;
  const note = ctx.presetNote("walkwayMm", "walkwayMinMm");
  for (const f of ctx.fixtures) {
    if ((ids && !ids.has(f.id)) || !isFloorStanding(f)) continue;
    const { clearMm: clear, blockerLabel, blockerFixture, at } = walkwayInFront(ctx, f, n.walkwayMm);
    const ok = clear >= n.walkwayMm - 0.5;
    const hardFail = clear < n.walkwayMinMm - 0.5;
    const by = blockerLabel ? ` (to ${blockerLabel})` : "";
    const msg = ok
      ? `Walkway in front of ${f.label}: at least ${ctx.len(n.walkwayMm)} clear${note}.`
      : hardFail
        ? `Walkway in front of ${f.label} is ${ctx.len(clear)}${by}, below the ${ctx.len(n.walkwayMinMm)} minimum${note}.`
        : `Walkway in front of ${f.label} is ${ctx.len(clear)}${by}: passable (${ctx.len(n.walkwayMinMm)} minimum) but under the ${ctx.len(n.walkwayMm)} walkway${note}.`;
    out.push(
      finding(ID, hardFail ? "conflict" : "caution", ok, f.id, msg, {
        fixtureIds: blockerFixture ? [f.id, blockerFixture] : [f.id],
        measured: clear,
        required: hardFail ? n.walkwayMinMm : n.walkwayMm,
        shortfall: (hardFail ? n.walkwayMinMm : n.walkwayMm) - clear,
        unit: "mm",
        at: ok ? undefined : at,
      }),
    );
  }
  return out;
}

/** Clear width in front of every floor-standing fixture: 36 in walkway, never below 28 in. */
export const walkwayRule: Rule<CheckContext> = {
  id: ID,
  title: "Walkway width",
  protects:
    "People carry boards and sheets between the fixtures and must get out quickly. A walkway narrower than a person turning with a load leads to bumps into running tools, and a blocked way out is dangerous in a fire.",
  formula: "clear width in front of each fixture (to the next fixture, obstacle, wall or parked vehicle) >= 36 in; never < 28 in",
  numbers: [
    { label: "Walkway", value: "36 in (914 mm)" },
    { label: "Minimum at any point (exit access)", value: "28 in (711 mm)" },
  ],
  sources: [
    { citation: "NKBA kitchen planning guidelines: walkway 36 in (edition not confirmed)", status: "published", note: "secondary copy" },
    { citation: "OSHA 29 CFR 1910.36(g)(2): exit access at least 28 in wide at every point", status: "published" },
  ],
  severity: "caution",
  cautions: ["Local building and fire codes may ask for more; they come first."],
  ...perFixture(check),
};
