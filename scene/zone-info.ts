import type { Finding } from "@/lib/engine/checks/types";
import type { WorldZone } from "@/lib/engine/fixtures/types";
import type { Prism } from "@/lib/engine/geometry/types";
import { zoneStyle, type ZoneState } from "./zone-states";

/** A zone's size on the floor along its own first edge (its length) and across it, and its height, mm. */
export function zoneSize(prism: Prism): { lengthMm: number; acrossMm: number; heightMm: number } {
  const pts = prism.polygon;
  const heightMm = prism.zMax - prism.zMin;
  if (pts.length < 2) return { lengthMm: 0, acrossMm: 0, heightMm };
  // An oriented box on the first edge: exact for the rectangles most zones are, a fair measure for swing arcs.
  const ex = pts[1].x - pts[0].x;
  const ey = pts[1].y - pts[0].y;
  const len = Math.hypot(ex, ey) || 1;
  const ux = ex / len;
  const uy = ey / len;
  let a0 = Infinity;
  let a1 = -Infinity;
  let b0 = Infinity;
  let b1 = -Infinity;
  for (const p of pts) {
    const a = p.x * ux + p.y * uy;
    const b = -p.x * uy + p.y * ux;
    a0 = Math.min(a0, a);
    a1 = Math.max(a1, a);
    b0 = Math.min(b0, b);
    b1 = Math.max(b1, b);
  }
  return { lengthMm: a1 - a0, acrossMm: b1 - b0, heightMm };
}

/** One number pair of a finding, already written in the user's units. */
export interface ZoneFindingLine {
  ruleId: string;
  severity: Finding["severity"];
  measured?: string;
  required?: string;
  message: string;
}

export interface ZoneInfo {
  label: string;
  /** e.g. `24" × 36", 30" high`. */
  size: string;
  state: ZoneState;
  stateText: string;
  findings: ZoneFindingLine[];
}

/** Writes a finding's number in its unit; lengths go through the plan's length format. */
export function formatFindingNumber(v: number, unit: Finding["unit"], formatLength: (mm: number) => string): string {
  switch (unit) {
    case "deg":
      return `${v.toFixed(1)}°`;
    case "mm/m":
      return `${v.toFixed(2)} mm per m`;
    case "kg":
      return `${v.toFixed(1)} kg`;
    case "%":
      return `${Math.round(v)} %`;
    default:
      return formatLength(v);
  }
}

/**
 * What the hover card says about a zone: its name, size, state in words, and the measured and
 * required numbers of the failing findings naming it (passing ones when none fails).
 */
export function describeZone(zone: WorldZone, findings: readonly Finding[], state: ZoneState, formatLength: (mm: number) => string): ZoneInfo {
  const s = zoneSize(zone.prism);
  const naming = findings.filter((f) => f.zoneIds.includes(zone.id));
  const failing = naming.filter((f) => !f.pass);
  const shown = (failing.length ? failing : naming).slice(0, 3);
  return {
    label: zone.label,
    size: `${formatLength(s.lengthMm)} × ${formatLength(s.acrossMm)}, ${formatLength(s.heightMm)} high`,
    state,
    stateText: zoneStyle[state].label,
    findings: shown.map((f) => ({
      ruleId: f.ruleId,
      severity: f.severity,
      measured: f.measured !== undefined ? formatFindingNumber(f.measured, f.unit, formatLength) : undefined,
      required: f.required !== undefined ? formatFindingNumber(f.required, f.unit, formatLength) : undefined,
      message: f.message,
    })),
  };
}

const rank: Record<ZoneState, number> = { conflict: 0, caution: 1, clear: 2 };

/** Of the zones under the pointer (nearest first), the one to describe: the worst state wins, then the nearest. */
export function pickHoveredZone(hitIds: readonly string[], states: ReadonlyMap<string, ZoneState>): string | null {
  let best: string | null = null;
  let bestRank = 3;
  for (const id of hitIds) {
    const r = rank[states.get(id) ?? "clear"];
    if (r < bestRank) {
      best = id;
      bestRank = r;
    }
  }
  return best;
}
