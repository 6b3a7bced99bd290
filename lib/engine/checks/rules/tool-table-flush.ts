import type { CheckContext } from "../context";
import { finding } from "../finding";
import { convexPenetration, expandBounds, polygonBounds } from "../geom/polygon";
import { isCounter, isMiterStation, worldWorkSurface } from "../kinds";
import type { Finding, Rule } from "../types";
import { perFixture } from "../per-fixture";

const ID = "table-flush";
/** Counters this close beside a tool table count as its neighbours, mm (our own choice). */
const NEIGHBOUR_GAP_MM = 50;

function check(ctx: CheckContext, ids?: ReadonlySet<string>): Finding[] {
  const out: Finding[] = [];
  const tol = ctx.numbers.flushToleranceMm;
  for (const f of ctx.fixtures) {
    if ((ids && !ids.has(f.id)) || !isMiterStation(f)) continue;
    const table = worldWorkSurface(f);
    if (table === undefined) continue;
    const near = ctx.solids.query(expandBounds(polygonBounds(f.body.polygon), NEIGHBOUR_GAP_MM));
    for (const s of near) {
      const n = s.fixture;
      if (!n || n.id === f.id || !isCounter(n)) continue;
      if (convexPenetration(f.body.polygon, n.body.polygon) < -NEIGHBOUR_GAP_MM) continue;
      const top = worldWorkSurface(n)!;
      const diff = top - table;
      const pass = Math.abs(diff) <= tol;
      const where = diff > 0 ? "below" : "above";
      const msg = pass
        ? `${f.label} table is flush with ${n.label} (within ${ctx.lenFine(tol)}${ctx.presetNote("flushToleranceMm")}).`
        : `${f.label} table sits ${ctx.lenFine(Math.abs(diff))} ${where} ${n.label}; flush means within ${ctx.lenFine(tol)}${ctx.presetNote("flushToleranceMm")}. Adjust the shelf height.`;
      out.push(
        finding(ID, "conflict", pass, f.id, msg, {
          fixtureIds: [f.id, n.id],
          measured: Math.abs(diff),
          required: tol,
          shortfall: Math.abs(diff) - tol,
          unit: "mm",
        }),
      );
    }
  }
  return out;
}

/** Tool table flush with the counters either side, within the flush tolerance. */
export const tableFlushRule: Rule<CheckContext> = {
  id: ID,
  title: "Tool table flush with the counters",
  protects:
    "A board resting on the counters and the saw table at once must lie flat: a table higher than the counters rocks the board, a lower one lets it droop into the blade and spoils the cut.",
  formula: "| counter top height - tool table height | <= flush tolerance",
  numbers: [{ label: "Flush tolerance (plan setting)", value: "1/32 in (0.8 mm) by default" }],
  sources: [{ citation: "Common shop practice; tolerance is a plan setting", status: "practice", note: "1/32 in is the tolerance of sheet-goods thickness in PS 1 and a common target for flush work." }],
  severity: "conflict",
  cautions: ["Check with a straightedge across both counters and the saw table after the saw is bolted down."],
  ...perFixture(check),
};
