import type { RuleNumbers } from "@/lib/engine/checks/numbers";
import type { Finding } from "@/lib/engine/checks/types";
import type { PlanDrawings } from "@/lib/engine/drawings/plan-drawings";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { drawingsInWorker, readOnlyViewInWorker } from "../engine-pool/engine";
import { AppError } from "../errors";
import { logError } from "../log";

export interface SharedAnalysis {
  /** Plain objects (they crossed from the worker), most serious first, capped; ready for client components. */
  findings: Finding[];
  omittedFindings: number;
  error: string | null;
  drawings: PlanDrawings | null;
}

const failed = (error: string): SharedAnalysis => ({ findings: [], omittedFindings: 0, error, drawings: null });

/**
 * Findings (with the adopted preset's numbers) and the drawings of a plan, for read-only pages,
 * computed with the same engine the editor uses, in the server's worker pool. A plan too slow or too
 * large for the pool gets the pool's message in place of its findings; the page still renders.
 */
export async function analyseForReading(doc: PlanDocument, preset: { name: string; numbers: Partial<RuleNumbers> } | null): Promise<SharedAnalysis> {
  try {
    return await readOnlyViewInWorker(doc, preset, true);
  } catch (e) {
    if (e instanceof AppError) return failed(e.message);
    logError("read-only analysis failed", e);
    return failed("The checks could not run on this plan.");
  }
}

/** The plan view and wall elevations for a read-only page, or null when they cannot be drawn (in the worker pool). */
export async function drawingsForReading(doc: PlanDocument): Promise<PlanDrawings | null> {
  try {
    return await drawingsInWorker(doc);
  } catch (e) {
    if (!(e instanceof AppError)) logError("read-only drawings failed", e);
    return null;
  }
}
