import type { DiagramShape, RuleDiagram as Diagram } from "@/lib/engine/checks/diagrams";

const FILL: Record<DiagramShape["role"], { fill: string; stroke: string; dash?: string }> = {
  wall: { fill: "#4b3423", stroke: "#2a1c12" },
  fixture: { fill: "#e2d6c8", stroke: "#7a5a3e" },
  zone: { fill: "url(#zone-hatch)", stroke: "#2f7d4f", dash: "6 4" },
  obstacle: { fill: "#ece3d0", stroke: "#4b3423" },
  blocked: { fill: "#fdf0cf", stroke: "#8a5f0c", dash: "3 3" },
  stock: { fill: "#d99a1e", stroke: "#8a5f0c" },
  person: { fill: "none", stroke: "#4b3423", dash: "2 3" },
};

/** A rule's drawing as SVG: shapes in mm, scaled to fit; plan views keep y down, elevations flip z up. */
export function RuleDiagram({ diagram }: { diagram: Diagram }) {
  const flip = diagram.view === "elevation" ? -1 : 1;
  const pts = [...diagram.shapes.flatMap((s) => s.polygon), ...diagram.dims.flatMap((d) => [d.from, d.to])];
  const xs = pts.map((p) => p.x);
  const ys = pts.map((p) => p.y * flip);
  const pad = 250;
  const minX = Math.min(...xs) - pad;
  const minY = Math.min(...ys) - pad;
  const w = Math.max(...xs) - minX + pad;
  const h = Math.max(...ys) - minY + pad;
  const font = Math.max(w, h) / 42;
  const P = (x: number, y: number) => `${x.toFixed(1)},${(y * flip).toFixed(1)}`;
  return (
    <figure className="rounded-lg border border-walnut-100 bg-white p-3">
      <svg viewBox={`${minX} ${minY} ${w} ${h}`} role="img" aria-label={diagram.caption} className="h-auto max-h-[420px] w-full">
        <defs>
          <pattern id="zone-hatch" width={font} height={font} patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
            <rect width={font} height={font} fill="#dcefe2" />
            <line x1="0" y1="0" x2="0" y2={font} stroke="#2f7d4f" strokeWidth={font / 6} />
          </pattern>
        </defs>
        {diagram.shapes.map((s, i) => {
          const st = FILL[s.role];
          const c = s.polygon.reduce((a, p) => ({ x: a.x + p.x / s.polygon.length, y: a.y + p.y / s.polygon.length }), { x: 0, y: 0 });
          return (
            <g key={i}>
              <polygon points={s.polygon.map((p) => P(p.x, p.y)).join(" ")} fill={st.fill} stroke={st.stroke} strokeWidth={font / 8} strokeDasharray={st.dash ? st.dash.split(" ").map((n) => Number(n) * (font / 6)).join(" ") : undefined} fillOpacity={s.role === "zone" ? 0.8 : 1} />
              {s.label ? (
                <text x={c.x} y={c.y * flip} fontSize={font} textAnchor="middle" dominantBaseline="middle" fill="#2a1c12">
                  {s.label}
                </text>
              ) : null}
            </g>
          );
        })}
        {diagram.dims.map((d, i) => {
          const mx = (d.from.x + d.to.x) / 2;
          const my = ((d.from.y + d.to.y) / 2) * flip;
          const vertical = Math.abs(d.to.x - d.from.x) < Math.abs(d.to.y - d.from.y);
          return (
            <g key={`d${i}`} stroke="#2a1c12" strokeWidth={font / 10}>
              <line x1={d.from.x} y1={d.from.y * flip} x2={d.to.x} y2={d.to.y * flip} />
              <circle cx={d.from.x} cy={d.from.y * flip} r={font / 4} fill="#2a1c12" />
              <circle cx={d.to.x} cy={d.to.y * flip} r={font / 4} fill="#2a1c12" />
              <text x={vertical ? mx + font / 2 : mx} y={vertical ? my : my - font / 2} fontSize={font} stroke="none" fill="#2a1c12" textAnchor={vertical ? "start" : "middle"} dominantBaseline="middle">
                {d.label}
              </text>
            </g>
          );
        })}
      </svg>
      <figcaption className="mt-2 text-sm text-walnut-700">{diagram.caption}</figcaption>
    </figure>
  );
}
