import { labelRect } from "./labels";
import { rectAround, type SheetRect } from "./text-fit";
import type { Drawing, SheetPoint } from "./types";

/** Sheet coordinates are kept to 0.1 mm: plenty for a drawing, and the same text every time. */
const round = (v: number) => {
  const r = Math.round(v * 10) / 10;
  return Object.is(r, -0) ? 0 : r;
};
const pt = (p: SheetPoint): SheetPoint => ({ x: round(p.x), y: round(p.y) });

/** The box that holds every mark, text and dimension of a drawing, with a margin, mm. */
function boundsOf(d: Omit<Drawing, "bounds">, marginMm: number): Drawing["bounds"] {
  const rects: SheetRect[] = [];
  for (const s of d.shapes) rects.push(rectAround(s.points));
  for (const l of d.labels) rects.push(labelRect(l));
  for (const m of d.dimensions) {
    rects.push(rectAround([m.line[0], m.line[1], ...m.extensions.flat()]));
    const h = d.textSizeMm;
    const w = m.text.length * h;
    rects.push({ x0: m.textAt.x - w / 2, y0: m.textAt.y - w / 2, x1: m.textAt.x + w / 2, y1: m.textAt.y + w / 2 });
  }
  // Loops, not spread arguments: a large plan has tens of thousands of marks.
  let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
  for (const r of rects) {
    if (!Number.isFinite(r.x0)) continue;
    minX = Math.min(minX, r.x0);
    minY = Math.min(minY, r.y0);
    maxX = Math.max(maxX, r.x1);
    maxY = Math.max(maxY, r.y1);
  }
  if (!Number.isFinite(minX)) return { minX: 0, minY: 0, maxX: 1, maxY: 1 };
  return { minX: round(minX - marginMm), minY: round(minY - marginMm), maxX: round(maxX + marginMm), maxY: round(maxY + marginMm) };
}

/** The drawing with its bounds worked out and every sheet point rounded to 0.1 mm. */
export function finishDrawing(d: Omit<Drawing, "bounds">): Drawing {
  const rounded: Omit<Drawing, "bounds"> = {
    ...d,
    shapes: d.shapes.map((s) => ({ ...s, points: s.points.map(pt) })),
    labels: d.labels.map((l) => ({ ...l, lines: l.lines.map((x) => ({ text: x.text, at: pt(x.at) })), sizeMm: round(l.sizeMm), angleDeg: round(l.angleDeg) })),
    dimensions: d.dimensions.map((m) => ({
      ...m,
      from: pt(m.from),
      to: pt(m.to),
      line: [pt(m.line[0]), pt(m.line[1])],
      extensions: m.extensions.map(([a, b]) => [pt(a), pt(b)] as [SheetPoint, SheetPoint]),
      textAt: pt(m.textAt),
      textAngleDeg: round(m.textAngleDeg),
    })),
    ...(d.photoAnchor ? { photoAnchor: pt(d.photoAnchor) } : {}),
  };
  return { ...rounded, bounds: boundsOf(rounded, d.textSizeMm) };
}

/**
 * Text height for a drawing of this extent, mm: a 55th of its larger side (our own choice: about
 * 12 px when a garage-sized plan fills a laptop screen's height), within sensible limits.
 */
export function textSizeFor(extentMm: number): number {
  return Math.round(Math.min(300, Math.max(40, extentMm / 55)));
}
