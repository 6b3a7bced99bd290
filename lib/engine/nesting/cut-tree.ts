import type { Rect } from "./guillotine";

/** A cut found by splitting a panel: `axis` "y" is a rip (a line of constant y along the sheet). */
export interface TreeCut {
  level: number;
  axis: "x" | "y";
  /** Near edge of the kerf on the cut axis, mm. */
  at: number;
  /** The panel the cut splits, edge to edge. */
  panel: Rect;
}

export interface CutTree {
  cuts: TreeCut[];
  /** Empty panels left when every piece is free. */
  leaves: Rect[];
}

const EPS = 1e-6;

function lo(r: Rect, axis: "x" | "y"): number {
  return axis === "x" ? r.x : r.y;
}
function hi(r: Rect, axis: "x" | "y"): number {
  return axis === "x" ? r.x + r.w : r.y + r.h;
}

/** Cut positions on one axis that cross no piece: gaps of at least a kerf between groups, and the waste past the last group. */
function cutsOn(panel: Rect, items: Rect[], axis: "x" | "y", kerf: number): number[] {
  const sorted = [...items].sort((a, b) => lo(a, axis) - lo(b, axis));
  const cuts: number[] = [];
  const start = lo(panel, axis);
  const end = hi(panel, axis);
  if (sorted.length > 0 && lo(sorted[0], axis) - start > EPS) {
    // Waste before the first piece: cut just short of it.
    cuts.push(lo(sorted[0], axis) - kerf);
  }
  let maxEnd = -Infinity;
  for (const r of sorted) {
    if (maxEnd > -Infinity && lo(r, axis) >= maxEnd + kerf - EPS) cuts.push(maxEnd);
    maxEnd = Math.max(maxEnd, hi(r, axis));
  }
  if (end - maxEnd > EPS) cuts.push(maxEnd);
  return cuts;
}

/**
 * Split a panel with edge-to-edge cuts until each piece stands alone. Rips (cuts along the sheet's
 * length) are tried first, then each strip is crosscut, alternating by level. Works from an explicit
 * stack, so a sheet of many small pieces cannot overflow the call stack; each step either files a
 * leaf or cuts a panel into strictly smaller ones. Throws when the pieces cannot be separated by
 * guillotine cuts.
 */
export function buildCutTree(panel: Rect, items: Rect[], kerf: number): CutTree {
  const tree: CutTree = { cuts: [], leaves: [] };
  const stack: Task[] = [{ panel, items, level: 1, prefer: "y" }];
  // Tasks run in the order the recursive split visited them (first strip first): push in reverse.
  for (let task = stack.pop(); task; task = stack.pop()) {
    const subs = splitPanel(task, kerf, tree);
    for (let i = subs.length - 1; i >= 0; i--) stack.push(subs[i]);
  }
  return tree;
}

interface Task {
  panel: Rect;
  items: Rect[];
  level: number;
  prefer: "x" | "y";
}

function splitPanel({ panel, items, level, prefer }: Task, kerf: number, tree: CutTree): Task[] {
  if (panel.w <= EPS || panel.h <= EPS) return [];
  if (items.length === 0) {
    tree.leaves.push(panel);
    return [];
  }
  for (const axis of prefer === "y" ? (["y", "x"] as const) : (["x", "y"] as const)) {
    const at = cutsOn(panel, items, axis, kerf);
    if (at.length === 0) continue;
    let from = lo(panel, axis);
    const end = hi(panel, axis);
    for (const c of at) tree.cuts.push({ level, axis, at: c, panel });
    const pieces: [number, number][] = [];
    for (const c of at) {
      pieces.push([from, Math.max(from, c)]);
      from = Math.min(end, c + kerf);
    }
    pieces.push([from, end]);
    const subs: Task[] = [];
    for (const [a, b] of pieces) {
      if (b - a <= EPS) continue;
      const sub: Rect = axis === "y" ? { x: panel.x, y: a, w: panel.w, h: b - a } : { x: a, y: panel.y, w: b - a, h: panel.h };
      const inside = items.filter((r) => lo(r, axis) >= a - EPS && hi(r, axis) <= b + EPS);
      // A cut that leaves every piece in a panel as large as the one it split makes no progress.
      if (inside.length === items.length && b - a >= end - lo(panel, axis) - EPS) throw new Error("pieces cannot be separated by guillotine cuts (no progress)");
      subs.push({ panel: sub, items: inside, level: level + 1, prefer: axis === "y" ? "x" : "y" });
    }
    return subs;
  }
  if (items.length === 1) return []; // the panel is the piece
  throw new Error(`pieces cannot be separated by guillotine cuts (${items.length} in a ${panel.w} x ${panel.h} panel)`);
}
