import type { CheckContext } from "../context";
import { finding } from "../finding";
import { KIND } from "../kinds";
import type { Finding, Rule } from "../types";
import { perFixture } from "../per-fixture";

const ID = "stop-track-attached";

function check(ctx: CheckContext, ids?: ReadonlySet<string>): Finding[] {
  const out: Finding[] = [];
  for (const f of ctx.fixtures) {
    if ((ids && !ids.has(f.id)) || f.kind !== KIND.stopTrack || !f.track) continue;
    const t = f.track;
    const saw = t.sawId ? ctx.fixtureById.get(t.sawId) : undefined;
    const msg = t.attached
      ? `${f.label} belongs to ${saw?.label ?? "its saw"}, ${t.side} of the blade as you face the wall; it follows the saw when the saw moves.`
      : t.sawId
        ? `${f.label} is detached: its saw station (${t.sawId}) is no longer in the plan, so the track stays where it was and its stop table counts from a start you typed. Choose a saw for it under Saw in its properties, or delete it.`
        : `${f.label} is detached: it belongs to no saw, so nothing places it beside a blade and its stop table counts from a start you typed. Choose a saw for it under Saw in its properties, or add it again by clicking near the saw.`;
    out.push(finding(ID, "caution", t.attached, f.id, msg, { fixtureIds: t.sawId && saw ? [f.id, t.sawId] : [f.id] }));
  }
  return out;
}

/** Every stop track belongs to a saw station in the plan. */
export const stopTrackAttachedRule: Rule<CheckContext> = {
  id: ID,
  title: "Stop track on a saw",
  protects:
    "A stop track sets cut lengths from the blade. One that belongs to no saw has nothing to measure from: its stops read true only if someone re-measures the track's start by hand whenever the saw or the counters move.",
  formula: "the track names a saw station (tool shelf) that is in the plan",
  numbers: [{ label: "Saw", value: "the tool shelf the track belongs to (its properties)" }],
  sources: [{ citation: "Geometry of the plan: the stop table counts from the blade", status: "derived" }],
  severity: "caution",
  cautions: ["After moving a saw or a track, check the first cut against a tape before running a batch."],
  ...perFixture(check),
};
