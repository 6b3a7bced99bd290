import type { SheetPoint } from "./types";

/** An axis-aligned box on the sheet, mm. */
export interface SheetRect {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

/**
 * Average advance of one character of the app's sans-serif text, in text heights (our own
 * allowance, on the wide side, so an estimated box holds the drawn text).
 */
const CHAR_ADVANCE_EM = 0.62;
/** Line pitch of wrapped labels, in text heights. */
export const LINE_PITCH_EM = 1.25;

/** Estimated width of a line of text at a text height, mm. */
export function textWidthMm(text: string, sizeMm: number): number {
  return [...text].length * CHAR_ADVANCE_EM * sizeMm;
}

/** Break text into at most `maxLines` lines no wider than `maxWidthMm` (words kept whole), or null when it cannot be done. */
export function wrapText(text: string, sizeMm: number, maxWidthMm: number, maxLines: number): string[] | null {
  const words = text.split(/\s+/).filter(Boolean);
  if (words.length === 0) return null;
  const lines: string[] = [];
  let line = "";
  for (const w of words) {
    const next = line ? `${line} ${w}` : w;
    if (textWidthMm(next, sizeMm) <= maxWidthMm) {
      line = next;
      continue;
    }
    if (!line) return null;
    lines.push(line);
    line = w;
    if (textWidthMm(line, sizeMm) > maxWidthMm) return null;
  }
  lines.push(line);
  return lines.length <= maxLines ? lines : null;
}

/** Whether two boxes overlap (touching edges do not count). */
export function rectsOverlap(a: SheetRect, b: SheetRect): boolean {
  return a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;
}

/** The box around some points. */
export function rectAround(points: readonly SheetPoint[]): SheetRect {
  let x0 = Infinity, y0 = Infinity, x1 = -Infinity, y1 = -Infinity;
  for (const p of points) {
    x0 = Math.min(x0, p.x);
    y0 = Math.min(y0, p.y);
    x1 = Math.max(x1, p.x);
    y1 = Math.max(y1, p.y);
  }
  return { x0, y0, x1, y1 };
}

/** Whether a point lies inside a convex polygon (either winding), within a small tolerance. */
export function insideConvex(p: SheetPoint, polygon: readonly SheetPoint[]): boolean {
  let sign = 0;
  for (let i = 0; i < polygon.length; i++) {
    const a = polygon[i];
    const b = polygon[(i + 1) % polygon.length];
    const c = (b.x - a.x) * (p.y - a.y) - (b.y - a.y) * (p.x - a.x);
    const len = Math.hypot(b.x - a.x, b.y - a.y) || 1;
    if (Math.abs(c / len) < 1e-6) continue;
    const s = c > 0 ? 1 : -1;
    if (sign === 0) sign = s;
    else if (s !== sign) return false;
  }
  return true;
}

/**
 * Boxes already taken on the sheet (labels, and what they must not cover), found through a coarse
 * grid so that placing many labels stays close to linear.
 */
export class RectIndex {
  private readonly cells = new Map<string, SheetRect[]>();

  constructor(private readonly cellMm: number) {}

  private keys(r: SheetRect): string[] {
    const out: string[] = [];
    const c = this.cellMm;
    const i0 = Math.floor(r.x0 / c), i1 = Math.floor(r.x1 / c), j0 = Math.floor(r.y0 / c), j1 = Math.floor(r.y1 / c);
    // A box wider than 64 cells is filed under its corner cells only: long boxes are few (walls, dimension rows).
    if ((i1 - i0 + 1) * (j1 - j0 + 1) > 4096) return [`${i0}:${j0}`, `${i1}:${j1}`, `${i0}:${j1}`, `${i1}:${j0}`, "wide"];
    for (let i = i0; i <= i1; i++) for (let j = j0; j <= j1; j++) out.push(`${i}:${j}`);
    return out;
  }

  add(r: SheetRect): void {
    for (const k of this.keys(r)) {
      const list = this.cells.get(k);
      if (list) list.push(r);
      else this.cells.set(k, [r]);
    }
  }

  /** Whether a box overlaps anything taken. */
  hits(r: SheetRect): boolean {
    const wide = this.cells.get("wide");
    if (wide?.some((w) => rectsOverlap(w, r))) return true;
    for (const k of this.keys(r)) {
      if (k === "wide") continue;
      if (this.cells.get(k)?.some((w) => rectsOverlap(w, r))) return true;
    }
    return false;
  }
}
