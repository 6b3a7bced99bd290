/**
 * Engine work the server hands to the worker pool, one function per task. Each runs inside a worker
 * thread (see worker.ts) and calls only lib/engine/: inputs and results cross the thread boundary by
 * structured clone, so they are plain data (findings lose their constructor on the way, which is
 * what the read-only pages need anyway).
 */
import { buildFromPlan, buildPlan, type BuildResult } from "@/lib/engine/build";
import { analyzePlan } from "@/lib/engine/checks/analyze";
import { evaluatePlan } from "@/lib/engine/checks/evaluate";
import type { RuleNumbers } from "@/lib/engine/checks/numbers";
import type { Finding } from "@/lib/engine/checks/types";
import { derivePlan } from "@/lib/engine/derive";
import { planDrawingsOrNull, type PlanDrawings } from "@/lib/engine/drawings/plan-drawings";
import { planNestOptions } from "@/lib/engine/nesting/plan-nest";
import { PLAN_LIMITS } from "@/lib/engine/plan/limits";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { partsCsv, shoppingCsv } from "@/lib/engine/shopping/csv";
import type { PriceItem } from "@/lib/engine/shopping/price-schema";
import { materialsReport } from "@/lib/engine/shopping/plan-shopping";
import { boundedAnalysisJson } from "./answer-bound";

export interface AnalyzeInput {
  plan: PlanDocument;
  preset?: Partial<RuleNumbers>;
  /** Largest answer, in bytes of JSON: findings (then zones) past it are left out with a note. */
  maxAnswerBytes: number;
}

/** The analyze endpoint's answer as JSON text, at most `maxAnswerBytes` long (serialised here, off the web thread). */
export function analyze(input: AnalyzeInput): string {
  const result = analyzePlan(input.plan, derivePlan(input.plan), { preset: input.preset });
  return boundedAnalysisJson(result, input.maxAnswerBytes);
}

export interface PartsCsvInput {
  plan: PlanDocument;
}

/** The plan's parts list as CSV text. */
export function partsCsvTask(input: PartsCsvInput): string {
  const d = derivePlan(input.plan);
  const { labelOf } = buildPlan(input.plan, d);
  return partsCsv(d.parts, input.plan.materials, { ...input.plan.settings, labelOf });
}

export interface ShoppingCsvInput {
  plan: PlanDocument;
  prices: PriceItem[];
  wasteAllowancePct?: number;
}

/** The plan's priced shopping list as CSV text (the plan's nest: the same sheets as the screen and the packet, on every download). */
export function shoppingCsvTask(input: ShoppingCsvInput): string {
  const { plan } = input;
  const d = derivePlan(plan);
  const r = materialsReport(d.parts, d.hardware, plan.materials, input.prices, {
    kerfMm: plan.settings.kerfMm,
    nest: planNestOptions(plan.settings.kerfMm),
    shopping: { wasteAllowancePct: input.wasteAllowancePct },
  });
  return shoppingCsv(r.shopping);
}

export interface ReadOnlyInput {
  doc: PlanDocument;
  preset: { name: string; numbers: Partial<RuleNumbers> } | null;
  /** Whether to draw the plan view and elevations too. */
  drawings: boolean;
}

export interface ReadOnlyView {
  /** Findings, most serious first, at most PLAN_LIMITS.analysisFindings of them. */
  findings: Finding[];
  omittedFindings: number;
  /** Set when the checks could not run (the room cannot be solved from its measurements, say). */
  error: string | null;
  drawings: PlanDrawings | null;
}

/** Findings (with the adopted preset's numbers) and, when asked, the drawings of a plan, for read-only pages. */
export function readOnlyView(input: ReadOnlyInput): ReadOnlyView {
  const drawings = input.drawings ? planDrawingsOrNull(input.doc) : null;
  let findings: Finding[];
  try {
    const derived = derivePlan(input.doc);
    findings = evaluatePlan(input.doc, derived, input.preset ? { preset: input.preset.numbers, presetLabel: input.preset.name } : {});
  } catch {
    return { findings: [], omittedFindings: 0, error: "The checks could not run on this plan.", drawings };
  }
  const cap = PLAN_LIMITS.analysisFindings;
  return { findings: findings.slice(0, cap), omittedFindings: Math.max(0, findings.length - cap), error: null, drawings };
}

export interface DrawingsInput {
  doc: PlanDocument;
}

/** The plan view and wall elevations, or null when the room cannot be solved. */
export function drawingsTask(input: DrawingsInput): PlanDrawings | null {
  return planDrawingsOrNull(input.doc);
}

export interface BuildInput {
  plan: PlanDocument;
}

/** The plan's labelled cut list, setups, stop tables and build steps. */
export function buildTask(input: BuildInput): BuildResult {
  return buildFromPlan(input.plan);
}
