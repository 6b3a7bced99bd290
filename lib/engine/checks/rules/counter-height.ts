import type { CheckContext } from "../context";
import { finding } from "../finding";
import { isCounter, worldWorkSurface } from "../kinds";
import type { Finding, Rule } from "../types";
import { perFixture } from "../per-fixture";

const ID = "counter-height";

function check(ctx: CheckContext, ids?: ReadonlySet<string>): Finding[] {
  const out: Finding[] = [];
  const n = ctx.numbers;
  const elbow = n.elbowHeightMm;
  const estimated = ctx.plan.settings.elbowHeightMm === undefined && !ctx.presetSet.has("elbowHeightMm");
  const note = ctx.presetNote("elbowHeightMm", "lightWorkBelowElbowMinMm", "lightWorkBelowElbowMaxMm", "heavyWorkBelowElbowMaxMm") + (estimated ? " (elbow height estimated from your stature)" : "");
  for (const f of ctx.fixtures) {
    if ((ids && !ids.has(f.id)) || !isCounter(f)) continue;
    const top = worldWorkSurface(f)!;
    const below = elbow - top;
    const tooHigh = below < n.lightWorkBelowElbowMinMm - 0.5;
    const tooLow = below > n.heavyWorkBelowElbowMaxMm + 0.5;
    const toLight = below - n.lightWorkBelowElbowMaxMm;
    const toHeavy = n.lightWorkBelowElbowMaxMm - below;
    const range =
      Math.abs(toLight) <= 0.5
        ? "both light and heavy work (where the two ranges meet)"
        : toLight < 0
          ? `light work, ${ctx.len(toHeavy)} above heavy work`
          : `heavy work, ${ctx.len(toLight)} below light work`;
    const pos = below >= 0 ? `${ctx.len(below)} below` : `${ctx.len(-below)} above`;
    let msg: string;
    if (tooHigh) msg = `${f.label} top at ${ctx.len(top)} is ${pos} your elbow (${ctx.len(elbow)}); standing work wants it at least ${ctx.len(n.lightWorkBelowElbowMinMm)} below${note}.`;
    else if (tooLow) msg = `${f.label} top at ${ctx.len(top)} is ${pos} your elbow (${ctx.len(elbow)}); even heavy work wants it no more than ${ctx.len(n.heavyWorkBelowElbowMaxMm)} below${note}.`;
    else msg = `${f.label} top at ${ctx.len(top)} is ${pos} your elbow (${ctx.len(elbow)}): suits ${range}${note}.`;
    const required = tooLow ? n.heavyWorkBelowElbowMaxMm : n.lightWorkBelowElbowMinMm;
    out.push(
      finding(ID, "caution", !tooHigh && !tooLow, f.id, msg, {
        fixtureIds: [f.id],
        measured: below,
        required,
        shortfall: tooLow ? below - required : tooHigh ? required - below : 0,
        unit: "mm",
      }),
    );
  }
  return out;
}

/** Counter and bench tops against the user's elbow height (Grandjean's ranges). */
export const counterHeightRule: Rule<CheckContext> = {
  id: ID,
  title: "Counter height for your elbow",
  protects: "Work that sits too high lifts the shoulders; work too low bends the back. Both tire you and make tools harder to control.",
  formula: "elbow height - top height: light work 10-15 cm, heavy work 15-40 cm",
  numbers: [
    { label: "Light work", value: "10-15 cm below the elbow" },
    { label: "Heavy work", value: "15-40 cm below the elbow" },
    { label: "Elbow height", value: "plan setting, or 0.62 x stature (Pheasant, 50th percentile ratio; memory)" },
  ],
  sources: [
    { citation: "Grandjean, Fitting the Task to the Man: standing work surface heights below elbow height", status: "published" },
    { citation: "NIOSH Pub. 97-117, Elements of Ergonomics Programs (light 34-37 in, heavy 28-35 in)", status: "published", note: "secondary" },
  ],
  severity: "caution",
  cautions: ["These are comfort ranges, not limits: choose by the work you do most at that surface."],
  ...perFixture(check),
};
