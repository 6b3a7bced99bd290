import type { Derived } from "../derive-types";
import type { HardwareItem, WorldZone } from "../fixtures/types";
import { PLAN_LIMITS } from "../plan/limits";
import type { PlanDocument } from "../plan/schema";
import type { EvaluateOptions } from "./context";
import { evaluatePlan } from "./evaluate";
import { resolveNumbers, type RuleNumbers } from "./numbers";
import type { Finding } from "./types";

/** Totals of the parts list by material: pieces, and area (sheet goods, m^2) or length (boards, m). */
export interface MaterialTotal {
  materialId: string;
  stock: "sheet" | "board";
  pieces: number;
  areaM2: number;
  lengthM: number;
}

export interface AnalysisResult {
  summary: { conflicts: number; cautions: number; advice: number; passes: number; fixtures: number };
  /** Findings, most serious first, at most `maxFindings` of them (the summary counts all). */
  findings: Finding[];
  /** Findings left out of the list past `maxFindings`. */
  omittedFindings: number;
  zones: WorldZone[];
  parts: { lines: number; pieces: number; byMaterial: MaterialTotal[]; hardware: Omit<HardwareItem, "fixtureId">[] };
  room: { corners: { x: number; y: number }[]; ceilingHeightMm: number; outOfSquare: { diagonalDifferenceMm: number | null; closureErrorMm: number } };
  numbers: RuleNumbers;
}

const r3 = (v: number) => Math.round(v * 1000) / 1000;

/** Options for the analysis answer: the evaluation's, and how many findings to list (default PLAN_LIMITS.analysisFindings). */
export interface AnalyzeOptions extends EvaluateOptions {
  maxFindings?: number;
}

/** Everything the analyze endpoint returns for a plan: findings (capped, most serious first), zones, a parts summary (mm, m, m^2). */
export function analyzePlan(plan: PlanDocument, derived: Derived, opts: AnalyzeOptions = {}): AnalysisResult {
  const findings = evaluatePlan(plan, derived, opts);
  const cap = Math.max(0, opts.maxFindings ?? PLAN_LIMITS.analysisFindings);
  const count = (sev: Finding["severity"]) => findings.filter((f) => !f.pass && f.severity === sev).length;
  const mats = new Map<string, MaterialTotal>();
  let pieces = 0;
  for (const p of derived.parts) {
    pieces += p.qty;
    const m = mats.get(p.materialId) ?? { materialId: p.materialId, stock: p.stock, pieces: 0, areaM2: 0, lengthM: 0 };
    m.pieces += p.qty;
    if (p.stock === "sheet") m.areaM2 += (p.qty * p.lengthMm * p.widthMm) / 1e6;
    else m.lengthM += (p.qty * p.lengthMm) / 1000;
    mats.set(p.materialId, m);
  }
  const hw = new Map<string, Omit<HardwareItem, "fixtureId">>();
  for (const h of derived.hardware) {
    const k = `${h.key}|${h.unit}`;
    const cur = hw.get(k);
    if (cur) cur.qty += h.qty;
    else hw.set(k, { key: h.key, name: h.name, qty: h.qty, unit: h.unit });
  }
  return {
    summary: { conflicts: count("conflict"), cautions: count("caution"), advice: count("advice"), passes: findings.filter((f) => f.pass).length, fixtures: derived.fixtures.length },
    findings: findings.length > cap ? findings.slice(0, cap) : findings,
    omittedFindings: Math.max(0, findings.length - cap),
    zones: derived.zones,
    parts: {
      lines: derived.parts.length,
      pieces,
      byMaterial: [...mats.values()].map((m) => ({ ...m, areaM2: r3(m.areaM2), lengthM: r3(m.lengthM) })).sort((a, b) => (a.materialId < b.materialId ? -1 : 1)),
      hardware: [...hw.values()].sort((a, b) => (a.key < b.key ? -1 : 1)),
    },
    room: {
      corners: derived.room.corners,
      ceilingHeightMm: derived.room.ceilingHeightMm,
      outOfSquare: { diagonalDifferenceMm: derived.room.report.diagonalDifferenceMm, closureErrorMm: derived.room.report.closureErrorMm },
    },
    numbers: resolveNumbers(plan, opts.preset),
  };
}
