import { textWidthMm } from "./text-fit";
import type { DimensionLine, SheetPoint } from "./types";

/** Breakpoints closer than this are one, mm (a chain never shows a sliver the formatter would print as 0). */
const MERGE_MM = 0.5;

const upright = (deg: number) => (deg > 90 ? deg - 180 : deg <= -90 ? deg + 180 : deg);

/** Options shared by a dimension and the chains made of them. */
export interface DimensionStyle {
  sizeMm: number;
  format: (mm: number) => string;
  chain: string;
  ref?: string;
}

/**
 * One dimension between two sheet points (mm): the line stands `offsetMm` off them along the unit
 * normal `n`, witness lines run from near the points to just past the line, and the text sits on
 * the far side of the line (pushed out by `textLevel` rows when it does not fit between the ends).
 */
export function dimension(from: SheetPoint, to: SheetPoint, n: SheetPoint, offsetMm: number, valueMm: number, style: DimensionStyle, textLevel = 0): DimensionLine {
  const gap = style.sizeMm * 0.25;
  const over = style.sizeMm * 0.35;
  const a = { x: from.x + n.x * offsetMm, y: from.y + n.y * offsetMm };
  const b = { x: to.x + n.x * offsetMm, y: to.y + n.y * offsetMm };
  const text = style.format(valueMm);
  const out = style.sizeMm * (0.75 + 1.3 * textLevel);
  return {
    from,
    to,
    offsetMm,
    valueMm,
    text,
    line: [a, b],
    extensions: [
      [{ x: from.x + n.x * gap, y: from.y + n.y * gap }, { x: a.x + n.x * over, y: a.y + n.y * over }],
      [{ x: to.x + n.x * gap, y: to.y + n.y * gap }, { x: b.x + n.x * over, y: b.y + n.y * over }],
    ],
    textAt: { x: (a.x + b.x) / 2 + n.x * out, y: (a.y + b.y) / 2 + n.y * out },
    textAngleDeg: upright((Math.atan2(b.y - a.y, b.x - a.x) * 180) / Math.PI),
    chain: style.chain,
    ...(style.ref ? { ref: style.ref } : {}),
  };
}

/** Sorted, de-duplicated breakpoints between lo and hi (both kept), mm. */
export function breakpoints(values: readonly number[], lo: number, hi: number): number[] {
  const inside = values.filter((v) => Number.isFinite(v) && v > lo + MERGE_MM && v < hi - MERGE_MM).sort((p, q) => p - q);
  const out = [lo];
  for (const v of inside) if (v - out[out.length - 1] >= MERGE_MM) out.push(v);
  if (hi - out[out.length - 1] < MERGE_MM) out.pop();
  out.push(hi);
  return out;
}

/**
 * A running chain of dimensions along a sheet axis: from `origin + axis * t[i]` to the next, each
 * measured value the step between breakpoints (so the chain adds up to the last less the first).
 * Texts too long for their step go out one or two rows, alternating, so neighbours do not collide.
 */
export function chainAlong(origin: SheetPoint, axis: SheetPoint, n: SheetPoint, ts: readonly number[], offsetMm: number, style: DimensionStyle): DimensionLine[] {
  const out: DimensionLine[] = [];
  let tight = 0;
  for (let i = 0; i + 1 < ts.length; i++) {
    const step = ts[i + 1] - ts[i];
    const from = { x: origin.x + axis.x * ts[i], y: origin.y + axis.y * ts[i] };
    const to = { x: origin.x + axis.x * ts[i + 1], y: origin.y + axis.y * ts[i + 1] };
    const fits = textWidthMm(style.format(step), style.sizeMm) + style.sizeMm * 0.4 <= step;
    const level = fits ? 0 : 1 + (tight++ % 2);
    if (fits) tight = 0;
    out.push(dimension(from, to, n, offsetMm, step, style, level));
  }
  return out;
}
