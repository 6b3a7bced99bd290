import type { CheckContext } from "../context";
import { finding } from "../finding";
import { convexPenetration, polygonBounds, prismPenetration } from "../geom/polygon";
import { KIND, PURPOSE, isCounter, isWallHung, worldWorkSurface } from "../kinds";
import type { Finding, Rule } from "../types";
import { perFixture } from "../per-fixture";

const ID = "wall-cabinet-clearance";

function check(ctx: CheckContext, ids?: ReadonlySet<string>): Finding[] {
  const out: Finding[] = [];
  const n = ctx.numbers;
  const note = ctx.presetNote("wallCabinetGapMm");
  for (const f of ctx.fixtures) {
    if (!isWallHung(f) || f.kind === KIND.stopTrack) continue;
    if (ids && !ids.has(f.id)) continue;
    const fb = polygonBounds(f.body.polygon);
    if (f.kind === KIND.wallCabinet) {
      for (const s of ctx.solids.query(fb)) {
        const c = s.fixture;
        if (!c || c.id === f.id || !isCounter(c)) continue;
        // Above a counter: the gap between the counter top and the cabinet's bottom.
        if (convexPenetration(f.body.polygon, c.body.polygon) <= n.collisionToleranceMm) continue;
        const top = worldWorkSurface(c)!;
        if (top > f.body.zMin) continue;
        const gap = f.body.zMin - top;
        const ok = gap >= n.wallCabinetGapMm - 0.5;
        out.push(
          finding(
            ID,
            "caution",
            ok,
            f.id,
            ok
              ? `${f.label} hangs ${ctx.len(gap)} above ${c.label} (${ctx.len(n.wallCabinetGapMm)} wanted)${note}.`
              : `${f.label} hangs only ${ctx.len(gap)} above ${c.label}; leave ${ctx.len(n.wallCabinetGapMm)} to work under it${note}.`,
            { fixtureIds: [f.id, c.id], measured: gap, required: n.wallCabinetGapMm, shortfall: n.wallCabinetGapMm - gap, unit: "mm" },
          ),
        );
      }
    }
    // Above the miter saw: the raised head must not reach anything hung on the wall.
    for (const zi of ctx.zoneIndex.query(fb)) {
      const z = zi.zone;
      if (z.purpose !== PURPOSE.miterHead || z.ownerId === f.id) continue;
      if (convexPenetration(z.prism.polygon, f.body.polygon) <= n.collisionToleranceMm) continue;
      const owner = ctx.fixtureById.get(z.ownerId);
      const d = prismPenetration(z.prism, f.body);
      const ok = d <= n.collisionToleranceMm;
      const on = owner?.label ?? z.ownerId;
      out.push(
        finding(
          ID,
          "conflict",
          ok,
          f.id,
          ok ? `${f.label} is clear of the raised saw head on ${on}.` : `${f.label} is ${ctx.len(d)} into the raised saw head's space on ${on}: raise or move it.`,
          { fixtureIds: [f.id, z.ownerId], zoneIds: [z.id], measured: Math.max(0, d), required: 0, shortfall: d, unit: "mm" },
        ),
      );
    }
  }
  return out;
}

/** Wall cabinets 18 in above counters and clear of the miter saw's raised head. */
export const wallCabinetRule: Rule<CheckContext> = {
  id: ID,
  title: "Wall cabinets above counters and the saw",
  protects: "Room to work under a wall cabinet without hitting your head or the tools you lift; a saw head that swings up into a cabinet stops short or knocks the cabinet loose.",
  formula: "cabinet bottom - counter top >= 18 in; cabinet clear of the saw's raised-head zone",
  numbers: [{ label: "Gap above counters", value: "18 in (457 mm)" }],
  sources: [{ citation: "Kitchen cabinet convention: wall cabinets 18 in above the counter", status: "practice" }],
  severity: "caution",
  cautions: ["Hang wall cabinets on a cleat or screws into studs; never on drywall anchors alone."],
  ...perFixture(check),
};
