import type { CheckContext } from "../context";
import { finding } from "../finding";
import type { Finding, Rule, Severity } from "../types";
import { intrusions } from "../zone-intrusions";

const ID = "openings-clear";
const WATCHED: Record<string, { what: string; severity: Severity; fix: string }> = {
  "entry-door-swing": { what: "the swing of the entry door", severity: "conflict", fix: "The door must open fully: it is a way out." },
  doorway: { what: "the doorway", severity: "conflict", fix: "Keep the way through the door clear: it is a way out." },
  "garage-door-opening": { what: "the overhead door's travel", severity: "conflict", fix: "The door sections sweep this space as they open." },
  "garage-door-track": { what: "the overhead door's track and open door", severity: "conflict", fix: "Keep everything below the open door and its track." },
  window: { what: "the window", severity: "advice", fix: "A fixture here covers the window; keep it below the sill if you want the light and the air." },
};

function check(ctx: CheckContext): Finding[] {
  const out: Finding[] = [];
  for (const z of ctx.zones) {
    const w = WATCHED[z.purpose];
    if (!w) continue;
    const hits = intrusions(ctx, z, (s) => s.source === "obstacle" && s.kind === "parking-bay");
    if (!hits.length) {
      out.push(finding(ID, w.severity, true, z.id, `Nothing stands in ${w.what} (${z.ownerId}).`, { zoneIds: [z.id], measured: 0, required: 0, unit: "mm" }));
      continue;
    }
    for (const h of hits) {
      out.push(
        finding(ID, w.severity, false, z.id, `${h.solid.label} reaches ${ctx.len(h.depthMm)} into ${w.what} (${z.ownerId}). ${w.fix}`, {
          fixtureIds: h.solid.source === "fixture" ? [h.solid.id] : [],
          zoneIds: [z.id],
          measured: h.depthMm,
          required: 0,
          shortfall: h.depthMm,
          unit: "mm",
        }),
      );
    }
  }
  return out;
}

/** Door swings, doorways, the overhead door's travel and track, and windows kept clear. */
export const openingsClearRule: Rule<CheckContext> = {
  id: ID,
  title: "Doors, overhead door and windows clear",
  protects:
    "A door that cannot open fully is a blocked way out. An overhead door that meets a rack or a tall cabinet on its way up bends its sections and can drop; its track needs the space under it empty.",
  formula: "no fixture or obstacle inside: the door's swing (radius = door width), the doorway, the overhead door's travel and track zone (door width x track depth, from the door's top to the ceiling), the window above its sill",
  numbers: [
    { label: "Door swing radius", value: "the door's width" },
    { label: "Overhead door curve", value: "about 12 in into the room (practice)" },
    { label: "Track zone", value: "door width x track depth (plan), from the door's top to the ceiling" },
  ],
  sources: [{ citation: "Common practice for door clearances and overhead door installation", status: "practice" }],
  severity: "conflict",
  cautions: [
    "Overhead door springs and cables are under high tension: leave adjustments to a trained technician.",
    "Local building and fire codes set the exit requirements; they come first.",
  ],
  scope: "plan",
  evaluate: (_plan, ctx) => check(ctx),
};
