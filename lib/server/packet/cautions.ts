import { RULES } from "@/lib/engine/checks/registry";
import type { Finding } from "@/lib/engine/checks/types";
import type { PacketCaution } from "./types";

/** Said under every caution: the packet is a planning aid. */
export const DEFER = "Local codes, licensed trades and the tool makers' manuals come first.";

/** Cautions every shop build carries, whatever the plan holds (common practice). */
const ALWAYS: PacketCaution[] = [
  {
    title: "Before any cut",
    text: "Read the saw's manual and keep its guards, riving knife and anti-kickback parts fitted; wear eye and hearing protection; unplug a machine before changing a blade or bit.",
    source: "common practice; the tool maker's manual",
  },
  {
    title: "Heavy and tall pieces",
    text: "Sheet goods are heavy and awkward: get help or a panel cart, and cut full sheets down with support on both sides of the blade.",
    source: "common practice",
  },
];

/**
 * The plan's cautions: every rule with something open in this plan that carries cautions (its
 * source named), then the ones every build carries; each defers to local codes and the manuals.
 */
export function packetCautions(findings: readonly Finding[]): PacketCaution[] {
  const open = new Set(findings.filter((f) => !f.pass).map((f) => f.ruleId));
  const out: PacketCaution[] = [];
  const seen = new Set<string>();
  for (const r of RULES) {
    if (!open.has(r.id)) continue;
    for (const c of r.cautions) {
      if (seen.has(c)) continue;
      seen.add(c);
      out.push({ title: r.title, text: c, source: r.sources[0]?.citation ?? "common practice" });
    }
  }
  return [...out, ...ALWAYS];
}
