import type { RuleNumbers } from "@/lib/engine/checks/numbers";
import { evaluatePlan } from "@/lib/engine/checks/evaluate";
import type { Finding } from "@/lib/engine/checks/types";
import { derivePlan } from "@/lib/engine/derive";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { logError } from "../log";

export interface SharedAnalysis {
  findings: Finding[];
  error: string | null;
}

/**
 * Findings (with the adopted preset's numbers) of a plan, computed on the server
 * with the same engine the editor uses, for read-only pages.
 */
export function analyseForReading(doc: PlanDocument, preset: { name: string; numbers: Partial<RuleNumbers> } | null): SharedAnalysis {
  try {
    const derived = derivePlan(doc);
    const findings = evaluatePlan(doc, derived, preset ? { preset: preset.numbers, presetLabel: preset.name } : {});
    // The engine builds findings with a constructor; pages hand them to client components, which take plain objects only.
    return { findings: findings.map((f) => ({ ...f })), error: null };
  } catch (e) {
    logError("read-only analysis failed", e);
    return { findings: [], error: "The checks could not run on this plan." };
  }
}
