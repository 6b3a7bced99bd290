import type { Part } from "../fixtures/types";
import type { Material } from "../plan/schema";
import type { NestPiece } from "./types";

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
}

/** Group sheet-good parts by material and thickness and expand quantities into pieces. Sizes in mm. */
export function sheetGroups(parts: readonly Part[], materials: readonly Material[]): SheetGroup[] {
  const groups = new Map<string, SheetGroup>();
  for (const p of parts) {
    if (p.stock !== "sheet" || p.qty <= 0) continue;
    // Thickness rounded to 0.1 mm so float noise (19.049999 vs 19.05) does not split a material.
    const thick = Math.round(p.thicknessMm * 10) / 10;
    const key = `${p.materialId}|${thick}`;
    let g = groups.get(key);
    if (!g) {
      const m = materials.find((x) => x.id === p.materialId);
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
      };
      groups.set(key, g);
    }
    for (let i = 0; i < p.qty; i++) {
      g.pieces.push({ key: `${p.id}#${i + 1}`, partId: p.id, name: p.name, lengthMm: p.lengthMm, widthMm: p.widthMm, grain: p.grain });
    }
  }
  return [...groups.values()];
}
