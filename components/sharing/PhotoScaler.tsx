"use client";

import { useState, type MouseEvent } from "react";
import { formatLength } from "@/lib/engine/units/format-length";
import { parseLength } from "@/lib/engine/units/parse-length";
import type { Photo } from "./photo-api";

/**
 * Mark two points on the photo whose distance is known (a door's width, a tape laid on the wall),
 * type the distance, and the photo gets its millimetres per pixel.
 */
export function PhotoScaler({ photo, unitsMm, onScale }: { photo: Photo; unitsMm: boolean; onScale: (s: NonNullable<Photo["scale"]>) => void }) {
  const [pts, setPts] = useState<{ x: number; y: number }[]>(photo.scale ? [{ x: photo.scale.ax, y: photo.scale.ay }, { x: photo.scale.bx, y: photo.scale.by }] : []);
  const units = unitsMm ? "mm" : "in";
  const [dist, setDist] = useState(photo.scale ? formatLength(photo.scale.distanceMm, { units, precision: 32, unitMark: false }) : "");
  const w = photo.widthPx ?? 1;
  const h = photo.heightPx ?? 1;

  function mark(e: MouseEvent<HTMLImageElement>) {
    const r = e.currentTarget.getBoundingClientRect();
    const p = { x: Math.round(((e.clientX - r.left) / r.width) * w), y: Math.round(((e.clientY - r.top) / r.height) * h) };
    setPts((old) => (old.length >= 2 ? [p] : [...old, p]));
  }

  // The same reading of typed lengths as everywhere else: fractions, feet and inches, metric.
  const read = dist.trim() ? parseLength(dist, { units }) : null;
  const ready = pts.length === 2 && read?.ok === true;
  return (
    <div className="flex flex-col gap-2">
      <div className="relative">
        {/* eslint-disable-next-line @next/next/no-img-element -- a short-lived presigned URL from object storage, not a static asset */}
        <img src={photo.url ?? ""} alt={`Wall photo ${photo.id.slice(0, 8)}`} onClick={mark} className="w-full cursor-crosshair rounded" />
        <svg viewBox={`0 0 ${w} ${h}`} className="pointer-events-none absolute inset-0 h-full w-full">
          {pts.length === 2 && <line x1={pts[0].x} y1={pts[0].y} x2={pts[1].x} y2={pts[1].y} stroke="#d99a1e" strokeWidth={w / 200} />}
          {pts.map((p, i) => (
            <circle key={i} cx={p.x} cy={p.y} r={w / 120} fill="#d99a1e" />
          ))}
        </svg>
      </div>
      <div className="flex flex-wrap items-end gap-2 text-sm">
        <span className="text-walnut-700">{pts.length < 2 ? `Click ${2 - pts.length} point${pts.length ? "" : "s"} a known distance apart.` : "Two points marked."}</span>
        <label className="flex flex-col">
          Distance ({unitsMm ? "mm" : "in"})
          <input value={dist} onChange={(e) => setDist(e.target.value)} aria-invalid={read?.ok === false} className="w-28 rounded-md border border-walnut-300 bg-white px-2 py-1" />
        </label>
        {read?.ok === false && <span role="alert" className="text-brick-700">{read.message}</span>}
        <button disabled={!ready} onClick={() => onScale({ ax: pts[0].x, ay: pts[0].y, bx: pts[1].x, by: pts[1].y, distanceMm: read?.ok ? read.mm : 0 })} className="rounded-md bg-walnut-700 px-3 py-1.5 font-medium text-paper disabled:opacity-40">
          Set the scale
        </button>
        {photo.mmPerPx && <span className="text-walnut-500">{photo.mmPerPx.toFixed(2)} mm per pixel</span>}
      </div>
    </div>
  );
}
