import type { CheckContext } from "../context";
import { finding } from "../finding";
import { KIND } from "../kinds";
import type { Finding, Rule } from "../types";
import { perFixture } from "../per-fixture";

const ID = "stop-track-height";

function check(ctx: CheckContext, ids?: ReadonlySet<string>): Finding[] {
  const out: Finding[] = [];
  const tol = ctx.numbers.flushToleranceMm;
  const note = ctx.presetNote("flushToleranceMm");
  for (const f of ctx.fixtures) {
    if ((ids && !ids.has(f.id)) || f.kind !== KIND.stopTrack || !f.track?.attached || f.track.tableMm === undefined) continue;
    const t = f.track;
    const table = t.tableMm!;
    const saw = t.sawId ? ctx.fixtureById.get(t.sawId) : undefined;
    const sawName = saw?.label ?? "the saw";
    if (t.counterTopMm === undefined) {
      out.push(
        finding(ID, "conflict", false, f.id, `${f.label} has no counter under its near end ${t.side} of ${sawName}'s blade, so stock held against it is not carried at the table's ${ctx.len(table)}. Add a base cabinet beside the saw on that side, or put the track on the other side.`, {
          fixtureIds: t.sawId ? [f.id, t.sawId] : [f.id],
          measured: 0,
          required: table,
          shortfall: table,
          unit: "mm",
        }),
      );
      continue;
    }
    const diff = t.counterTopMm - table;
    const ok = Math.abs(diff) <= tol + 1e-6;
    const where = diff > 0 ? "above" : "below";
    out.push(
      finding(
        ID,
        "conflict",
        ok,
        f.id,
        ok
          ? `${f.label} sits on the counter at ${ctx.len(t.counterTopMm)}, level with ${sawName}'s table (within ${ctx.lenFine(tol)}${note}).`
          : `${f.label} sits on a counter ${ctx.lenFine(Math.abs(diff))} ${where} ${sawName}'s table (${ctx.len(t.counterTopMm)} against ${ctx.len(table)}); level means within ${ctx.lenFine(tol)}${note}. Stock riding on that counter meets the stops out of line with the blade.`,
        { fixtureIds: [f.id, ...(t.counterId ? [t.counterId] : []), ...(t.sawId ? [t.sawId] : [])], measured: Math.abs(diff), required: tol, shortfall: Math.abs(diff) - tol, unit: "mm" },
      ),
    );
  }
  return out;
}

/** A stop track on its saw lies on a counter at the saw's table height. */
export const stopTrackHeightRule: Rule<CheckContext> = {
  id: ID,
  title: "Stop track on a counter at table height",
  protects:
    "Stock pushed against a stop must lie flat from the blade to the stop. A track with no counter under it, or on a counter higher or lower than the saw table, lets the board rock or droop, and the cut comes out a different length from the one on the stop table.",
  formula: "a counter under the track's near end, and | counter top - saw table top | <= flush tolerance",
  numbers: [{ label: "Flush tolerance (plan setting)", value: "1/32 in (0.8 mm) by default" }],
  sources: [{ citation: "Common shop practice for miter-saw stations; tolerance is a plan setting", status: "practice" }],
  severity: "conflict",
  cautions: ["Check with a straightedge from the saw table across the counter under the track after both are fixed down."],
  ...perFixture(check),
};
