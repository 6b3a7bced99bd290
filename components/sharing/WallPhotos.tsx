"use client";

import { useCallback, useEffect, useState, type ChangeEvent } from "react";
import { DrawingFigure } from "@/components/drawings/DrawingFigure";
import type { Drawing } from "@/lib/engine/drawings/types";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { PhotoScaler } from "./PhotoScaler";
import { deletePhoto, listPhotos, setScale, uploadPhoto, type Photo } from "./photo-api";

/**
 * Reference photos of the walls: upload (checked and cleaned by the server; location data removed),
 * scale by two points, and see the scaled photo behind the wall's elevation (the engine's drawings,
 * made on the server: `elevations`). Given `wallId` (the editor's elevation view), it shows that
 * wall's photos and leaves out its own wall choice.
 */
export function WallPhotos({ planId, document, canEdit, wallId: fixedWall, compact = false, elevations = [] }: { planId: string; document: PlanDocument; canEdit: boolean; wallId?: string; compact?: boolean; elevations?: readonly Drawing[] }) {
  const [chosenWall, setWallId] = useState(document.room.walls[0]?.id ?? "");
  const wallId = fixedWall ?? chosenWall;
  const [photos, setPhotos] = useState<Photo[]>([]);
  const [msg, setMsg] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const load = useCallback(() => listPhotos(planId).then(setPhotos).catch((e: Error) => setMsg(e.message)), [planId]);
  useEffect(() => {
    void load();
  }, [load]);

  async function onFile(e: ChangeEvent<HTMLInputElement>) {
    const file = e.target.files?.[0];
    e.target.value = "";
    if (!file) return;
    setBusy(true);
    setMsg(null);
    try {
      await uploadPhoto(planId, wallId, file);
      await load();
    } catch (err) {
      setMsg((err as Error).message);
    } finally {
      setBusy(false);
    }
  }

  const mine = photos.filter((p) => p.wallId === wallId);
  const shown = mine.find((p) => p.mmPerPx && p.url);
  const elevation = elevations.find((d) => d.wallId === wallId);
  return (
    <section aria-labelledby="photos-h" className="flex flex-col gap-3">
      {compact ? (
        <h2 id="photos-h" className="text-sm font-semibold text-walnut-900">Photos of this wall</h2>
      ) : (
        <h2 id="photos-h" className="text-lg font-semibold text-walnut-900">Wall photos</h2>
      )}
      <p className={compact ? "text-xs text-walnut-700" : "text-sm text-walnut-700"}>Photos help you trace outlets, pipes and studs. Every photo is re-encoded before anyone else sees it; its camera data and location are removed.</p>
      <div className="flex flex-wrap items-end gap-2 text-sm">
        {fixedWall === undefined && (
          <label className="flex flex-col">
            Wall
            <select value={wallId} onChange={(e) => setWallId(e.target.value)} className="rounded-md border border-walnut-300 bg-white px-2 py-1">
              {document.room.walls.map((w) => (
                <option key={w.id} value={w.id}>{w.label || w.id}</option>
              ))}
            </select>
          </label>
        )}
        {canEdit && (
          <label className="rounded-md border border-walnut-700 px-3 py-1.5">
            {busy ? "Uploading…" : "Add a photo (JPEG, PNG or WebP, up to 12 MB)"}
            <input type="file" accept="image/jpeg,image/png,image/webp" onChange={onFile} disabled={busy} className="sr-only" />
          </label>
        )}
      </div>
      {msg && <p role="alert" className="text-sm text-brick-700">{msg}</p>}
      {compact && canEdit && mine.length === 0 && <p className="text-xs text-walnut-500">No photos of this wall yet.</p>}
      {shown && !compact && elevation && (
        <DrawingFigure
          drawing={elevation}
          caption={`${elevation.wallName ?? ""} with the scaled photo behind it (its left edge at the corner on your left, its bottom at the floor)`}
          photo={{ url: shown.url!, widthMm: (shown.widthPx ?? 0) * shown.mmPerPx!, heightMm: (shown.heightPx ?? 0) * shown.mmPerPx! }}
        />
      )}
      <ul className="grid gap-4 md:grid-cols-2">
        {mine.map((p) => (
          <li key={p.id} className="rounded-lg border border-walnut-100 bg-white p-2">
            {canEdit ? (
              <PhotoScaler photo={p} unitsMm={document.settings.units === "mm"} onScale={(s) => setScale(planId, p.id, s).then(load, (e: Error) => setMsg(e.message))} />
            ) : (
              // eslint-disable-next-line @next/next/no-img-element -- presigned storage URL
              <img src={p.url ?? ""} alt="Wall photo" className="w-full rounded" />
            )}
            {canEdit && <button onClick={() => deletePhoto(planId, p.id).then(load)} className="mt-1 text-sm text-brick-700 underline">Delete</button>}
          </li>
        ))}
      </ul>
    </section>
  );
}
