import type { Part } from "../fixtures/types";
import type { Material } from "../plan/schema";
import { cuttable } from "../nesting/pieces";
import { PLAN_LIMITS } from "../plan/limits";
import { DEFAULT_BOARD_WORK, packLengths } from "./cutting-stock";
import { DEFAULT_BOARD_LENGTHS_MM, DEFAULT_BOARD_WIDTHS_MM, DEFAULT_END_TRIM_MM } from "./stock";
import type { BoardCut, BoardGroup, BoardLayout, BoardOptions, BoardPlan, BoardUnplaced } from "./types";

const EPS = 1e-6;

interface Piece {
  key: string;
  partId: string;
  name: string;
  lengthMm: number;
  widthMm: number;
}

/**
 * Plan the solid-wood parts (stock "board") onto boards of standard lengths: each part goes to the
 * narrowest dressed width that holds it, then each material/thickness/width is packed end to end
 * with kerf and end trim, within a counted work budget (`maxWork`). At most PLAN_LIMITS.pieces
 * pieces; parts past it or with no usable size are listed as unplaced. Lengths mm. Pure.
 */
export function planBoards(parts: readonly Part[], materials: readonly Material[], opts: BoardOptions): BoardPlan {
  const kerf = opts.kerfMm;
  const trim = opts.endTrimMm ?? DEFAULT_END_TRIM_MM;
  const lengths = [...(opts.lengthsMm ?? DEFAULT_BOARD_LENGTHS_MM)].sort((a, b) => a - b);
  const widths = [...(opts.widthsMm ?? DEFAULT_BOARD_WIDTHS_MM)].sort((a, b) => a - b);
  // A board of length L holds pieces whose lengths plus one kerf each sum to at most L - 2 trim + kerf.
  const caps = lengths.map((L) => L - 2 * trim + kerf);
  const unplaced = new Map<string, BoardUnplaced>();
  const miss = (p: Part, reason: string) => {
    const u = unplaced.get(p.id);
    if (u) u.qty += p.qty;
    else unplaced.set(p.id, { partId: p.id, name: p.name, qty: p.qty, reason });
  };
  const groups = new Map<string, { materialId: string; thicknessMm: number; widthMm: number; pieces: Piece[] }>();
  const maxPieces = opts.maxPieces ?? PLAN_LIMITS.pieces;
  let count = 0;
  for (const p of parts) {
    if (p.stock !== "board" || p.qty <= 0) continue;
    const n = Math.ceil(p.qty);
    if (!cuttable(p) || !Number.isFinite(n)) {
      miss(p, "has no usable size: check the fixture's sizes");
      continue;
    }
    if (count + n > maxPieces) {
      miss(p, `past the plan's limit of ${maxPieces.toLocaleString("en-US")} pieces to lay out`);
      continue;
    }
    const width = widths.find((w) => w >= p.widthMm - EPS);
    if (width === undefined) {
      miss(p, `wider than the widest board (${widths[widths.length - 1].toFixed(1)} mm): glue up a panel`);
      continue;
    }
    if (p.lengthMm + kerf > caps[caps.length - 1] + EPS) {
      miss(p, `longer than the longest board after end trim (${(lengths[lengths.length - 1] - 2 * trim).toFixed(1)} mm)`);
      continue;
    }
    // Thickness to 0.1 mm so float noise does not split a stock.
    const thick = Math.round(p.thicknessMm * 10) / 10;
    const key = `${p.materialId}|${thick}|${width}`;
    let g = groups.get(key);
    if (!g) groups.set(key, (g = { materialId: p.materialId, thicknessMm: thick, widthMm: width, pieces: [] }));
    count += n;
    for (let i = 0; i < n; i++) g.pieces.push({ key: `${p.id}#${i + 1}`, partId: p.id, name: p.name, lengthMm: p.lengthMm, widthMm: p.widthMm });
  }
  const out: BoardGroup[] = [];
  for (const g of groups.values()) {
    const sizes = g.pieces.map((p) => p.lengthMm + kerf);
    const bins = packLengths(sizes, lengths, caps, (Math.max(0, opts.maxWork ?? DEFAULT_BOARD_WORK) * g.pieces.length) / Math.max(1, count));
    const boards: BoardLayout[] = bins
      .map((b) => {
        const L = lengths[b.stock];
        const items = [...b.items].sort((x, y) => g.pieces[y].lengthMm - g.pieces[x].lengthMm);
        let at = trim;
        const cuts: BoardCut[] = items.map((i) => {
          const p = g.pieces[i];
          const c = { pieceKey: p.key, partId: p.partId, name: p.name, offsetMm: at, lengthMm: p.lengthMm, widthMm: p.widthMm };
          at += p.lengthMm + kerf;
          return c;
        });
        const usedMm = cuts.reduce((s, c) => s + c.lengthMm, 0);
        return { index: 0, lengthMm: L, widthMm: g.widthMm, thicknessMm: g.thicknessMm, cuts, usedMm, leftoverMm: Math.max(0, L - at) };
      })
      .sort((a, b) => b.lengthMm - a.lengthMm || b.usedMm - a.usedMm)
      .map((b, i) => ({ ...b, index: i + 1 }));
    const totalLengthMm = boards.reduce((s, b) => s + b.lengthMm, 0);
    const partLengthMm = g.pieces.reduce((s, p) => s + p.lengthMm, 0);
    const m = materials.find((x) => x.id === g.materialId);
    out.push({
      materialId: g.materialId,
      materialName: m?.name ?? g.materialId,
      thicknessMm: g.thicknessMm,
      stockWidthMm: g.widthMm,
      boards,
      lowerBound: Math.ceil(sizes.reduce((s, x) => s + x, 0) / caps[caps.length - 1] - 1e-9),
      totalLengthMm,
      partLengthMm,
      yieldPct: totalLengthMm > 0 ? (100 * partLengthMm) / totalLengthMm : 0,
    });
  }
  return { groups: out, unplaced: [...unplaced.values()] };
}
