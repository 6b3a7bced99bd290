import type { Finding } from "@/lib/engine/checks/types";

export type ZoneState = "conflict" | "caution" | "clear";

/** Colour and pattern per state: the pattern and the label carry the meaning without colour. */
export const zoneStyle: Record<ZoneState, { colour: string; pattern: "hatch" | "dots" | "plain"; label: string }> = {
  conflict: { colour: "#b5432c", pattern: "hatch", label: "Conflict" },
  caution: { colour: "#d99a1e", pattern: "dots", label: "Caution" },
  clear: { colour: "#2f7d4f", pattern: "plain", label: "Clear" },
};

/** Each zone's state from the failing findings that name it. */
export function zoneStates(findings: readonly Finding[]): Map<string, ZoneState> {
  const out = new Map<string, ZoneState>();
  for (const f of findings) {
    if (f.pass) continue;
    const st: ZoneState = f.severity === "conflict" ? "conflict" : "caution";
    for (const z of f.zoneIds) if (out.get(z) !== "conflict") out.set(z, st);
  }
  return out;
}

