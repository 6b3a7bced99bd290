import { newPlanDocument } from "@/lib/engine/plan/defaults";
import { parsePlan } from "@/lib/engine/plan/parse";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { invalid } from "../errors";

/**
 * Validates a plan document with the engine (older versions upgraded, each fixture's parameters
 * checked against its kind); 422 with the path of each bad field under `document.`.
 */
export function validateDocument(raw: unknown): PlanDocument {
  const parsed = parsePlan(raw);
  if (parsed.ok) return parsed.plan;
  const fields: Record<string, string> = {};
  for (const i of parsed.issues) {
    const key = ["document", i.path].filter(Boolean).join(".");
    if (!fields[key]) fields[key] = i.message;
  }
  throw invalid("The plan document is not valid.", fields);
}

/** A new, empty plan: a garage to start measuring from. */
export function blankDocument(): PlanDocument {
  return newPlanDocument();
}
