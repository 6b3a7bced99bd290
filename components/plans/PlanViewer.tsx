"use client";

import dynamic from "next/dynamic";
import type { PlanDocument } from "@/lib/engine/plan/schema";

const RoomPreview = dynamic(() => import("@/scene/RoomPreview"), { ssr: false, loading: () => <p className="p-6 text-walnut-500">Loading the 3D view…</p> });

export function PlanViewer({ name, document }: { name: string; document: PlanDocument }) {
  return (
    <div className="mx-auto flex max-w-6xl flex-col gap-4 px-4 py-6">
      <h1 className="text-2xl font-semibold text-walnut-900">{name}</h1>
      <div className="h-[60vh] min-h-80 w-full overflow-hidden rounded-lg border border-walnut-100">
        <RoomPreview document={document} />
      </div>
    </div>
  );
}
