"use client";

import dynamic from "next/dynamic";
import type { PlanDocument } from "@/lib/engine/plan/schema";

const RoomPreview = dynamic(() => import("@/scene/RoomPreview"), { ssr: false, loading: () => <p className="p-6 text-walnut-500">Loading the 3D view…</p> });

/** The 3D look at a plan, client-only (WebGL). */
export function RoomView3D({ document }: { document: PlanDocument }) {
  return <RoomPreview document={document} />;
}
