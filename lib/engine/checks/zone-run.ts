import type { PlacedFixture, WorldZone } from "../fixtures/types";
import { clearRun } from "./clear-run";
import type { CheckContext } from "./context";
import { finding } from "./finding";
import { centroid } from "./geom/polygon";
import { stripThroughZone } from "./geom/strip";
import type { Finding } from "./types";

export interface ZoneRunOptions {
  ruleId: string;
  /** What the zone is for, in a message: "drawers", "infeed"... */
  what: string;
  /** Height band that blocks, mm above the floor. */
  zLo: number;
  zHi: number;
  /** Advice added to a failing message. */
  advice?: string;
}

/**
 * The clear run through one of a fixture's zones, away from the fixture, as a finding: the zone's
 * length must be clear of every solid (the fixture itself excepted) and wall in the height band.
 */
export function zoneRunFinding(ctx: CheckContext, f: PlacedFixture, z: WorldZone, o: ZoneRunOptions): Finding {
  const strip = stripThroughZone(z.prism.polygon, centroid(f.body.polygon));
  const run = clearRun(ctx, strip, { zLo: o.zLo, zHi: o.zHi, excludeId: f.id });
  const need = strip.length;
  const ok = run.clearMm >= need - 0.5;
  const by = run.blocker ? `, blocked by ${run.blocker.label}` : "";
  return finding(
    o.ruleId,
    "conflict",
    ok,
    f.id,
    ok ? `${f.label}: ${o.what} clear for ${ctx.len(need)}.` : `${f.label}: ${o.what} clear for only ${ctx.len(run.clearMm)} of ${ctx.len(need)}${by}.${o.advice ? ` ${o.advice}` : ""}`,
    {
      fixtureIds: run.blocker?.source === "fixture" ? [f.id, run.blocker.id] : [f.id],
      zoneIds: [z.id],
      measured: run.clearMm,
      required: need,
      shortfall: need - run.clearMm,
      unit: "mm",
      at: ok ? undefined : run.at,
    },
  );
}
