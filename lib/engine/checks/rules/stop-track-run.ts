import type { CheckContext } from "../context";
import { finding } from "../finding";
import { KIND } from "../kinds";
import type { Finding, Rule } from "../types";
import { perFixture } from "../per-fixture";

const ID = "stop-track-run";

function check(ctx: CheckContext, ids?: ReadonlySet<string>): Finding[] {
  const out: Finding[] = [];
  const docs = new Map(ctx.plan.fixtures.map((d) => [d.id, d]));
  for (const f of ctx.fixtures) {
    if ((ids && !ids.has(f.id)) || f.kind !== KIND.stopTrack || !f.track?.attached || f.track.counterTopMm === undefined) continue;
    const run = f.track.counterRunMm ?? 0;
    const length = f.footprint.widthMm;
    const over = length - run;
    const ok = over <= 0.5;
    const lengthTyped = docs.get(f.id)?.params.lengthMm !== undefined;
    out.push(
      finding(
        ID,
        "conflict",
        ok,
        f.id,
        ok
          ? `${f.label} (${ctx.len(length)}) fits on the ${ctx.len(run)} of counter ${f.track.side} of the blade.`
          : `${f.label} is ${ctx.len(length)} long but the counter ${f.track.side} of the blade runs ${ctx.len(run)} from the track's start: ${ctx.len(over)} would hang past its end. ${lengthTyped ? "Shorten the track" : "Set a shorter track length"} or extend the counter run.`,
        { fixtureIds: [f.id], measured: length, required: run, shortfall: over, unit: "mm" },
      ),
    );
  }
  return out;
}

/** A stop track on its saw fits on the counter run beside the saw. */
export const stopTrackRunRule: Rule<CheckContext> = {
  id: ID,
  title: "Stop track within its counter run",
  protects:
    "A track that runs past the end of the counter has nothing under its far end: the fence flexes when a board hits a stop there, and the stops past the counter cannot be trusted.",
  formula: "track length <= length of counter from the track's start outward (gaps up to 1 in bridged)",
  numbers: [{ label: "Gap a fence bridges", value: "1 in (our own choice)" }],
  sources: [{ citation: "Geometry of the plan", status: "derived" }],
  severity: "conflict",
  cautions: ["Screw the fence down into the counter along its whole length; a fence that moves sets every stop wrong."],
  ...perFixture(check),
};
