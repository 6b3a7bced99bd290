import { rectsOverlap, textWidthMm, type SheetRect } from "./text-fit";
import type { DimensionLine } from "./types";

/** Dimension text is drawn at this share of the drawing's text height (as the SVG renderer draws it). */
export const DIMENSION_TEXT_EM = 0.85;

/** Which chains keep their text first when texts collide: the selected fixture's, the overall length, then what a person checks most. */
const PRIORITY = ["selection", "overall", "levels", "fixture-heights", "gaps", "fixtures", "depths", "walkways", "blade-clear", "wall-hung", "heights", "openings"];
const rank = (chain: string) => {
  const i = PRIORITY.indexOf(chain);
  return i < 0 ? PRIORITY.length : i;
};

/** The box a dimension's text takes on the sheet at text height `sizeMm`, mm (turned with the text). */
export function dimensionTextRect(d: DimensionLine, sizeMm: number): SheetRect {
  const h = DIMENSION_TEXT_EM * sizeMm;
  const w = textWidthMm(d.text, h) + h * 0.4;
  const a = (d.textAngleDeg * Math.PI) / 180;
  const c = Math.abs(Math.cos(a));
  const s = Math.abs(Math.sin(a));
  const hw = (w * c + h * 1.2 * s) / 2;
  const hh = (w * s + h * 1.2 * c) / 2;
  return { x0: d.textAt.x - hw, y0: d.textAt.y - hh, x1: d.textAt.x + hw, y1: d.textAt.y + hh };
}

/**
 * Which dimension texts can be shown without overlapping one another at text height `sizeMm`
 * (sheet mm), by chain priority and then drawing order; the rest are for a hover to reveal. Same
 * length and order as `dims`.
 */
export function fittingDimensionTexts(dims: readonly DimensionLine[], sizeMm: number): boolean[] {
  const order = dims.map((d, i) => ({ i, r: rank(d.chain) })).sort((a, b) => a.r - b.r || a.i - b.i);
  const kept: SheetRect[] = [];
  const out = dims.map(() => false);
  for (const { i } of order) {
    const box = dimensionTextRect(dims[i], sizeMm);
    if (kept.some((k) => rectsOverlap(k, box))) continue;
    kept.push(box);
    out[i] = true;
  }
  return out;
}

/** Zoom steps a live view lays its dimensions out at: a quarter octave apart, so a small zoom does not move them. */
const STEPS_PER_DOUBLING = 4;

/**
 * The sheet text height, mm, at which a live view's dimension text of `textPx` CSS px fits its
 * zoom of `pxPerMm` screen px per room mm, rounded to a quarter-octave step of the zoom.
 */
export function liveTextSizeMm(pxPerMm: number, textPx: number): number {
  if (!(pxPerMm > 0) || !Number.isFinite(pxPerMm)) return 100;
  const step = Math.round(Math.log2(pxPerMm) * STEPS_PER_DOUBLING) / STEPS_PER_DOUBLING;
  return textPx / DIMENSION_TEXT_EM / 2 ** step;
}
