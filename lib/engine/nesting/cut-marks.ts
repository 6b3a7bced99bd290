import type { SheetLayout } from "./types";

/** One numbered cut on a sheet map: the kerf's centre line and the number's circle, sheet mm. */
export interface CutMark {
  seq: number;
  x1: number;
  y1: number;
  x2: number;
  y2: number;
  cx: number;
  cy: number;
  r: number;
}

/** Where to draw each cut of a sheet map and its number (sheet mm, radius `r` mm); numbers slide along their cut so they do not cover each other. */
export function cutMarks(sheet: SheetLayout, kerfMm: number, r: number): CutMark[] {
  const placed: { cx: number; cy: number }[] = [];
  return sheet.cuts.map((c) => {
    const rip = c.kind === "rip";
    const x1 = rip ? c.x1Mm : c.x1Mm + kerfMm / 2;
    const y1 = rip ? c.y1Mm + kerfMm / 2 : c.y1Mm;
    const x2 = rip ? c.x2Mm : c.x2Mm + kerfMm / 2;
    const y2 = rip ? c.y2Mm + kerfMm / 2 : c.y2Mm;
    let cx = x1 + (rip ? r : 0);
    let cy = y1 + (rip ? 0 : r);
    for (let i = 0; i < 20 && placed.some((p) => Math.hypot(p.cx - cx, p.cy - cy) < 2 * r); i++) {
      if (rip) cx = Math.min(x2 - r, cx + 2.2 * r);
      else cy = Math.min(y2 - r, cy + 2.2 * r);
    }
    placed.push({ cx, cy });
    return { seq: c.seq, x1, y1, x2, y2, cx, cy, r };
  });
}

/** The cut order in words, for the saw ("Rip the sheet at 24" from the sheet's near edge (23 3/4" past the trim)"), lengths through `len`. */
export function cutSteps(sheet: SheetLayout, len: (mm: number) => string): { seq: number; text: string }[] {
  return sheet.cuts.map((c) => {
    const rip = c.kind === "rip";
    const width = rip ? c.y1Mm - sheet.usable.yMm : c.x1Mm - sheet.usable.xMm;
    const what = c.level === 1 ? "the sheet" : c.level === 2 ? (rip ? "the piece" : "the strip") : "the piece";
    const past = c.level === 1 && width > 0 ? ` (${len(width)} past the trim)` : "";
    return { seq: c.seq, text: `${rip ? "Rip" : "Crosscut"} ${what} at ${len(rip ? c.y1Mm : c.x1Mm)} from the sheet's ${rip ? "near edge" : "end"}${past}` };
  });
}
