import type { CheckContext } from "../context";
import { finding } from "../finding";
import { outsideDepth } from "../geom/polygon";
import type { Finding, Rule } from "../types";
import { intrusions } from "../zone-intrusions";

const ID = "parking-bay";

function check(ctx: CheckContext): Finding[] {
  const out: Finding[] = [];
  for (const z of ctx.zones) {
    if (z.purpose !== "parking-vehicle" && z.purpose !== "parking-doors") continue;
    const what = z.purpose === "parking-vehicle" ? "the parked vehicle" : "the open car doors";
    const outside = outsideDepth(z.prism.polygon, ctx.roomPolygon);
    if (outside > ctx.numbers.collisionToleranceMm) {
      out.push(
        finding(ID, "conflict", false, z.id, `The room is ${ctx.len(outside)} too small for ${what} (${z.ownerId}).`, {
          zoneIds: [z.id],
          measured: outside,
          required: 0,
          shortfall: outside,
          unit: "mm",
        }),
      );
    }
    const hits = intrusions(ctx, z, (s) => s.source === "obstacle" && s.kind === "parking-bay");
    for (const h of hits) {
      out.push(
        finding(ID, "conflict", false, z.id, `${h.solid.label} reaches ${ctx.len(h.depthMm)} into ${what} (${z.ownerId}).`, {
          fixtureIds: h.solid.source === "fixture" ? [h.solid.id] : [],
          zoneIds: [z.id],
          measured: h.depthMm,
          required: 0,
          shortfall: h.depthMm,
          unit: "mm",
        }),
      );
    }
    if (outside <= ctx.numbers.collisionToleranceMm && !hits.length) {
      out.push(finding(ID, "conflict", true, z.id, `Room for ${what} (${z.ownerId}).`, { zoneIds: [z.id], measured: 0, required: 0, unit: "mm" }));
    }
  }
  return out;
}

/** The parked vehicle and its open doors fit the room and meet no fixture. */
export const parkingBayRule: Rule<CheckContext> = {
  id: ID,
  title: "Parking bay: the car and its open doors fit",
  protects: "The car still parks here. A cabinet in the door's path dents the door and the cabinet, and a bay that is too short leaves the garage door unable to close.",
  formula: "vehicle footprint and a door-opening strip each side (plan values) inside the walls, with nothing in them up to 6 ft",
  numbers: [
    { label: "Vehicle length and width", value: "from the plan" },
    { label: "Door opening each side", value: "from the plan (30 in by default)" },
    { label: "Height kept clear", value: "6 ft (practice)" },
  ],
  sources: [{ citation: "Plan values; clear height is common practice", status: "practice" }],
  severity: "conflict",
  cautions: ["Mark the parking stop on the floor; a wheel stop keeps the bumper off the bench."],
  scope: "plan",
  evaluate: (_plan, ctx) => check(ctx),
};
