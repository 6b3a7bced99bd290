import { stopTrackParamsSchema } from "../../fixtures/stop-track/params";
import { stopTable, trackStartMm } from "../../fixtures/stop-track/stop-table";
import type { CheckContext } from "../context";
import { finding } from "../finding";
import { KIND } from "../kinds";
import type { Finding, Rule } from "../types";
import { perFixture } from "../per-fixture";

const ID = "stop-reach";

function check(ctx: CheckContext, ids?: ReadonlySet<string>): Finding[] {
  const out: Finding[] = [];
  const docs = new Map(ctx.plan.fixtures.map((d) => [d.id, d]));
  for (const f of ctx.fixtures) {
    if ((ids && !ids.has(f.id)) || f.kind !== KIND.stopTrack) continue;
    const parsed = stopTrackParamsSchema.safeParse(docs.get(f.id)?.params ?? {});
    if (!parsed.success) continue;
    // The kerf in force (a preset may set it) decides where the kerf edge falls on the track side.
    // The start is the derived one when the track sits on a saw (derive works it out from the saw's blade).
    const table = stopTable(parsed.data, { ...ctx.plan.settings, kerfMm: ctx.numbers.kerfMm }, trackStartMm(parsed.data, f));
    for (const row of table.rows) {
      const cut = row.cutLengthMm;
      const over = cut > table.maxCutMm ? cut - table.maxCutMm : 0;
      const under = cut < table.minCutMm ? table.minCutMm - cut : 0;
      const ok = row.inReach;
      const range = `${ctx.len(table.minCutMm)} to ${ctx.len(table.maxCutMm)}`;
      out.push(
        finding(
          ID,
          "caution",
          ok,
          f.id,
          ok
            ? `${f.label}: a ${ctx.len(cut)} cut is within the track's reach (${range}).`
            : `${f.label}: a ${ctx.len(cut)} cut is outside the track's reach (${range}); lengthen or move the track, or measure that cut by hand.`,
          { fixtureIds: [f.id], measured: cut, required: over ? table.maxCutMm : table.minCutMm, shortfall: over || under, unit: "mm" },
        ),
      );
    }
  }
  return out;
}

/** Each cut length on the stop table can be set on its track. */
export const stopReachRule: Rule<CheckContext> = {
  id: ID,
  title: "Stop settings within the track's reach",
  protects: "A stop set past the end of its track cannot be clamped; a cut list that needs it ends up measured by hand, and repeat cuts stop matching.",
  formula: "track start from the blade (less a kerf when it falls toward the track) <= cut length <= that + track length - stop width",
  numbers: [{ label: "Reach", value: "from the track's length, its start from the blade and the stop block's width (plan)" }],
  sources: [{ citation: "Geometry of the plan and the stop table", status: "derived" }],
  severity: "caution",
  cautions: ["Set a stop with the saw unplugged; check the first cut with a tape before running a batch."],
  ...perFixture(check),
};
