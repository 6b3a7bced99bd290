/** Median and p95 of repeated timings, ms. Shared by the bench suites. */
export function timeIt(fn: () => unknown, opts: { warmup?: number; runs?: number } = {}): { median: number; p95: number } {
  const warmup = opts.warmup ?? 3;
  const runs = opts.runs ?? 15;
  for (let i = 0; i < warmup; i++) fn();
  const t: number[] = [];
  for (let i = 0; i < runs; i++) {
    const s = performance.now();
    fn();
    t.push(performance.now() - s);
  }
  t.sort((a, b) => a - b);
  return { median: t[Math.floor(t.length / 2)], p95: t[Math.min(t.length - 1, Math.floor(t.length * 0.95))] };
}

export const fmt = (ms: number) => (ms < 10 ? ms.toFixed(3) : ms.toFixed(1));
