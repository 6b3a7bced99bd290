/**
 * One-dimensional cutting stock with several stock lengths: pack piece lengths into boards so the
 * total length bought is least, then the board count. Sizes here already include one kerf per
 * piece, and capacities one kerf more than the usable length (the last piece needs none).
 */

export interface Bin {
  /** Index into the stock lengths. */
  stock: number;
  items: number[];
  load: number;
}

import { WorkBudget } from "../work-budget";

const EPS = 1e-6;

/** Steps (bins or pieces looked at) one board plan may spend by default: well under a second for the largest plan. */
export const DEFAULT_BOARD_WORK = 2_000_000;

/** Shortest stock length whose capacity holds `load`; -1 when none does. */
function shortestFor(load: number, caps: number[]): number {
  let best = -1;
  for (let i = 0; i < caps.length; i++) if (caps[i] >= load - EPS && (best < 0 || caps[i] < caps[best])) best = i;
  return best;
}

/** First or best fit; null when the budget runs out first. */
function firstFit(sizes: number[], order: number[], cap: number, bestFit: boolean, work: WorkBudget): { items: number[]; load: number }[] | null {
  const bins: { items: number[]; load: number }[] = [];
  for (const i of order) {
    if (!work.spend(bins.length + 1)) return null;
    let target = -1;
    for (let b = 0; b < bins.length; b++) {
      if (bins[b].load + sizes[i] > cap + EPS) continue;
      if (!bestFit) {
        target = b;
        break;
      }
      if (target < 0 || bins[b].load > bins[target].load) target = b;
    }
    if (target < 0) bins.push({ items: [i], load: sizes[i] });
    else {
      bins[target].items.push(i);
      bins[target].load += sizes[i];
    }
  }
  return bins;
}

function cost(bins: Bin[], lengths: number[]): [number, number] {
  return [bins.reduce((s, b) => s + lengths[b.stock], 0), bins.length];
}

function shrink(raw: { items: number[]; load: number }[], caps: number[]): Bin[] {
  return raw.map((b) => ({ ...b, stock: shortestFor(b.load, caps) }));
}

/** Try to do without one board: move its pieces into the others' slack, allowing them to grow to a longer stock. */
function improve(bins: Bin[], sizes: number[], lengths: number[], caps: number[], work: WorkBudget): Bin[] {
  let cur = bins.map((b) => ({ ...b, items: [...b.items] }));
  let curCost = cost(cur, lengths);
  const maxCap = Math.max(...caps);
  for (let round = 0; round < 200 && !work.exhausted; round++) {
    let improved = false;
    // 1. Empty a board, least loaded first.
    const byLoad = cur.map((b, i) => i).sort((a, b) => cur[a].load - cur[b].load);
    for (const victim of byLoad) {
      // Copying every board and its pieces, then a best-fit scan per moved piece.
      if (!work.spend(4 * cur.length + sizes.length + cur[victim].items.length * cur.length)) return cur;
      const next = cur.filter((_, i) => i !== victim).map((b) => ({ ...b, items: [...b.items] }));
      const moving = [...cur[victim].items].sort((a, b) => sizes[b] - sizes[a]);
      let ok = true;
      for (const it of moving) {
        // Best fit among boards that can hold it at the longest stock.
        let t = -1;
        for (let b = 0; b < next.length; b++) if (next[b].load + sizes[it] <= maxCap + EPS && (t < 0 || next[b].load > next[t].load)) t = b;
        if (t < 0) {
          ok = false;
          break;
        }
        next[t].items.push(it);
        next[t].load += sizes[it];
        next[t].stock = shortestFor(next[t].load, caps);
      }
      if (!ok) continue;
      const c = cost(next, lengths);
      if (c[0] < curCost[0] - EPS || (Math.abs(c[0] - curCost[0]) < EPS && c[1] < curCost[1])) {
        cur = next;
        curCost = c;
        improved = true;
        break;
      }
    }
    // 2. Move or swap single pieces when that lets a board drop to a shorter length.
    if (!improved) {
      outer: for (let a = 0; a < cur.length; a++)
        for (let b = 0; b < cur.length; b++) {
          if (a === b) continue;
          if (!work.spend(1 + 4 * cur[a].items.length * (cur[b].items.length + 1))) return cur;
          for (let ia = 0; ia < cur[a].items.length; ia++) {
            const x = cur[a].items[ia];
            const candidates: (number | null)[] = [null, ...cur[b].items];
            for (const y of candidates) {
              const la = cur[a].load - sizes[x] + (y === null ? 0 : sizes[y]);
              const lb = cur[b].load + sizes[x] - (y === null ? 0 : sizes[y]);
              if (lb > maxCap + EPS || la > maxCap + EPS) continue;
              const sa = la <= EPS ? -2 : shortestFor(la, caps);
              const sb = shortestFor(lb, caps);
              const before = lengths[cur[a].stock] + lengths[cur[b].stock];
              const after = (sa === -2 ? 0 : lengths[sa]) + lengths[sb];
              if (after < before - EPS) {
                const A = { stock: sa, load: la, items: cur[a].items.filter((_, k) => k !== ia).concat(y === null ? [] : [y]) };
                const B = { stock: sb, load: lb, items: cur[b].items.filter((v) => v !== y).concat([x]) };
                cur = cur.map((bin, k) => (k === a ? A : k === b ? B : bin)).filter((bin) => bin.items.length > 0);
                curCost = cost(cur, lengths);
                improved = true;
                break outer;
              }
            }
          }
        }
    }
    if (!improved) break;
  }
  return cur;
}

/** Next fit: one open board at a time, so the work is one step a piece. */
function nextFit(sizes: number[], order: number[], cap: number): { items: number[]; load: number }[] {
  const bins: { items: number[]; load: number }[] = [];
  for (const i of order) {
    const last = bins[bins.length - 1];
    if (last && last.load + sizes[i] <= cap + EPS) {
      last.items.push(i);
      last.load += sizes[i];
    } else bins.push({ items: [i], load: sizes[i] });
  }
  return bins;
}

/**
 * Pack sizes into stock of the given capacities (lengths are what each costs): first-fit and
 * best-fit decreasing at each stock length, each board cut down to the shortest stock that holds
 * it, then local improvement, within `maxWork` steps (counted, never timed: the same input gives
 * the same boards everywhere). When the budget runs out before any fit is whole, next fit at the
 * longest stock stands in. Every size must fit the largest capacity.
 */
export function packLengths(sizes: number[], lengths: number[], caps: number[], maxWork: number = DEFAULT_BOARD_WORK): Bin[] {
  const work = new WorkBudget(maxWork);
  const order = sizes.map((_, i) => i).sort((a, b) => sizes[b] - sizes[a] || a - b);
  const biggest = sizes.length ? sizes[order[0]] : 0;
  let best: Bin[] | null = null;
  let bestCost: [number, number] = [Infinity, Infinity];
  for (let s = 0; s < caps.length; s++) {
    if (caps[s] < biggest - EPS) continue;
    for (const bf of [false, true]) {
      const raw = firstFit(sizes, order, caps[s], bf, work);
      if (!raw) break;
      const bins = improve(shrink(raw, caps), sizes, lengths, caps, work);
      const c = cost(bins, lengths);
      if (c[0] < bestCost[0] - EPS || (Math.abs(c[0] - bestCost[0]) < EPS && c[1] < bestCost[1])) {
        best = bins;
        bestCost = c;
      }
    }
  }
  if (!best && sizes.length) {
    const top = caps.indexOf(Math.max(...caps));
    best = shrink(nextFit(sizes, order, caps[top]), caps);
  }
  return best ?? [];
}
