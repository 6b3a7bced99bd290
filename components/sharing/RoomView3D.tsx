"use client";

import dynamic from "next/dynamic";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import type { ReadOnlyPreset } from "@/scene/useReadOnlyEditor";

const RoomPreview = dynamic(() => import("@/scene/RoomPreview"), { ssr: false, loading: () => <p className="p-6 text-walnut-500">Loading the 3D view…</p> });

/** The 3D look at a plan, client-only (WebGL): the editor's layers, read-only, with the page's preset. */
export function RoomView3D({ document, preset = null }: { document: PlanDocument; preset?: ReadOnlyPreset | null }) {
  return <RoomPreview document={document} preset={preset} />;
}
