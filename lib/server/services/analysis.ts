import type { EntityManager } from "@mikro-orm/postgresql";
import type { RuleNumbers } from "@/lib/engine/checks/numbers";
import { parsePlan } from "@/lib/engine/plan/parse";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { clientAddress } from "../client-address";
import { AppError, invalid } from "../errors";
import { hitFixedWindow } from "../fixed-window";
import { fieldErrors } from "../http";
import { testHooksEnabled } from "../engine-pool/test-hooks";
import { presetNumbersSchema } from "./presets";

/** Analyses one address may ask for without signing in, per window below (signed-in accounts are not counted). */
export const ANONYMOUS_ANALYSES_PER_WINDOW = 60;
export const ANONYMOUS_WINDOW_SECONDS = 60;

/**
 * Body caps, bytes: the largest plan the schema accepts (300 fixtures with their parameters) is
 * well under the anonymous one.
 */
export const MAX_ANONYMOUS_BODY_BYTES = 512_000;
export const MAX_SIGNED_IN_BODY_BYTES = 1_000_000;

/** The address an anonymous analysis counts against; npm test's server (test hooks on) lets a test name its own. */
function analysisAddress(headers: Headers): string {
  const named = testHooksEnabled() ? headers.get("x-bw-test-client-address") : null;
  return named && /^[0-9a-f.:]{2,45}$/i.test(named) ? named : clientAddress(headers);
}

/** Counts an anonymous analysis against its address; 429 with a retry time once the window's allowance is used. */
export async function limitAnonymousAnalysis(em: EntityManager, headers: Headers): Promise<void> {
  const hit = await hitFixedWindow(em, `analyze:${analysisAddress(headers)}`, ANONYMOUS_ANALYSES_PER_WINDOW, ANONYMOUS_WINDOW_SECONDS);
  if (hit.allowed) return;
  throw new AppError(
    429,
    "too_many_requests",
    `Too many analyses from your address: ${ANONYMOUS_ANALYSES_PER_WINDOW} a minute without signing in. Try again in ${hit.retryAfterSeconds} s, or sign in.`,
    undefined,
    { retryAfterSeconds: hit.retryAfterSeconds },
  );
}

export interface AnalyzeRequest {
  plan: PlanDocument;
  preset?: Partial<RuleNumbers>;
}

/** Reads an analyze body: a bare plan document, or `{ plan, preset? }`; 422 with field paths when it is not valid. */
export function readAnalyzeRequest(raw: unknown): AnalyzeRequest {
  const wrapped = typeof raw === "object" && raw !== null && !Array.isArray(raw) && "plan" in raw && !("schemaVersion" in raw);
  const body = raw as Record<string, unknown>;
  const prefix = wrapped ? "plan." : "";
  const parsed = parsePlan(wrapped ? body.plan : raw);
  if (!parsed.ok) {
    const fields: Record<string, string> = {};
    for (const i of parsed.issues) {
      const key = prefix + (i.path || "_");
      if (!fields[key]) fields[key] = i.message;
    }
    throw invalid("Some fields of the plan are not valid.", fields);
  }
  if (!wrapped || body.preset === undefined) return { plan: parsed.plan };
  const p = presetNumbersSchema.safeParse(body.preset);
  if (!p.success) {
    const fields: Record<string, string> = {};
    for (const [k, v] of Object.entries(fieldErrors(p.error))) fields[`preset.${k}`] = v;
    throw invalid("Some preset numbers are not valid.", fields);
  }
  return { plan: parsed.plan, preset: p.data };
}
