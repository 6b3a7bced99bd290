import type { Obstacle } from "../../plan/schema";
import { clearRun } from "../clear-run";
import type { CheckContext } from "../context";
import { finding } from "../finding";
import { centroid, polygonBounds, prismPenetration } from "../geom/polygon";
import { firstHitConvex, stripBounds, stripThroughZone } from "../geom/strip";
import type { RuleNumbers } from "../numbers";
import type { Finding, Rule } from "../types";

const ID = "panel-working-space";
type Panel = Extract<Obstacle, { kind: "panel" }>;

/** Working-space depth for a panel, mm (NEC Table 110.26(A)(1)), from the numbers in force. */
export function requiredPanelDepth(n: RuleNumbers, p: Pick<Panel, "voltageClass" | "condition">): number {
  if (p.voltageClass === "0-150") return n.panelDepthLowVoltageMm;
  return [n.panelDepthCond1Mm, n.panelDepthCond2Mm, n.panelDepthCond3Mm][p.condition - 1];
}

function check(ctx: CheckContext): Finding[] {
  const out: Finding[] = [];
  const n = ctx.numbers;
  const panels = ctx.plan.room.obstacles.filter((o): o is Panel => o.kind === "panel");
  for (const [i, p] of panels.entries()) {
    const work = ctx.zones.find((z) => z.id === `${p.id}:working-space`);
    const ded = ctx.zones.find((z) => z.id === `${p.id}:dedicated-space`);
    const body = ctx.obstacles.find((o) => o.id === p.id);
    if (!work || !body) continue;
    // Panels have no name of their own: number them in plan order when there are several.
    const named = panels.length > 1 ? `electrical panel ${i + 1}` : "the electrical panel";
    const label = named[0].toUpperCase() + named.slice(1);
    const top = body.body.zMax;
    const depth = requiredPanelDepth(n, p);
    const width = Math.max(n.panelMinWidthMm, p.widthMm);
    const height = Math.max(n.panelHeadroomMm, top);
    const note = ctx.presetNote("panelDepthLowVoltageMm", "panelDepthCond1Mm", "panelDepthCond2Mm", "panelDepthCond3Mm", "panelMinWidthMm", "panelHeadroomMm");
    const strip = { ...stripThroughZone(work.prism.polygon, centroid(body.body.polygon)), length: depth };
    const run = clearRun(ctx, strip, { zLo: 0, zHi: height, excludeId: p.id });
    let clear = run.clearMm;
    let by = run.blocker?.label;
    let blockerId = run.blocker?.source === "fixture" ? run.blocker.id : undefined;
    for (const zi of ctx.zoneIndex.query(stripBounds(strip, 1))) {
      if (zi.zone.purpose !== "parking-vehicle" && zi.zone.purpose !== "parking-doors") continue;
      const d = firstHitConvex(strip, zi.zone.prism.polygon);
      if (d < clear) {
        clear = Math.max(0, d);
        by = "the parking bay";
        blockerId = undefined;
      }
    }
    const dOk = clear >= depth - 0.5;
    out.push(
      finding(
        ID,
        "conflict",
        dOk,
        p.id,
        dOk
          ? `${label}: ${ctx.len(depth)} of working space clear in front (NEC 110.26(A)(1))${note}.`
          : `${label}: only ${ctx.len(clear)} clear in front${by ? `, blocked by ${by}` : ""}; NEC 110.26(A)(1) asks ${ctx.len(depth)} for ${p.voltageClass} V, condition ${p.condition}${note}.`,
        { fixtureIds: blockerId ? [blockerId] : [], zoneIds: [work.id], measured: clear, required: depth, shortfall: depth - clear, unit: "mm", at: dOk ? undefined : run.at },
      ),
    );
    const w = strip.vMax - strip.vMin;
    const wOk = w >= width - 0.5;
    out.push(
      finding(
        ID,
        "conflict",
        wOk,
        p.id,
        wOk
          ? `${label}: working space ${ctx.len(w)} wide (NEC 110.26(A)(2) asks ${ctx.len(width)})${note}.`
          : `${label}: the wall leaves only ${ctx.len(w)} of width; NEC 110.26(A)(2) asks ${ctx.len(width)} (30 in or the panel's width)${note}.`,
        { zoneIds: [work.id], measured: w, required: width, shortfall: width - w, unit: "mm" },
      ),
    );
    const ceil = ctx.room.ceilingHeightMm;
    const hOk = ceil >= height - 0.5;
    out.push(
      finding(
        ID,
        "conflict",
        hOk,
        p.id,
        hOk
          ? `${label}: headroom ${ctx.len(ceil)} meets ${ctx.len(height)} (NEC 110.26(A)(3))${note}.`
          : `${label}: ceiling at ${ctx.len(ceil)} is below the ${ctx.len(height)} of headroom NEC 110.26(A)(3) asks${note}.`,
        { zoneIds: [work.id], measured: ceil, required: height, shortfall: height - ceil, unit: "mm" },
      ),
    );
    if (ded) {
      for (const s of ctx.solids.query(polygonBounds(ded.prism.polygon))) {
        if (s.id === p.id) continue;
        const pen = prismPenetration(ded.prism, s.prism);
        if (pen <= n.collisionToleranceMm) continue;
        out.push(
          finding(ID, "conflict", false, p.id, `${s.label} is in the space reserved above and below ${named} (NEC 110.26(E)(1)(a)): keep the panel's width and depth clear from the floor to 6 ft above it.`, {
            fixtureIds: s.source === "fixture" ? [s.id] : [],
            zoneIds: [ded.id],
            measured: pen,
            required: 0,
            shortfall: pen,
            unit: "mm",
          }),
        );
      }
    }
  }
  return out;
}

/** Electrical panel working space (depth, width, headroom) and dedicated space, NEC 110.26. */
export const panelWorkingSpaceRule: Rule<CheckContext> = {
  id: ID,
  title: "Electrical panel working space",
  protects:
    "Someone working on a live panel must be able to stand square to it, step back and get out. Cabinets, racks or a parked car in that space trap the person against live parts; storage above or below the panel blocks future wiring.",
  formula:
    "clear depth in front >= depth for the voltage and condition; width >= max(30 in, panel width); clear height >= max(6.5 ft, panel top); nothing in the panel's own width and depth from the floor to 6 ft above it",
  numbers: [
    { label: "Depth, 0-150 V to ground (conditions 1-3)", value: "3 ft (914 mm)" },
    { label: "Depth, 151-600 V, conditions 1 / 2 / 3", value: "3 ft / 3.5 ft / 4 ft" },
    { label: "Width", value: "30 in (762 mm) or the panel's width, whichever is greater" },
    { label: "Height", value: "6.5 ft (1981 mm) or the panel's height, whichever is greater" },
    { label: "Dedicated space", value: "panel width x depth, floor to 6 ft above the panel or the ceiling" },
  ],
  sources: [
    { citation: "NFPA 70 (NEC) Table 110.26(A)(1)", status: "published" },
    { citation: "NFPA 70 (NEC) 110.26(A)(2), 110.26(A)(3)", status: "published" },
    { citation: "NFPA 70 (NEC) 110.26(E)(1)(a)", status: "published" },
  ],
  severity: "conflict",
  cautions: [
    "Electrical work is for a licensed electrician; local codes and the inspector have the last word.",
    "The code edition your jurisdiction adopted may differ: check with the local building department.",
  ],
  scope: "plan",
  evaluate: (_plan, ctx) => check(ctx),
};
