/**
 * Misbehaving tasks for tests of the pool's limits: they run only in a process started with
 * BW_TEST_HOOKS=1 (npm test's server and the pool's unit tests), and a request can name one only there.
 */
export type TestHook = "spin" | "hog";

export const TEST_HOOKS: readonly TestHook[] = ["spin", "hog"];

export const testHooksEnabled = () => process.env.BW_TEST_HOOKS === "1";

/** Longest a spin lasts even if nothing stops it, ms (it should be stopped by the pool's time limit well before). */
const SPIN_CAP_MS = 120_000;

/** Does the named misbehaviour: spin burns the thread until the pool ends it; hog keeps allocating until the heap cap kills the worker. */
export function runTestHook(hook: TestHook): void {
  if (!testHooksEnabled()) throw new Error("test hooks are off");
  if (hook === "spin") {
    const until = Date.now() + SPIN_CAP_MS;
    let x = 0;
    while (Date.now() < until) x = (x + 1) % 1_000_003;
    if (x < 0) throw new Error("unreachable");
    return;
  }
  const keep: number[][] = [];
  for (;;) keep.push(Array.from({ length: 100_000 }, (_, i) => i * 1.5));
}
