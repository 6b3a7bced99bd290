import "server-only";
import type { BuildResult } from "@/lib/engine/build";
import type { RuleNumbers } from "@/lib/engine/checks/numbers";
import type { PlanDrawings } from "@/lib/engine/drawings/plan-drawings";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import type { PriceItem } from "@/lib/engine/shopping/price-schema";
import { logError } from "../log";
import { EnginePool, poolErrors } from "./pool";
import type { ReadOnlyView } from "./tasks";
import { TEST_HOOKS, testHooksEnabled, type TestHook } from "./test-hooks";
import { ensureWorkerFile } from "./worker-file";

/**
 * Time limits per task, ms, queue wait included. The largest plan the schema accepts analyses in a
 * few seconds on a 2-core machine; these leave room for a busy one.
 */
export const TIME_LIMITS_MS = { analyze: 20_000, csv: 30_000, readOnly: 20_000, build: 20_000 } as const;

/** Largest analyze answer, bytes of JSON (the largest plan's full answer is about 0.6 MB). */
export const MAX_ANALYSIS_BYTES = 2_000_000;

const g = globalThis as unknown as { __bwEnginePool?: EnginePool };

/** The process's pool, started on first use (kept on globalThis so dev reloads do not start another). */
function pool(): EnginePool {
  if (g.__bwEnginePool) return g.__bwEnginePool;
  let filename: string;
  try {
    filename = ensureWorkerFile();
  } catch (e) {
    logError("engine worker bundle missing and could not be built", e);
    throw poolErrors.unavailable();
  }
  g.__bwEnginePool = new EnginePool({ filename });
  return g.__bwEnginePool;
}

/** Test-only knobs a request may carry (read only where BW_TEST_HOOKS=1): a misbehaviour and a shorter time limit. */
export interface TestKnobs {
  hook?: TestHook;
  timeLimitMs?: number;
}

/** The test knobs of a request, from X-BW-Test-Hook and X-BW-Test-Time-Limit-Ms; none unless test hooks are on. */
export function testKnobs(headers: Headers): TestKnobs {
  if (!testHooksEnabled()) return {};
  const hook = headers.get("x-bw-test-hook");
  const ms = Number(headers.get("x-bw-test-time-limit-ms"));
  return {
    hook: TEST_HOOKS.includes(hook as TestHook) ? (hook as TestHook) : undefined,
    timeLimitMs: Number.isFinite(ms) && ms >= 100 && ms <= 60_000 ? ms : undefined,
  };
}

interface CallOptions {
  signal?: AbortSignal;
  test?: TestKnobs;
}

/** The analyze endpoint's answer as JSON text, bounded to MAX_ANALYSIS_BYTES. */
export function analyzeInWorker(plan: PlanDocument, preset: Partial<RuleNumbers> | undefined, opts: CallOptions = {}): Promise<string> {
  const input = { plan, preset, maxAnswerBytes: MAX_ANALYSIS_BYTES, testHook: opts.test?.hook };
  return pool().run("analyze", input, { timeLimitMs: opts.test?.timeLimitMs ?? TIME_LIMITS_MS.analyze, signal: opts.signal, doing: "analyse" });
}

/** The plan's parts list as CSV text. */
export function partsCsvInWorker(plan: PlanDocument, opts: CallOptions = {}): Promise<string> {
  return pool().run("partsCsv", { plan }, { timeLimitMs: TIME_LIMITS_MS.csv, signal: opts.signal, doing: "turn into a parts list" });
}

/** The plan's shopping list as CSV text, priced with `prices`. */
export function shoppingCsvInWorker(plan: PlanDocument, prices: PriceItem[], wasteAllowancePct: number | undefined, opts: CallOptions = {}): Promise<string> {
  return pool().run("shoppingCsv", { plan, prices, wasteAllowancePct }, { timeLimitMs: TIME_LIMITS_MS.csv, signal: opts.signal, doing: "price into a shopping list" });
}

/** Findings (capped, most serious first) and optionally the drawings of a plan, for read-only pages. */
export function readOnlyViewInWorker(doc: PlanDocument, preset: { name: string; numbers: Partial<RuleNumbers> } | null, drawings: boolean): Promise<ReadOnlyView> {
  return pool().run("readOnlyView", { doc, preset, drawings }, { timeLimitMs: TIME_LIMITS_MS.readOnly, doing: "check" });
}

/** The plan view and wall elevations, or null when the room cannot be solved. */
export function drawingsInWorker(doc: PlanDocument): Promise<PlanDrawings | null> {
  return pool().run("drawings", { doc }, { timeLimitMs: TIME_LIMITS_MS.readOnly, doing: "draw" });
}

/** The plan's labelled cut list, setups, stop tables and build steps. */
export function buildInWorker(plan: PlanDocument, opts: CallOptions = {}): Promise<BuildResult> {
  return pool().run("build", { plan }, { timeLimitMs: opts.test?.timeLimitMs ?? TIME_LIMITS_MS.build, signal: opts.signal, doing: "turn into setups and build steps" });
}
