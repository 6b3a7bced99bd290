import type { SheetLayout } from "@/lib/engine/nesting/types";
import { useLabels } from "./build/label-context";
import { cutMarks, cutSteps } from "@/lib/engine/nesting/cut-marks";
import type { Formatters } from "./format";

/**
 * One sheet drawn to scale (mm in the SVG's own units): pieces with name and size, grain arrows
 * along the sheet's length, hatched offcuts (darker where reusable), trim margin, and the cut
 * order numbered where each cut starts.
 */
export function SheetMap({ sheet, kerfMm, fmt, title }: { sheet: SheetLayout; kerfMm: number; fmt: Formatters; title: string }) {
  const L = sheet.lengthMm;
  const W = sheet.widthMm;
  const hatch = `hatch-${sheet.stockId}-${sheet.index}`;
  const hatchKeep = `${hatch}-keep`;
  const font = Math.max(22, Math.min(L, W) / 30);
  const { labelOf, selected } = useLabels();
  return (
    <figure className="break-inside-avoid" data-testid="sheet-map">
      <figcaption className="mb-1 text-sm font-semibold text-walnut-900">
        {title} · {fmt.size(L, W)} · {sheet.placements.length} pieces · yield {sheet.yieldPct.toFixed(0)}%
        {sheet.source === "offcut" && " · your offcut"}
      </figcaption>
      <svg viewBox={`-4 -4 ${L + 8} ${W + 8}`} className="h-auto w-full max-w-4xl bg-white" role="img" aria-label={`${title}: ${sheet.placements.length} pieces, ${sheet.cuts.length} cuts`}>
        <defs>
          <pattern id={hatch} width={40} height={40} patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
            <line x1={0} y1={0} x2={0} y2={40} stroke="#b89c80" strokeWidth={4} />
          </pattern>
          <pattern id={hatchKeep} width={30} height={30} patternUnits="userSpaceOnUse" patternTransform="rotate(-45)">
            <line x1={0} y1={0} x2={0} y2={30} stroke="#2f7d4f" strokeWidth={5} />
          </pattern>
          <marker id={`${hatch}-arrow`} viewBox="0 0 10 10" refX={9} refY={5} markerWidth={6} markerHeight={6} orient="auto">
            <path d="M0,0 L10,5 L0,10 z" fill="#7a5a3e" />
          </marker>
        </defs>
        <rect x={0} y={0} width={L} height={W} fill="#ece3d0" stroke="#2a1c12" strokeWidth={4} />
        {(sheet.usable.lenMm < L || sheet.usable.widMm < W) && (
          <rect x={sheet.usable.xMm} y={sheet.usable.yMm} width={sheet.usable.lenMm} height={sheet.usable.widMm} fill="none" stroke="#7a5a3e" strokeWidth={2} strokeDasharray="12 8" />
        )}
        {sheet.offcuts.map((o, i) => (
          <g key={`o${i}`}>
            <rect x={o.xMm} y={o.yMm} width={o.lenMm} height={o.widMm} fill={`url(#${o.reusable ? hatchKeep : hatch})`} stroke={o.reusable ? "#2f7d4f" : "none"} strokeWidth={3} />
            {o.reusable && o.lenMm > 6 * font && o.widMm > 2 * font && (
              <text x={o.xMm + o.lenMm / 2} y={o.yMm + o.widMm / 2} fontSize={font * 0.8} textAnchor="middle" dominantBaseline="middle" fill="#1f5636" stroke="white" strokeWidth={4} paintOrder="stroke">
                offcut {fmt.size(o.lenMm, o.widMm)}
              </text>
            )}
          </g>
        ))}
        {sheet.placements.map((p) => {
          const big = p.lenMm > 5 * font && p.widMm > 2.4 * font;
          const label = labelOf[p.partId];
          const hit = label !== undefined && label === selected;
          // Small pieces still show their label: it is what gets pencilled on the piece.
          const fits = !big && label !== undefined && p.lenMm > 1.6 * font * label.length * 0.7 && p.widMm > 1.3 * font;
          return (
            <g key={p.pieceKey} data-label={label}>
              <rect x={p.xMm} y={p.yMm} width={p.lenMm} height={p.widMm} fill={hit ? "#e5e9ee" : "#fdf0cf"} stroke={hit ? "#36414e" : "#4b3423"} strokeWidth={hit ? 10 : 3} />
              <title>{`${label ? `${label} ` : ""}${p.name}: ${fmt.size(p.rotated ? p.widMm : p.lenMm, p.rotated ? p.lenMm : p.widMm)}`}</title>
              {big && (
                <text x={p.xMm + p.lenMm / 2} y={p.yMm + p.widMm / 2 - font * 0.6} fontSize={font} textAnchor="middle" fill="#2a1c12">
                  {label && <tspan fontWeight="bold">{label} </tspan>}
                  {p.name.length > 24 ? `${p.name.slice(0, 23)}…` : p.name}
                </text>
              )}
              {fits && (
                <text x={p.xMm + p.lenMm / 2} y={p.yMm + p.widMm / 2} fontSize={font} fontWeight="bold" textAnchor="middle" dominantBaseline="middle" fill="#2a1c12">
                  {label}
                </text>
              )}
              {big && (
                <text x={p.xMm + p.lenMm / 2} y={p.yMm + p.widMm / 2 + font * 0.6} fontSize={font * 0.85} textAnchor="middle" fill="#4b3423">
                  {fmt.size(p.rotated ? p.widMm : p.lenMm, p.rotated ? p.lenMm : p.widMm)}
                </text>
              )}
              {p.grain !== "none" && p.lenMm > 4 * font && p.widMm > 1.5 * font && (
                <line
                  x1={p.xMm + font}
                  x2={p.xMm + Math.min(p.lenMm - font, 5 * font)}
                  y1={p.yMm + p.widMm - font * 0.7}
                  y2={p.yMm + p.widMm - font * 0.7}
                  stroke="#7a5a3e"
                  strokeWidth={3}
                  markerEnd={`url(#${hatch}-arrow)`}
                >
                  <title>Grain</title>
                </line>
              )}
            </g>
          );
        })}
        {cutMarks(sheet, kerfMm, font * 0.75).map((m) => (
          <g key={`c${m.seq}`}>
            <line x1={m.x1} y1={m.y1} x2={m.x2} y2={m.y2} stroke="#b5432c" strokeWidth={2} strokeDasharray="16 6" />
            <circle cx={m.cx} cy={m.cy} r={m.r} fill="#b5432c" />
            <text x={m.cx} y={m.cy} fontSize={m.r * 1.07} textAnchor="middle" dominantBaseline="central" fill="white">
              {m.seq}
            </text>
          </g>
        ))}
      </svg>
    </figure>
  );
}

/** The cut order in words, for the saw: "1. Rip the sheet 610 mm from the near edge". */
export function CutList({ sheet, fmt }: { sheet: SheetLayout; fmt: Formatters }) {
  return (
    <ol className="mt-2 list-none columns-1 gap-6 text-xs text-walnut-700 sm:columns-2 lg:columns-3">
      {cutSteps(sheet, fmt.len).map((c) => (
        <li key={c.seq} className="break-inside-avoid">
          {c.seq}. {c.text}
        </li>
      ))}
    </ol>
  );
}
