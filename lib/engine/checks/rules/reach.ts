import type { CheckContext } from "../context";
import { finding } from "../finding";
import { convexPenetration, polygonBounds } from "../geom/polygon";
import { fixtureInfo, hasShelves, isCounter } from "../kinds";
import type { Finding, Rule } from "../types";
import { perFixture } from "../per-fixture";

const ID = "reach";

function check(ctx: CheckContext, ids?: ReadonlySet<string>): Finding[] {
  const out: Finding[] = [];
  const n = ctx.numbers;
  const note = ctx.presetNote("reachMaxMm", "reachOverObstructionMm");
  for (const f of ctx.fixtures) {
    if ((ids && !ids.has(f.id)) || !hasShelves(f)) continue;
    const shelfTop = fixtureInfo(f).shelfTopMm;
    const top = shelfTop !== undefined ? f.origin.z + shelfTop : f.body.zMax;
    // Reaching over a counter deeper than 20 in lowers the limit.
    let over: string | undefined;
    for (const s of ctx.solids.query(polygonBounds(f.body.polygon))) {
      const c = s.fixture;
      if (!c || c.id === f.id || !isCounter(c) || c.footprint.depthMm <= n.reachObstructionDepthMm) continue;
      if (convexPenetration(c.body.polygon, f.body.polygon) > n.collisionToleranceMm && c.body.zMax <= f.body.zMin + 1) over = c.label;
    }
    const limit = over ? n.reachOverObstructionMm : n.reachMaxMm;
    const ok = top <= limit + 0.5;
    const overText = over ? ` over ${over}` : "";
    out.push(
      finding(
        ID,
        "advice",
        ok,
        f.id,
        ok
          ? `${f.label}: top shelf at ${ctx.len(top)} is within ${ctx.len(limit)} forward reach${overText}${note}.`
          : `${f.label}: top shelf at ${ctx.len(top)} is above ${ctx.len(limit)}, the forward reach ADA 2010 308.2 allows${overText} (a conservative reference)${note}. Keep heavy things lower and use a step stool.`,
        { fixtureIds: [f.id], measured: top, required: limit, shortfall: top - limit, unit: "mm" },
      ),
    );
  }
  return out;
}

/** Reach to the top shelf, against ADA 2010 308.2 forward reach as a conservative reference. */
export const reachRule: Rule<CheckContext> = {
  id: ID,
  title: "Reach to top shelves",
  protects: "Lifting a heavy box down from over your head, or over a counter, strains the shoulders and drops things on your head.",
  formula: "top shelf height <= 48 in; <= 44 in when reaching over an obstruction deeper than 20 in",
  numbers: [
    { label: "Unobstructed forward reach", value: "15-48 in" },
    { label: "Over an obstruction deeper than 20 in", value: "44 in" },
  ],
  sources: [
    {
      citation: "ADA Standards for Accessible Design (2010) 308.2",
      status: "published",
      note: "Written for wheelchair users; used here as a conservative reference, not a requirement for a private shop.",
    },
  ],
  severity: "advice",
  cautions: ["Keep heavy items between knee and shoulder height; use a step stool, not a drawer or counter edge."],
  ...perFixture(check),
};
