import { insideConvex, LINE_PITCH_EM, rectAround, rectsOverlap, textWidthMm, wrapText, type RectIndex, type SheetRect } from "./text-fit";
import type { DrawingLabel, LegendEntry, SheetPoint } from "./types";

/** Where a label may go: inside a convex region (at one of the candidate centres), else out along `outward` from `anchor`. */
export interface LabelSite {
  text: string;
  ref?: string;
  region: SheetPoint[];
  /** Centres to try inside the region, best first. */
  centres: SheetPoint[];
  /** Text turns to try inside, degrees clockwise on the sheet (0 first). */
  angles: number[];
  anchor: SheetPoint;
  /** Unit direction, on the sheet, to look for room outside. */
  outward: SheetPoint;
}

/** What placing labels needs: text height, taken boxes, boxes a callout must not cover, and the tag counter. */
export interface LabelContext {
  sizeMm: number;
  taken: RectIndex;
  blockers: RectIndex;
  labels: DrawingLabel[];
  leaders: { points: SheetPoint[]; ref?: string }[];
  legend: LegendEntry[];
}

/** How far out a callout may go, in steps of one text height. */
const MAX_CALLOUT_STEPS = 40;
/** Smaller text tried when the full size does not fit, as a share of the drawing's text height. */
const SMALLER = 0.8;

const rad = (deg: number) => (deg * Math.PI) / 180;

/** Corners of a text block centred on `c`, turned by `angleDeg`. */
function blockCorners(c: SheetPoint, w: number, h: number, angleDeg: number): SheetPoint[] {
  const cos = Math.cos(rad(angleDeg));
  const sin = Math.sin(rad(angleDeg));
  return [[-w / 2, -h / 2], [w / 2, -h / 2], [w / 2, h / 2], [-w / 2, h / 2]].map(([u, v]) => ({ x: c.x + u * cos - v * sin, y: c.y + u * sin + v * cos }));
}

/** The label object for lines centred on `c`, one line pitch apart across the text direction. */
function makeLabel(text: string, lines: string[], c: SheetPoint, sizeMm: number, angleDeg: number, kind: DrawingLabel["kind"], ref?: string): DrawingLabel {
  const pitch = LINE_PITCH_EM * sizeMm;
  const nx = -Math.sin(rad(angleDeg));
  const ny = Math.cos(rad(angleDeg));
  const first = -((lines.length - 1) * pitch) / 2;
  return {
    text,
    lines: lines.map((t, i) => ({ text: t, at: { x: c.x + nx * (first + i * pitch), y: c.y + ny * (first + i * pitch) } })),
    sizeMm,
    angleDeg,
    kind,
    ...(ref ? { ref } : {}),
  };
}

/** Tries to set the text inside the region; returns the label or null. */
function inside(site: LabelSite, text: string, ctx: LabelContext, kind: DrawingLabel["kind"], maxLines: number): DrawingLabel | null {
  const pad = ctx.sizeMm * 0.3;
  for (const size of [ctx.sizeMm, ctx.sizeMm * SMALLER]) {
    for (const angle of site.angles) {
      // The room across the region along the text direction bounds the line width.
      const span = spanAlong(site.region, angle);
      const lines = wrapText(text, size, span - 2 * pad, maxLines);
      if (!lines) continue;
      const w = Math.max(...lines.map((l) => textWidthMm(l, size))) + 2 * pad;
      const h = lines.length * LINE_PITCH_EM * size + pad;
      for (const c of site.centres) {
        const corners = blockCorners(c, w, h, angle);
        if (!corners.every((p) => insideConvex(p, site.region))) continue;
        const box = rectAround(corners);
        if (ctx.taken.hits(box)) continue;
        ctx.taken.add(box);
        return makeLabel(text, lines, c, size, angle, kind, site.ref);
      }
    }
  }
  return null;
}

/** Widest extent of a polygon along a direction, mm. */
function spanAlong(points: readonly SheetPoint[], angleDeg: number): number {
  const ux = Math.cos(rad(angleDeg));
  const uy = Math.sin(rad(angleDeg));
  let lo = Infinity, hi = -Infinity;
  for (const p of points) {
    const t = p.x * ux + p.y * uy;
    lo = Math.min(lo, t);
    hi = Math.max(hi, t);
  }
  return hi - lo;
}

/** Tries to set the text outside, stepping out from the region's edge; adds a leader from the anchor. */
function callout(site: LabelSite, text: string, ctx: LabelContext, kind: DrawingLabel["kind"]): DrawingLabel | null {
  const size = ctx.sizeMm * SMALLER;
  const pad = size * 0.3;
  const w = textWidthMm(text, size) + 2 * pad;
  const h = LINE_PITCH_EM * size + pad;
  const own = rectAround(site.region);
  // Half the block's extent along the outward direction, so its near edge starts where the search stands.
  const half = (Math.abs(site.outward.x) * w + Math.abs(site.outward.y) * h) / 2;
  // Start at the region's edge along the outward direction.
  let edge = 0;
  for (const p of site.region) edge = Math.max(edge, (p.x - site.anchor.x) * site.outward.x + (p.y - site.anchor.y) * site.outward.y);
  for (let k = 1; k <= MAX_CALLOUT_STEPS; k++) {
    const d = edge + k * ctx.sizeMm * 0.5 + half;
    const c = { x: site.anchor.x + site.outward.x * d, y: site.anchor.y + site.outward.y * d };
    const box = { x0: c.x - w / 2, y0: c.y - h / 2, x1: c.x + w / 2, y1: c.y + h / 2 };
    if (rectsOverlap(box, own) || ctx.taken.hits(box) || ctx.blockers.hits(box)) continue;
    ctx.taken.add(box);
    const near = { x: c.x - site.outward.x * half, y: c.y - site.outward.y * half };
    ctx.leaders.push({ points: [site.anchor, near], ...(site.ref ? { ref: site.ref } : {}) });
    return makeLabel(text, [text], c, size, 0, kind, site.ref);
  }
  return null;
}

/**
 * Places one label so it never runs out of its box: the words inside (wrapped to two lines, or a
 * little smaller), else the words outside with a leader, else a numbered tag (inside or outside)
 * with the words in the legend, else the legend alone.
 */
export function placeLabel(site: LabelSite, ctx: LabelContext): void {
  const named = inside(site, site.text, ctx, "name", 2) ?? callout(site, site.text, ctx, "name");
  if (named) {
    ctx.labels.push(named);
    return;
  }
  const tag = String(ctx.legend.length + 1);
  const tagged = inside(site, tag, ctx, "tag", 1) ?? callout(site, tag, ctx, "tag");
  ctx.legend.push({ tag: tagged ? tag : "", text: site.text, ...(site.ref ? { ref: site.ref } : {}) });
  if (tagged) ctx.labels.push(tagged);
}

/** Lays the legend out as rows of text from a top-left corner; returns the labels. */
export function legendLabels(legend: readonly LegendEntry[], topLeft: SheetPoint, sizeMm: number): DrawingLabel[] {
  return legend.map((e, i) => {
    const text = e.tag ? `${e.tag}  ${e.text}` : `${e.text} (too small to mark at this scale)`;
    const c = { x: topLeft.x + textWidthMm(text, sizeMm) / 2, y: topLeft.y + (i + 0.5) * LINE_PITCH_EM * sizeMm };
    return makeLabel(text, [text], c, sizeMm, 0, "legend", e.ref);
  });
}

/** A plain label at a point (wall names, opening names), with no fitting. */
export function freeLabel(text: string, c: SheetPoint, sizeMm: number, angleDeg: number, kind: DrawingLabel["kind"], ref?: string): DrawingLabel {
  return makeLabel(text, [text], c, sizeMm, angleDeg, kind, ref);
}

/** The box a set of labels takes on the sheet (for the drawing's bounds). */
export function labelRect(l: DrawingLabel): SheetRect {
  const pts: SheetPoint[] = [];
  for (const line of l.lines) pts.push(...blockCorners(line.at, textWidthMm(line.text, l.sizeMm), l.sizeMm * LINE_PITCH_EM, l.angleDeg));
  return rectAround(pts);
}
