/**
 * The worker pool's entry: scripts/build-worker.ts bundles this file (with lib/engine/) into one
 * plain JS file in the build folder, which piscina loads in each worker thread. Each named export
 * is a task (pool.run(input, { name })).
 */
import { analyze as analyzeTask, buildTask, drawingsTask, partsCsvTask, readOnlyView, shoppingCsvTask, type AnalyzeInput } from "./tasks";
import { runTestHook, type TestHook } from "./test-hooks";

/** The analyze task; a test may ask for a misbehaviour first (only where test hooks are on). */
export function analyze(input: AnalyzeInput & { testHook?: TestHook }): string {
  if (input.testHook) runTestHook(input.testHook);
  return analyzeTask(input);
}

/** A bare misbehaviour, for the pool's own tests. */
export function testHook(input: { hook: TestHook }): string {
  runTestHook(input.hook);
  return "done";
}

/** Answers at once: a probe that the pool still serves. */
export function ping(): string {
  return "pong";
}

export { buildTask as build, drawingsTask as drawings, partsCsvTask as partsCsv, readOnlyView, shoppingCsvTask as shoppingCsv };
