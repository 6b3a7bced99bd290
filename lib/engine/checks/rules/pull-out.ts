import type { CheckContext } from "../context";
import { PURPOSE } from "../kinds";
import type { Finding, Rule } from "../types";
import { zoneRunFinding } from "../zone-run";
import { perFixture } from "../per-fixture";

const ID = "pull-out";
const NAMES: Record<string, string> = {
  [PURPOSE.drawerPull]: "drawers",
  [PURPOSE.doorSwing]: "doors",
  "work-aisle": "standing room",
  "loading-aisle": "room to load and pull stock",
  "rear-clearance": "room behind the tool",
};

function check(ctx: CheckContext, ids?: ReadonlySet<string>): Finding[] {
  const out: Finding[] = [];
  for (const f of ctx.fixtures) {
    if (ids && !ids.has(f.id)) continue;
    for (const z of f.zones) {
      const what = NAMES[z.purpose];
      if (!what) continue;
      out.push(zoneRunFinding(ctx, f, z, { ruleId: ID, what, zLo: z.prism.zMin, zHi: z.prism.zMax }));
    }
  }
  return out;
}

/** Drawers and doors of a fixture open fully without meeting anything. */
export const pullOutRule: Rule<CheckContext> = {
  id: ID,
  title: "Drawers, doors and working room clear",
  protects: "A drawer that stops against a neighbour or a post cannot be emptied, and people learn to yank it, which wrecks slides and pinches fingers.",
  formula: "clear length in front of each drawer, door, bench or rack (at its height) >= the depth its zone asks",
  numbers: [
    { label: "Pull-out depth", value: "the drawer's slide length, or the door's width, as the fixture defines it" },
    { label: "Standing room at a bench, loading room at a rack", value: "as the fixture defines it" },
  ],
  sources: [{ citation: "Common cabinetmaking practice", status: "practice" }],
  severity: "conflict",
  cautions: [],
  ...perFixture(check),
};
