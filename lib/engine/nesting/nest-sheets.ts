import type { Part } from "../fixtures/types";
import type { Material } from "../plan/schema";
import { conflictLowerBound, sheetLowerBound } from "./bounds";
import { buildCutTree } from "./cut-tree";
import type { PackItem, PackOutcome, PackStock, PackedSheet } from "./guillotine";
import { DEFAULT_REUSABLE_MIN_LENGTH_MM, DEFAULT_REUSABLE_MIN_WIDTH_MM, DEFAULT_TRIM_MM, sheetGroups } from "./pieces";
import type { SheetGroup } from "./pieces";
import { searchLayouts } from "./search";
import { WorkBudget } from "../work-budget";
import type { Cut, MaterialNest, NestOptions, NestResult, Offcut, Placement, SheetLayout, SheetStock, UnplacedPart } from "./types";

/** Steps (free rectangles tested) the whole nest may spend by default: a few hundred layouts of a large shop's parts, well under a second. */
export const DEFAULT_NEST_WORK = 20_000_000;
const EPS = 1e-6;

/**
 * Nest the sheet-good parts (stock "sheet") onto sheets of their own material and thickness, with
 * guillotine cuts, kerf and edge trim; grained parts keep their grain along the sheet's length.
 * Lengths mm, areas mm2. The search is bounded by a work budget (`maxWork` steps) and an attempt
 * cap, never by the clock, so the same input gives the same layout everywhere (`timeBudgetMs` is
 * accepted and ignored). Pure: inputs are not changed.
 */
export function nestSheets(parts: readonly Part[], materials: readonly Material[], opts: NestOptions): NestResult {
  const t0 = performance.now();
  const groups = sheetGroups(parts, materials);
  const total = groups.reduce((s, g) => s + g.pieces.length, 0);
  const budget = Math.max(0, opts.maxWork ?? DEFAULT_NEST_WORK);
  const out: MaterialNest[] = new Array(groups.length);
  let stopped = false;
  let spentAll = 0;
  let left = 0;
  // Small materials first: they finish their fixed heuristics quickly and leave the rest of the budget to the big ones.
  const order = groups.map((_, i) => i).sort((a, b) => groups[a].pieces.length - groups[b].pieces.length || a - b);
  for (const gi of order) {
    const g = groups[gi];
    // Share the budget by piece count; unspent work rolls over to later materials.
    const share = total > 0 ? (budget * g.pieces.length) / total : budget;
    const work = new WorkBudget(share + left);
    const r = nestGroup(g, opts, work, (attempts, best, lb) => {
      if (!opts.onProgress) return true;
      const fraction = budget > 0 ? Math.min(1, (spentAll + work.spent) / budget) : 1;
      return opts.onProgress({ fraction, materialId: g.materialId, bestSheets: best, lowerBound: lb, attempts }) !== false;
    });
    left = Math.max(0, work.limit - work.spent);
    spentAll += work.spent;
    out[gi] = r.nest;
    if (r.stopped) {
      stopped = true;
      // Remaining materials still get a quick, single-heuristic layout so the result is complete.
      opts = { ...opts, maxAttempts: 1, onProgress: undefined };
    }
  }
  return { materials: out, unplaced: out.flatMap((m) => m.unplaced), elapsedMs: performance.now() - t0, stopped, work: spentAll };
}

/**
 * Edge trim per axis for new sheets: the nominal trim, reduced on an axis only as far as a piece
 * needs (an 8 ft part is cut from a full-length sheet with its ends left as they came).
 */
function trimsFor(g: SheetGroup, trim: number): { x: number; y: number } {
  let x = trim;
  let y = trim;
  const L = g.sheetLengthMm;
  const W = g.sheetWidthMm;
  for (const p of g.pieces) {
    const ors: [number, number][] = p.grain === "length" ? [[p.lengthMm, p.widthMm]] : p.grain === "width" ? [[p.widthMm, p.lengthMm]] : [[p.lengthMm, p.widthMm], [p.widthMm, p.lengthMm]];
    let best: { x: number; y: number } | null = null;
    for (const [a, b] of ors) {
      if (a > L + EPS || b > W + EPS) continue;
      const o = { x: Math.min(trim, Math.max(0, (L - a) / 2)), y: Math.min(trim, Math.max(0, (W - b) / 2)) };
      if (!best || o.x + o.y > best.x + best.y) best = o;
    }
    if (best) {
      x = Math.min(x, best.x);
      y = Math.min(y, best.y);
    }
  }
  return { x, y };
}

function stocksFor(g: SheetGroup, opts: NestOptions): SheetStock[] {
  const trims = trimsFor(g, opts.trimMm ?? DEFAULT_TRIM_MM);
  const offcuts: SheetStock[] = (opts.offcuts ?? [])
    .filter((o) => o.materialId === g.materialId && o.qty > 0)
    .map((o) => ({
      id: o.id,
      materialId: o.materialId,
      lengthMm: Math.max(o.lengthMm, o.widthMm),
      widthMm: Math.min(o.lengthMm, o.widthMm),
      qty: o.qty,
      source: "offcut" as const,
      trimLengthMm: 0,
      trimWidthMm: 0,
    }))
    .sort((a, b) => b.lengthMm * b.widthMm - a.lengthMm * a.widthMm);
  const sheet: SheetStock = { id: `${g.materialId}-sheet`, materialId: g.materialId, lengthMm: g.sheetLengthMm, widthMm: g.sheetWidthMm, qty: Infinity, source: "new", trimLengthMm: trims.x, trimWidthMm: trims.y };
  return [...offcuts, sheet];
}

function nestGroup(
  g: SheetGroup,
  opts: NestOptions,
  work: WorkBudget,
  tick: (attempts: number, best: number, lb: number) => boolean,
): { nest: MaterialNest; stopped: boolean } {
  const kerf = opts.kerfMm;
  const stocks = stocksFor(g, opts);
  const newStock = stocks.length - 1;
  const pack: PackStock[] = stocks.map((s) => ({ len: s.lengthMm - 2 * s.trimLengthMm, wid: s.widthMm - 2 * s.trimWidthMm, qty: s.qty }));
  const nominalTrim = opts.trimMm ?? DEFAULT_TRIM_MM;
  const notes: string[] = [];
  const sheetStock = stocks[stocks.length - 1];
  if (sheetStock.trimLengthMm < nominalTrim - EPS) notes.push("A part needs the sheet's full length: its ends are not trimmed.");
  if (sheetStock.trimWidthMm < nominalTrim - EPS) notes.push("A part needs the sheet's full width: its long edges are not trimmed.");
  const items: PackItem[] = [];
  const unplacedCount = new Map<string, UnplacedPart>();
  g.pieces.forEach((p, id) => {
    const mode = p.grain === "length" ? 0 : p.grain === "width" ? 1 : 2;
    const it: PackItem = { id, len: p.lengthMm, wid: p.widthMm, mode };
    const fitsAny = pack.some((s) => (mode !== 1 && it.len <= s.len + EPS && it.wid <= s.wid + EPS) || (mode !== 0 && it.wid <= s.len + EPS && it.len <= s.wid + EPS));
    if (fitsAny) items.push(it);
    else {
      const u = unplacedCount.get(p.partId);
      if (u) u.qty++;
      else
        unplacedCount.set(p.partId, {
          partId: p.partId,
          name: p.name,
          qty: 1,
          reason: `larger than the sheet (${g.sheetLengthMm.toFixed(1)} x ${g.sheetWidthMm.toFixed(1)} mm${mode !== 2 ? ", grain along its length" : ""})`,
        });
    }
  });
  const offcutArea = stocks.slice(0, newStock).reduce((s, o) => s + (o.lengthMm + kerf) * (o.widthMm + kerf) * o.qty, 0);
  const areaBound = sheetLowerBound(
    items.map((i) => ({ lengthMm: i.len, widthMm: i.wid })),
    pack[newStock].len,
    pack[newStock].wid,
    kerf,
    offcutArea,
  );
  // Offcuts could hold some of the clashing pieces, so that bound only applies without them.
  const lowerBound = newStock === 0 ? Math.max(areaBound, conflictLowerBound(items, pack[newStock].len, pack[newStock].wid, kerf)) : areaBound;
  let stopped = false;
  let outcome: PackOutcome = { sheets: [], leftover: [] };
  let strategy = "none";
  let attempts = 0;
  if (items.length > 0) {
    const res = searchLayouts(items, pack, kerf, newStock, {
      work,
      maxAttempts: opts.maxAttempts ?? Infinity,
      lowerBound,
      seed: opts.seed ?? 1,
      tick: (n, best) => tick(n, best, lowerBound),
    });
    outcome = res.outcome;
    strategy = res.strategy;
    attempts = res.attempts;
    stopped = res.stopped;
  }
  const sheets = outcome.sheets.map((s, i) => layoutSheet(s, i + 1, stocks[s.stock], g, kerf, opts, notes));
  const partAreaMm2 = sheets.reduce((s, l) => s + l.partAreaMm2, 0);
  const stockAreaMm2 = sheets.reduce((s, l) => s + l.lengthMm * l.widthMm, 0);
  return {
    stopped,
    nest: {
      materialId: g.materialId,
      materialName: g.materialName,
      thicknessMm: g.thicknessMm,
      sheetLengthMm: g.sheetLengthMm,
      sheetWidthMm: g.sheetWidthMm,
      sheets,
      sheetsUsed: sheets.filter((s) => s.source === "new").length,
      offcutsUsed: sheets.filter((s) => s.source === "offcut").length,
      lowerBound,
      partAreaMm2,
      stockAreaMm2,
      yieldPct: stockAreaMm2 > 0 ? (100 * partAreaMm2) / stockAreaMm2 : 0,
      wasteMm2: stockAreaMm2 - partAreaMm2,
      unplaced: [...g.refused, ...unplacedCount.values()],
      attempts,
      work: work.spent,
      notes,
      strategy,
    },
  };
}

function layoutSheet(s: PackedSheet, index: number, stock: SheetStock, g: SheetGroup, kerf: number, opts: NestOptions, notes: string[]): SheetLayout {
  const tx = stock.trimLengthMm;
  const ty = stock.trimWidthMm;
  const placements: Placement[] = s.items.map((it) => {
    const p = g.pieces[it.id];
    return { pieceKey: p.key, partId: p.partId, name: p.name, xMm: it.x + tx, yMm: it.y + ty, lenMm: it.w, widMm: it.h, rotated: it.rotated, grain: p.grain };
  });
  const usable = { x: tx, y: ty, w: stock.lengthMm - 2 * tx, h: stock.widthMm - 2 * ty };
  let tree: ReturnType<typeof buildCutTree> = { cuts: [], leaves: [] };
  try {
    tree = buildCutTree(
      usable,
      placements.map((p) => ({ x: p.xMm, y: p.yMm, w: p.lenMm, h: p.widMm })),
      kerf,
    );
  } catch {
    // The packer only makes guillotine layouts; if float noise defeats the cut order, say so rather than fail the nest.
    notes.push(`Sheet ${index}: the cut order could not be worked out; cut it from the map.`);
  }
  // Saw order: level by level (the sheet's rips, then each strip's crosscuts...), rips before crosscuts, near edge first.
  const ordered = [...tree.cuts].sort((a, b) => a.level - b.level || (a.axis === b.axis ? 0 : a.axis === "y" ? -1 : 1) || a.panel.y - b.panel.y || a.panel.x - b.panel.x || a.at - b.at);
  const cuts: Cut[] = ordered.map((c, i) => ({
    seq: i + 1,
    level: c.level,
    kind: c.axis === "y" ? "rip" : "crosscut",
    x1Mm: c.axis === "y" ? c.panel.x : c.at,
    y1Mm: c.axis === "y" ? c.at : c.panel.y,
    x2Mm: c.axis === "y" ? c.panel.x + c.panel.w : c.at,
    y2Mm: c.axis === "y" ? c.at : c.panel.y + c.panel.h,
  }));
  const minW = opts.reusableMinWidthMm ?? DEFAULT_REUSABLE_MIN_WIDTH_MM;
  const minL = opts.reusableMinLengthMm ?? DEFAULT_REUSABLE_MIN_LENGTH_MM;
  const offcuts: Offcut[] = tree.leaves
    .filter((r) => Math.min(r.w, r.h) >= 1)
    .map((r) => ({ xMm: r.x, yMm: r.y, lenMm: r.w, widMm: r.h, reusable: Math.min(r.w, r.h) >= minW - EPS && Math.max(r.w, r.h) >= minL - EPS }));
  const partAreaMm2 = placements.reduce((a, p) => a + p.lenMm * p.widMm, 0);
  return {
    index,
    stockId: stock.id,
    source: stock.source,
    lengthMm: stock.lengthMm,
    widthMm: stock.widthMm,
    usable: { xMm: usable.x, yMm: usable.y, lenMm: usable.w, widMm: usable.h },
    placements,
    cuts,
    offcuts,
    partAreaMm2,
    yieldPct: (100 * partAreaMm2) / (stock.lengthMm * stock.widthMm),
  };
}
