import { fixtureSolid, type CheckContext } from "../context";
import { finding } from "../finding";
import { prismPenetration } from "../geom/polygon";
import { KIND, isCounter } from "../kinds";
import type { Finding, Rule } from "../types";
import { perFixture } from "../per-fixture";

const ID = "collisions";

/** A stop track sits on its counter: touching or a shallow overlap is by design. */
const sitsOn = (aKind: string, bCounter: boolean) => aKind === KIND.stopTrack && bCounter;

function check(ctx: CheckContext, ids?: ReadonlySet<string>): Finding[] {
  const out: Finding[] = [];
  const tol = ctx.numbers.collisionToleranceMm;
  for (const f of ctx.fixtures) {
    const fIn = !ids || ids.has(f.id);
    for (const s of ctx.solids.query(fixtureSolid(f).bounds)) {
      if (s.id === f.id) continue;
      if (s.source === "obstacle" && (s.kind === "parking-bay" || s.kind === "outlet")) continue;
      // Each pair once: fixtures by id order, subject "a|b" so a re-check after either moves replaces it.
      if (s.source === "fixture") {
        if (s.id < f.id) continue;
        if (ids && !fIn && !ids.has(s.id)) continue;
        const o = s.fixture!;
        if (sitsOn(f.kind, isCounter(o)) || sitsOn(o.kind, isCounter(f))) continue;
      } else if (!fIn) continue;
      const d = prismPenetration(f.body, s.prism);
      if (d <= tol) continue;
      out.push(
        finding(ID, "conflict", false, s.source === "fixture" ? `${f.id}|${s.id}` : f.id, `${f.label} and ${s.label} overlap by ${ctx.len(d)}.`, {
          fixtureIds: s.source === "fixture" ? [f.id, s.id] : [f.id],
          measured: d,
          required: 0,
          shortfall: d,
          unit: "mm",
        }),
      );
    }
  }
  return out;
}

/** No two fixtures, or a fixture and an obstacle, occupy the same space. */
export const collisionsRule: Rule<CheckContext> = {
  id: ID,
  title: "Fixtures do not overlap",
  protects: "Two things cannot stand in the same place: an overlap on the plan means a cabinet that will not fit, or one that hides a water heater's or a post's clearance.",
  formula: "overlap depth between any two bodies (plan and height) <= 1 mm",
  numbers: [{ label: "Touching tolerance", value: "1 mm" }],
  sources: [{ citation: "Geometry; tolerance is our own", status: "derived" }],
  severity: "conflict",
  cautions: ["Water heaters and furnaces need their own clearances from the maker's instructions and local code; keep storage away from them."],
  ...perFixture(check),
};
