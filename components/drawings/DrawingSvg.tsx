import { useId } from "react";
import type { ScaleBar } from "@/lib/engine/drawings/scale-bar";
import type { Drawing, DrawingShape } from "@/lib/engine/drawings/types";
import { DIMENSION_INK, HALO, HIGHLIGHT, MARK_STYLES, TEXT_COLOURS } from "./drawing-palette";

/** A reference photo under an elevation: its size on the wall, mm, set from the drawing's photo anchor (the viewer's left corner at the floor). */
export interface DrawingPhoto {
  url: string;
  widthMm: number;
  heightMm: number;
}

interface Props {
  drawing: Drawing;
  /** Ids of plan objects to pick out (a walk-through step's fixtures and zones). */
  highlight?: readonly string[];
  /** Show the keep-clear zones layer (highlighted zones show either way). Default true. */
  showKeepClear?: boolean;
  photo?: DrawingPhoto;
  /** Smallest text, CSS px: the drawing keeps at least the width that gives it (scroll the box around it on small screens). */
  minTextPx?: number;
  className?: string;
  /** A scale bar under the drawing (the downloadable files carry one). */
  scale?: ScaleBar;
  /** A file of its own (the SVG downloads): the XML namespace and a size in millimetres at 1:50, no page styles. */
  standalone?: boolean;
}

/**
 * Draws an engine drawing as SVG. It only maps drawing objects to SVG elements: every point, text
 * position and dimension comes from the engine (lib/engine/drawings), in sheet mm.
 */
export function DrawingSvg({ drawing, highlight = [], showKeepClear = true, photo, minTextPx = 11, className = "", scale, standalone = false }: Props) {
  const id = useId();
  const { textSizeMm: size } = drawing;
  const b = scale?.bounds ?? drawing.bounds;
  const lit = new Set(highlight);
  const shown = (s: DrawingShape) => !s.layer || showKeepClear || (s.ref !== undefined && lit.has(s.ref));
  const width = b.maxX - b.minX;
  const mark = (s: DrawingShape, i: number) => {
    const st = MARK_STYLES[s.role];
    const on = s.ref !== undefined && lit.has(s.ref);
    const common = {
      fill: on && st.fill !== "none" ? HIGHLIGHT.fill : st.fill,
      fillOpacity: on ? 0.9 : st.opacity,
      stroke: on ? HIGHLIGHT.stroke : st.stroke,
      strokeWidth: (on ? HIGHLIGHT.width : st.width) * size,
      strokeDasharray: st.dash ? `${size * 0.4} ${size * 0.25}` : undefined,
      strokeLinejoin: "round" as const,
      "data-role": s.role,
      "data-ref": s.ref,
    };
    const points = s.points.map((p) => `${p.x},${p.y}`).join(" ");
    return s.type === "polygon" ? <polygon key={i} points={points} {...common} /> : <polyline key={i} points={points} {...common} fill="none" />;
  };
  return (
    <svg
      viewBox={`${b.minX} ${b.minY} ${width} ${b.maxY - b.minY}`}
      role="img"
      aria-labelledby={`${id}-t`}
      aria-describedby={`${id}-d`}
      {...(standalone
        ? { xmlns: "http://www.w3.org/2000/svg", width: `${Math.round(width / 5) / 10}mm`, height: `${Math.round((b.maxY - b.minY) / 5) / 10}mm`, fontFamily: "Inter, Arial, sans-serif" }
        : { className, style: { minWidth: `${Math.round((width / size) * minTextPx)}px` } })}
      data-drawing={drawing.kind}
      data-wall={drawing.wallId}
    >
      <title id={`${id}-t`}>{drawing.title}</title>
      <desc id={`${id}-d`}>{drawing.description}</desc>
      {drawing.shapes.filter(shown).map((s, i) => {
        // A reference photo goes over the wall's face and under everything in front of it.
        if (s.role === "wall-face" && photo && drawing.photoAnchor) {
          return (
            <g key={i}>
              {mark(s, i)}
              <image href={photo.url} x={drawing.photoAnchor.x} y={drawing.photoAnchor.y - photo.heightMm} width={photo.widthMm} height={photo.heightMm} opacity={0.6} preserveAspectRatio="none" />
            </g>
          );
        }
        return mark(s, i);
      })}
      {drawing.dimensions.map((d, i) => (
        <g key={i} stroke={DIMENSION_INK} strokeWidth={size * 0.05} data-chain={d.chain} data-value-mm={d.valueMm}>
          <line x1={d.line[0].x} y1={d.line[0].y} x2={d.line[1].x} y2={d.line[1].y} />
          {d.extensions.map(([p, q], k) => (
            <line key={k} x1={p.x} y1={p.y} x2={q.x} y2={q.y} strokeWidth={size * 0.03} />
          ))}
          {[d.line[0], d.line[1]].map((p, k) => (
            <circle key={k} cx={p.x} cy={p.y} r={size * 0.1} fill={DIMENSION_INK} stroke="none" />
          ))}
          <text x={d.textAt.x} y={d.textAt.y} fontSize={size * 0.85} textAnchor="middle" dominantBaseline="central" fill={DIMENSION_INK} stroke={HALO} strokeWidth={size * 0.2} paintOrder="stroke" transform={d.textAngleDeg ? `rotate(${d.textAngleDeg} ${d.textAt.x} ${d.textAt.y})` : undefined}>
            {d.text}
          </text>
        </g>
      ))}
      {drawing.labels.map((l, i) => (
        <g key={i} fontSize={l.sizeMm} textAnchor="middle" dominantBaseline="central" fill={TEXT_COLOURS[l.kind]} fontWeight={l.kind === "wall-name" ? 600 : 500} stroke={HALO} strokeWidth={l.sizeMm * 0.22} paintOrder="stroke" data-kind={l.kind} data-ref={l.ref}>
          {l.lines.map((line, k) => (
            // Each line turns about its own centre; lines keep a space between them so the label reads whole.
            <text key={k} x={line.at.x} y={line.at.y} transform={l.angleDeg ? `rotate(${l.angleDeg} ${line.at.x} ${line.at.y})` : undefined}>
              {k < l.lines.length - 1 ? `${line.text} ` : line.text}
            </text>
          ))}
        </g>
      ))}
      {scale && <ScaleBarMarks bar={scale} />}
    </svg>
  );
}

/** The scale bar: alternate filled and empty segments and the bar's length in words. */
function ScaleBarMarks({ bar }: { bar: ScaleBar }) {
  const seg = bar.lengthMm / bar.segments;
  return (
    <g data-scale-bar={bar.lengthMm} stroke={DIMENSION_INK} strokeWidth={bar.sizeMm * 0.05}>
      {Array.from({ length: bar.segments }, (_, i) => (
        <rect key={i} x={bar.at.x + i * seg} y={bar.at.y} width={seg} height={bar.heightMm} fill={i % 2 ? HALO : DIMENSION_INK} />
      ))}
      <text x={bar.textAt.x} y={bar.textAt.y} fontSize={bar.sizeMm * 0.85} dominantBaseline="central" fill={DIMENSION_INK} stroke="none">
        {`0 to ${bar.text}`}
      </text>
    </g>
  );
}
