import { Circle, G, Line, Polygon, Polyline, Svg, Text } from "@react-pdf/renderer";
import type { Drawing } from "@/lib/engine/drawings/types";
import { DIMENSION_INK, MARK_STYLES, TEXT_COLOURS } from "@/components/drawings/drawing-palette";
import { PACKET_FONT } from "./styles";

interface Props {
  drawing: Drawing;
  /** Largest box the drawing may take on the page, points; it keeps its proportions inside it. */
  maxWidthPt: number;
  maxHeightPt: number;
}

/** The drawing's size on the page, points, fitted inside the box with its proportions kept. */
export function fittedSize(d: Drawing, maxWidthPt: number, maxHeightPt: number): { width: number; height: number; ptPerMm: number } {
  const w = Math.max(1, d.bounds.maxX - d.bounds.minX);
  const h = Math.max(1, d.bounds.maxY - d.bounds.minY);
  const ptPerMm = Math.min(maxWidthPt / w, maxHeightPt / h);
  return { width: w * ptPerMm, height: h * ptPerMm, ptPerMm };
}

const rotate = (deg: number, x: number, y: number) => (deg ? `rotate(${deg}, ${x}, ${y})` : undefined);

/**
 * An engine drawing as PDF vector marks: the same drawing objects the pages draw as SVG
 * (components/drawings/DrawingSvg.tsx), mapped one to one onto the PDF's SVG primitives, with the
 * same palette. No geometry is worked out here.
 */
export function DrawingPdf({ drawing, maxWidthPt, maxHeightPt }: Props) {
  const b = drawing.bounds;
  const size = drawing.textSizeMm;
  const { width, height } = fittedSize(drawing, maxWidthPt, maxHeightPt);
  return (
    <Svg width={width} height={height} viewBox={`${b.minX} ${b.minY} ${b.maxX - b.minX} ${b.maxY - b.minY}`}>
      {drawing.shapes.map((s, i) => {
        const st = MARK_STYLES[s.role];
        const points = s.points.map((p) => `${p.x},${p.y}`).join(" ");
        const common = {
          stroke: st.stroke,
          strokeWidth: st.width * size,
          strokeDasharray: st.dash ? `${size * 0.4} ${size * 0.25}` : undefined,
          strokeLinejoin: "round" as const,
        };
        return s.type === "polygon" ? (
          <Polygon key={`s${i}`} points={points} fill={st.fill} fillOpacity={st.opacity ?? 1} {...common} />
        ) : (
          <Polyline key={`s${i}`} points={points} fill="none" {...common} />
        );
      })}
      {drawing.dimensions.map((d, i) => (
        <G key={`d${i}`}>
          <Line x1={d.line[0].x} y1={d.line[0].y} x2={d.line[1].x} y2={d.line[1].y} stroke={DIMENSION_INK} strokeWidth={size * 0.05} />
          {d.extensions.map(([p, q], k) => (
            <Line key={k} x1={p.x} y1={p.y} x2={q.x} y2={q.y} stroke={DIMENSION_INK} strokeWidth={size * 0.03} />
          ))}
          {[d.line[0], d.line[1]].map((p, k) => (
            <Circle key={`e${k}`} cx={p.x} cy={p.y} r={size * 0.1} fill={DIMENSION_INK} />
          ))}
          <Text x={d.textAt.x} y={d.textAt.y} textAnchor="middle" dominantBaseline="central" fill={DIMENSION_INK} transform={rotate(d.textAngleDeg, d.textAt.x, d.textAt.y)} style={{ fontFamily: PACKET_FONT, fontSize: size * 0.85 }}>
            {d.text}
          </Text>
        </G>
      ))}
      {drawing.labels.flatMap((l, i) =>
        l.lines.map((line, k) => (
          <Text key={`l${i}-${k}`} x={line.at.x} y={line.at.y} textAnchor="middle" dominantBaseline="central" fill={TEXT_COLOURS[l.kind]} transform={rotate(l.angleDeg, line.at.x, line.at.y)} style={{ fontFamily: PACKET_FONT, fontSize: l.sizeMm, fontWeight: l.kind === "wall-name" ? 600 : 400 }}>
            {line.text}
          </Text>
        )),
      )}
    </Svg>
  );
}
