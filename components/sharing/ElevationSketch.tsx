import type { PlanDocument } from "@/lib/engine/plan/schema";
import { formatLength } from "@/lib/engine/units/format-length";

const num = (v: unknown, fallback: number) => (typeof v === "number" && Number.isFinite(v) && v > 0 ? v : fallback);

/** One wall seen from inside the room: openings and the fixtures placed against it, with heights from their parameters. */
export function ElevationSketch({ document, wallId, highlight = [], photo }: { document: PlanDocument; wallId: string; highlight?: string[]; photo?: { url: string; widthMm: number; heightMm: number } }) {
  const wall = document.room.walls.find((w) => w.id === wallId);
  if (!wall) return null;
  const H = document.room.ceilingHeightMm;
  const L = wall.lengthMm;
  const fmt = (mm: number) => formatLength(mm, { units: document.settings.units, precision: document.settings.precision });
  const lit = new Set(highlight);
  return (
    <figure className="flex flex-col gap-1">
      <svg viewBox={`-200 -200 ${L + 400} ${H + 500}`} className="w-full" role="img" aria-label={`Elevation of ${wall.label || wall.id}`}>
        <rect x={0} y={0} width={L} height={H} fill="#f4efe9" stroke="#4b3423" strokeWidth={25} />
        {/* A scaled reference photo, from the wall's start at floor level. */}
        {photo && <image href={photo.url} x={0} y={H - photo.heightMm} width={photo.widthMm} height={photo.heightMm} opacity={0.6} preserveAspectRatio="none" />}
        {document.room.openings
          .filter((o) => o.wallId === wallId)
          .map((o) => {
            const bottom = o.kind === "window" ? o.sillMm : 0;
            return <rect key={o.id} x={o.offsetMm} y={H - bottom - o.heightMm} width={o.widthMm} height={o.heightMm} fill="#dfe7ee" stroke="#5b6b7d" strokeWidth={15} />;
          })}
        {document.fixtures
          .filter((f) => f.placement.mode === "wall" && f.placement.wallId === wallId)
          .map((f) => {
            const p = f.params as Record<string, unknown>;
            const place = f.placement as { offsetMm: number; elevationMm: number };
            const w = num(p.widthMm ?? p.lengthMm, 600);
            const h = num(p.heightMm ?? p.counterHeightMm, 900);
            const on = lit.has(f.id);
            return (
              <g key={f.id}>
                <rect x={place.offsetMm} y={H - place.elevationMm - h} width={w} height={h} fill={on ? "#fdf0cf" : "#e2d6c8"} stroke={on ? "#d99a1e" : "#7a5a3e"} strokeWidth={on ? 40 : 15} />
                <text x={place.offsetMm + w / 2} y={H - place.elevationMm - h / 2} fontSize={110} textAnchor="middle" fill="#2a1c12">{f.label || f.kind}</text>
              </g>
            );
          })}
        <text x={L / 2} y={H + 220} fontSize={150} textAnchor="middle" fill="#4b3423">{fmt(L)}</text>
      </svg>
      <figcaption className="text-sm text-walnut-700">{wall.label || wall.id}</figcaption>
    </figure>
  );
}
