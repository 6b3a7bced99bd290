import { useMemo } from "react";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { solveRoom } from "@/lib/engine/room/solve";
import type { SolvedWall } from "@/lib/engine/room/types";
import { formatLength } from "@/lib/engine/units/format-length";

const num = (v: unknown, fallback: number) => (typeof v === "number" && Number.isFinite(v) && v > 0 ? v : fallback);

/** A point `along` mm from the wall's start and `into` mm into the room. */
const onWall = (w: SolvedWall, along: number, into: number) => ({ x: w.start.x + w.dir.x * along + w.inward.x * into, y: w.start.y + w.dir.y * along + w.inward.y * into });

/**
 * A read-only floor plan in SVG: the solved walls with their lengths, openings, and wall-placed
 * fixtures as outlines. Highlighted ids are drawn in amber (used by presentations).
 */
export function PlanSketch({ document, highlight = [], className = "" }: { document: PlanDocument; highlight?: string[]; className?: string }) {
  const room = useMemo(() => solveRoom(document.room), [document.room]);
  const units = document.settings.units;
  const fmt = (mm: number) => formatLength(mm, { units, precision: document.settings.precision });
  const xs = room.corners.map((c) => c.x);
  const ys = room.corners.map((c) => c.y);
  const pad = 600;
  const [minX, maxX, minY, maxY] = [Math.min(...xs) - pad, Math.max(...xs) + pad, Math.min(...ys) - pad, Math.max(...ys) + pad];
  const wallById = new Map(room.walls.map((w) => [w.id, w]));
  // SVG y grows downward; the room's y grows up, so flip.
  const pt = (p: { x: number; y: number }) => `${p.x},${-p.y}`;
  const lit = new Set(highlight);

  return (
    <svg viewBox={`${minX} ${-maxY} ${maxX - minX} ${maxY - minY}`} className={`h-full w-full ${className}`} role="img" aria-label="Floor plan of the room">
      <polygon points={room.corners.map(pt).join(" ")} fill="#efe6d4" stroke="#4b3423" strokeWidth={60} strokeLinejoin="round" />
      {room.walls.map((w) => {
        const mid = onWall(w, w.lengthMm / 2, -320);
        // Along the wall, kept upright (SVG y points down, hence the minus).
        let deg = (Math.atan2(-w.dir.y, w.dir.x) * 180) / Math.PI;
        if (deg > 90) deg -= 180;
        if (deg < -90) deg += 180;
        return (
          <text key={w.id} x={mid.x} y={-mid.y} fontSize={180} textAnchor="middle" dominantBaseline="middle" fill="#4b3423" transform={`rotate(${deg} ${mid.x} ${-mid.y})`}>
            {(w.id && document.room.walls.find((d) => d.id === w.id)?.label) || w.id} · {fmt(w.lengthMm)}
          </text>
        );
      })}
      {document.room.openings.map((o) => {
        const w = wallById.get(o.wallId);
        if (!w) return null;
        const a = onWall(w, o.offsetMm, 0);
        const b = onWall(w, o.offsetMm + o.widthMm, 0);
        return <line key={o.id} x1={a.x} y1={-a.y} x2={b.x} y2={-b.y} stroke="#f7f2e8" strokeWidth={90} data-opening={o.kind} />;
      })}
      {document.fixtures.map((f) => {
        const p = f.params as Record<string, unknown>;
        const width = num(p.widthMm ?? p.lengthMm, 600);
        const depth = num(p.depthMm, 600);
        let corners: { x: number; y: number }[];
        if (f.placement.mode === "wall") {
          const w = wallById.get(f.placement.wallId);
          if (!w) return null;
          const o = f.placement.offsetMm;
          corners = [onWall(w, o, 0), onWall(w, o + width, 0), onWall(w, o + width, depth), onWall(w, o, depth)];
        } else {
          const { xMm, yMm, rotationDeg } = f.placement;
          const r = (rotationDeg * Math.PI) / 180;
          const c = Math.cos(r);
          const s = Math.sin(r);
          corners = [[0, 0], [width, 0], [width, depth], [0, depth]].map(([u, v]) => ({ x: xMm + u * c - v * s, y: yMm + u * s + v * c }));
        }
        const cx = corners.reduce((a, q) => a + q.x, 0) / 4;
        const cy = corners.reduce((a, q) => a + q.y, 0) / 4;
        const on = lit.has(f.id);
        return (
          <g key={f.id} data-fixture={f.id}>
            <polygon points={corners.map(pt).join(" ")} fill={on ? "#fdf0cf" : "#e2d6c8"} stroke={on ? "#d99a1e" : "#7a5a3e"} strokeWidth={on ? 60 : 25} />
            <text x={cx} y={-cy} fontSize={140} textAnchor="middle" dominantBaseline="middle" fill="#2a1c12">
              {f.label || f.kind}
            </text>
          </g>
        );
      })}
    </svg>
  );
}
