import type { Part } from "../fixtures/types";
import type { Material } from "../plan/schema";
import { PLAN_LIMITS } from "../plan/limits";
import type { NestPiece, UnplacedPart } from "./types";

/** 48 x 96 in sheet, mm (TRADE.md: common practice). */
export const DEFAULT_SHEET_LENGTH_MM = 2438.4;
export const DEFAULT_SHEET_WIDTH_MM = 1219.2;
/** Trim off each factory edge: 1/4 in, our default (common practice trims a bruised factory edge; editable). */
export const DEFAULT_TRIM_MM = 6.35;
/** Leftovers at least 6 x 12 in are worth keeping: our own default, editable. */
export const DEFAULT_REUSABLE_MIN_WIDTH_MM = 152.4;
export const DEFAULT_REUSABLE_MIN_LENGTH_MM = 304.8;

/** Parts of one sheet material at one thickness. */
export interface SheetGroup {
  key: string;
  materialId: string;
  materialName: string;
  thicknessMm: number;
  sheetLengthMm: number;
  sheetWidthMm: number;
  pieces: NestPiece[];
  /** Parts left out: no usable size, or past the plan's piece limit. */
  refused: UnplacedPart[];
}

/**
 * How many layers of a sheet a part takes: a part thinner than its sheet is cut from it and planed or
 * shimmed to size (one layer); a thicker one is glued up from layers (a doubled fence: two). A layer
 * within 15% counts as whole, so 38.1 mm of 18 mm plywood is two layers, not three.
 */
export function layersOf(partThicknessMm: number, sheetThicknessMm: number | undefined): number {
  if (!sheetThicknessMm || sheetThicknessMm <= 0) return 1;
  return Math.max(1, Math.ceil(partThicknessMm / sheetThicknessMm - 0.15));
}

/** A part with a size the saw can cut: finite and positive on every side. */
export const cuttable = (p: Pick<Part, "lengthMm" | "widthMm" | "thicknessMm">) => p.lengthMm > 0 && p.widthMm > 0 && p.thicknessMm > 0 && Number.isFinite(p.lengthMm * p.widthMm * p.thicknessMm);

/**
 * Group sheet-good parts by material (at the sheet's own thickness when known) and expand quantities and layers into pieces. Sizes in mm.
 * At most `maxPieces` pieces in all (PLAN_LIMITS.pieces); parts past it, or with no usable size, are listed as refused.
 */
export function sheetGroups(parts: readonly Part[], materials: readonly Material[], maxPieces: number = PLAN_LIMITS.pieces): SheetGroup[] {
  const groups = new Map<string, SheetGroup>();
  let count = 0;
  for (const p of parts) {
    if (p.stock !== "sheet" || p.qty <= 0) continue;
    const m = materials.find((x) => x.id === p.materialId);
    const layers = layersOf(p.thicknessMm, m?.thicknessMm);
    // Thickness rounded to 0.1 mm so float noise (19.049999 vs 19.05) does not split a material.
    const thick = Math.round((m?.thicknessMm ?? p.thicknessMm) * 10) / 10;
    const key = `${p.materialId}|${thick}`;
    let g = groups.get(key);
    if (!g) {
      const a = m?.sheetLengthMm ?? DEFAULT_SHEET_LENGTH_MM;
      const b = m?.sheetWidthMm ?? DEFAULT_SHEET_WIDTH_MM;
      g = {
        key,
        materialId: p.materialId,
        materialName: m?.name ?? p.materialId,
        thicknessMm: thick,
        sheetLengthMm: Math.max(a, b),
        sheetWidthMm: Math.min(a, b),
        pieces: [],
        refused: [],
      };
      groups.set(key, g);
    }
    const n = Math.ceil(p.qty) * layers;
    if (!cuttable(p) || !Number.isFinite(n)) {
      g.refused.push({ partId: p.id, name: p.name, qty: p.qty, reason: "has no usable size: check the fixture's sizes" });
      continue;
    }
    if (count + n > maxPieces) {
      g.refused.push({ partId: p.id, name: p.name, qty: p.qty, reason: `past the plan's limit of ${maxPieces.toLocaleString("en-US")} pieces to lay out` });
      continue;
    }
    count += n;
    for (let i = 0; i < n; i++) {
      g.pieces.push({ key: `${p.id}#${i + 1}`, partId: p.id, name: p.name, lengthMm: p.lengthMm, widthMm: p.widthMm, grain: p.grain });
    }
  }
  return [...groups.values()];
}
