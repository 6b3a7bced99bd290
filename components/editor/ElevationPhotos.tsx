"use client";
import { useDeferredValue } from "react";
import { WallPhotos } from "@/components/sharing/WallPhotos";
import { useDoc, useUi } from "@/lib/client/react/useEditorState";

/** The reference photos of the wall shown in elevation, under the view; nothing in the other views. */
export function ElevationPhotos({ planId, canEdit }: { planId: string; canEdit: boolean }) {
  const view = useUi((s) => s.view);
  const chosen = useUi((s) => s.elevationWallId);
  // A drag in elevation changes the document each step; the photos' sketch may lag behind it.
  const doc = useDeferredValue(useDoc((d) => d));
  if (view !== "elevation") return null;
  const wallId = chosen ?? doc.room.walls[0]?.id ?? "";
  return (
    <div className="max-h-72 overflow-y-auto rounded-lg border border-walnut-100 bg-white/60 p-2" data-testid="elevation-photos">
      <WallPhotos planId={planId} document={doc} canEdit={canEdit} wallId={wallId} compact />
    </div>
  );
}
