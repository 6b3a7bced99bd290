import type { RuleNumbers } from "@/lib/engine/checks/numbers";
import { evaluatePlan } from "@/lib/engine/checks/evaluate";
import type { Finding } from "@/lib/engine/checks/types";
import { derivePlan } from "@/lib/engine/derive";
import type { PlanDocument } from "@/lib/engine/plan/schema";

export interface SharedPart {
  name: string;
  qty: number;
  lengthMm: number;
  widthMm: number;
  thicknessMm: number;
  materialId: string;
}

export interface SharedAnalysis {
  findings: Finding[];
  parts: SharedPart[];
  error: string | null;
}

/**
 * Findings (with the adopted preset's numbers) and the parts list of a plan, computed on the server
 * with the same engine the editor uses, for read-only pages.
 */
export function analyseForReading(doc: PlanDocument, preset: { name: string; numbers: Partial<RuleNumbers> } | null): SharedAnalysis {
  try {
    const derived = derivePlan(doc);
    const findings = evaluatePlan(doc, derived, preset ? { preset: preset.numbers, presetLabel: preset.name } : {});
    const parts = derived.parts.map((p) => ({ name: p.name, qty: p.qty, lengthMm: p.lengthMm, widthMm: p.widthMm, thicknessMm: p.thicknessMm, materialId: p.materialId }));
    return { findings, parts, error: null };
  } catch (e) {
    console.error("read-only analysis failed", e);
    return { findings: [], parts: [], error: "The checks could not run on this plan." };
  }
}
