import type { CheckContext } from "../context";
import { finding } from "../finding";
import { KIND, isWallHung } from "../kinds";
import type { Finding, Rule } from "../types";
import { perFixture } from "../per-fixture";

const ID = "anchor-fixtures";

function check(ctx: CheckContext, ids?: ReadonlySet<string>): Finding[] {
  const out: Finding[] = [];
  const tall = ctx.numbers.tallFixtureMm;
  for (const f of ctx.fixtures) {
    // A stop track rides on its counter; the counter is what gets fastened.
    if ((ids && !ids.has(f.id)) || f.kind === KIND.stopTrack) continue;
    const hung = isWallHung(f);
    const height = f.body.zMax - f.body.zMin;
    if (!hung && height < tall) continue;
    const why = hung ? "hangs on the wall" : `stands ${ctx.len(height)} tall`;
    out.push(
      finding(ID, "advice", false, f.id, `${f.label} ${why}: fasten it to studs or masonry (not drywall anchors alone). Follow local codes.`, {
        fixtureIds: [f.id],
        measured: height,
        required: tall,
        unit: "mm",
      }),
    );
  }
  return out;
}

/** Advice: anchor tall and wall-hung fixtures to the structure. */
export const anchorFixturesRule: Rule<CheckContext> = {
  id: ID,
  title: "Anchor tall and wall-hung fixtures",
  protects: "A loaded cabinet or rack that tips or pulls off the wall can crush someone; children climb shelves.",
  formula: "advice for every wall-hung fixture and every fixture 27 in or taller",
  numbers: [{ label: "Tall", value: "27 in (686 mm) and up" }],
  sources: [
    {
      citation: "ASTM F2057-23 (scope)",
      status: "published",
      note: "The standard covers clothing storage units, not shop cabinets; the 27 in threshold is recalled from its scope (memory). The advice to anchor is common practice.",
    },
  ],
  severity: "advice",
  cautions: ["Use fasteners rated for the load into studs or masonry; local codes and the maker's instructions come first."],
  ...perFixture(check),
};
