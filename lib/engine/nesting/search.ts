import { packGlobal, packOrdered } from "./guillotine";
import type { Charge, PackItem, PackOutcome, PackStock, ScoreRule, SplitRule } from "./guillotine";
import type { WorkBudget } from "../work-budget";
import { seededRandom } from "../geometry/seeded-random";

/** A packing heuristic: how pieces are ordered, where each goes, and how leftover space is split. */
export interface Strategy {
  name: string;
  mode: "ordered" | "global";
  order: OrderKey;
  rule: ScoreRule;
  split: SplitRule;
  /** Multiplicative noise on the sort key, 0 for none. */
  noise: number;
}

type OrderKey = "area" | "long-side" | "short-side" | "perimeter" | "length" | "width";

const ORDERS: OrderKey[] = ["area", "long-side", "short-side", "perimeter", "length", "width"];
const RULES: ScoreRule[] = ["area", "short", "long"];
const SPLITS: SplitRule[] = ["shorter-leftover", "min-area", "rip", "crosscut", "longer-leftover", "max-area"];

function keyOf(order: OrderKey, it: PackItem): number {
  const a = Math.max(it.len, it.wid);
  const b = Math.min(it.len, it.wid);
  switch (order) {
    case "area":
      return it.len * it.wid + a * 1e-3;
    case "long-side":
      return a * 1e6 + b;
    case "short-side":
      return b * 1e6 + a;
    case "perimeter":
      return a + b;
    case "length":
      return (it.mode === 1 ? it.wid : it.len) * 1e6 + b;
    case "width":
      return (it.mode === 1 ? it.len : it.wid) * 1e6 + a;
  }
}

/** The fixed heuristics tried first, cheapest and usually best first. */
export function fixedStrategies(): Strategy[] {
  const out: Strategy[] = [];
  for (const rule of RULES) for (const split of SPLITS) out.push({ name: `global/${rule}/${split}`, mode: "global", order: "area", rule, split, noise: 0 });
  for (const order of ORDERS)
    for (const rule of RULES)
      for (const split of SPLITS.slice(0, 4)) out.push({ name: `ordered/${order}/${rule}/${split}`, mode: "ordered", order, rule, split, noise: 0 });
  return out;
}

/** A randomised heuristic drawn from the same families. */
export function randomStrategy(rand: () => number): Strategy {
  const pick = <T>(xs: readonly T[]): T => xs[Math.floor(rand() * xs.length)];
  const mode = rand() < 0.5 ? "global" : "ordered";
  const order = pick(ORDERS);
  const rule = pick(RULES);
  const split = pick(SPLITS);
  const noise = 0.05 + rand() * 0.45;
  return { name: `${mode}/${order}/${rule}/${split}/noisy`, mode, order, rule, split, noise };
}

/** Run one strategy; null when `charge` aborts it. */
export function runStrategy(st: Strategy, items: PackItem[], stocks: PackStock[], kerf: number, rand: () => number, charge?: Charge): PackOutcome | null {
  const keyed = items.map((it) => ({ it, k: keyOf(st.order, it) * (st.noise > 0 ? 1 + st.noise * rand() : 1) }));
  keyed.sort((a, b) => b.k - a.k || a.it.id - b.it.id);
  const ordered = keyed.map((x) => x.it);
  return st.mode === "global" ? packGlobal(ordered, stocks, kerf, st.rule, st.split, charge) : packOrdered(ordered, stocks, kerf, st.rule, st.split, charge);
}

/** Lexicographic quality: new sheets, then stock area used, then how unevenly sheets are filled (a fuller set and one big leftover beats scattered ones). */
export function outcomeKey(o: PackOutcome, stocks: PackStock[], newStock: number): [number, number, number, number] {
  let news = 0;
  let area = 0;
  let conc = 0;
  for (const s of o.sheets) {
    const st = stocks[s.stock];
    const a = st.len * st.wid;
    if (s.stock === newStock) news++;
    area += a;
    conc += (s.area / a) ** 2;
  }
  return [o.leftover.length, news, area, -conc];
}

export function better(a: readonly number[], b: readonly number[]): boolean {
  for (let i = 0; i < a.length; i++) {
    if (a[i] < b[i] - 1e-9) return true;
    if (a[i] > b[i] + 1e-9) return false;
  }
  return false;
}

export interface SearchResult {
  outcome: PackOutcome;
  strategy: string;
  attempts: number;
  stopped: boolean;
}

export interface SearchLimits {
  /** Steps the search may spend (free rectangles tested); shared with the caller. */
  work: WorkBudget;
  maxAttempts: number;
  lowerBound: number;
  seed: number;
  /** Called after attempts; return false to stop. */
  tick: (attempts: number, bestSheets: number) => boolean;
}

/** The fallback when the budget runs out before any layout is whole: largest first, into the newest sheet only (next fit), so its work grows with the piece count alone. */
function fallback(items: PackItem[], stocks: PackStock[], kerf: number): PackOutcome {
  const sorted = [...items].sort((a, b) => b.len * b.wid - a.len * a.wid || a.id - b.id);
  return packOrdered(sorted, stocks, kerf, "area", "shorter-leftover", undefined, 1) as PackOutcome;
}

/**
 * Try the fixed heuristics, then randomised ones, keeping the best layout, until the new-sheet
 * count reaches the lower bound (after the fixed set), the attempt cap is hit or the work budget is
 * spent. An attempt the budget cuts short is dropped; if none finished, a next-fit layout stands in.
 * The same inputs, seed and budget give the same layout on every machine.
 */
export function searchLayouts(items: PackItem[], stocks: PackStock[], kerf: number, newStock: number, lim: SearchLimits): SearchResult {
  const rand = seededRandom(lim.seed);
  const fixed = fixedStrategies();
  let best: PackOutcome | null = null;
  let bestKey: number[] = [];
  let bestName = "";
  let attempts = 0;
  let stopped = false;
  const charge: Charge = (n) => lim.work.spend(n);
  for (let i = 0; attempts < lim.maxAttempts && !lim.work.exhausted; i++) {
    const st = i < fixed.length ? fixed[i] : randomStrategy(rand);
    const out = runStrategy(st, items, stocks, kerf, rand, charge);
    if (!out) break;
    attempts++;
    const key = outcomeKey(out, stocks, newStock);
    if (!best || better(key, bestKey)) {
      best = out;
      bestKey = key;
      bestName = st.name;
    }
    if (!lim.tick(attempts, bestKey[1])) {
      stopped = true;
      break;
    }
    // Stop when the bound is reached and the fixed set is done.
    if (i >= fixed.length - 1 && bestKey[0] === 0 && bestKey[1] <= lim.lowerBound) break;
  }
  if (!best) {
    best = fallback(items, stocks, kerf);
    bestName = "next-fit (work budget spent)";
    attempts++;
  }
  return { outcome: best, strategy: bestName, attempts, stopped };
}
