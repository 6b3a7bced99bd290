"use client";

import dynamic from "next/dynamic";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { ElevationSketch } from "@/components/sharing/ElevationSketch";
import { PlanSketch } from "@/components/sharing/PlanSketch";
import type { Step } from "./steps";

// The 3D room is WebGL: client only, loaded when a 3D step is first shown.
const RoomPreview = dynamic(() => import("@/scene/RoomPreview"), { ssr: false, loading: () => <p className="p-6 text-walnut-500">Loading the 3D view…</p> });

/** What a step shows: the plan, one wall's elevation, or the 3D room from the step's saved view, with its fixtures highlighted. */
export function StepStage({ document, step }: { document: PlanDocument; step: Step }) {
  const lit = [...step.highlight.fixtureIds, ...step.highlight.zoneIds];
  if (step.view === "elevation") {
    const wallId = step.wallId ?? document.room.walls[0]?.id;
    return (
      <div className="flex h-full items-center justify-center bg-white p-4">
        <div className="w-full max-w-5xl">
          <ElevationSketch document={document} wallId={wallId} highlight={lit} />
        </div>
      </div>
    );
  }
  if (step.view === "plan") return <PlanSketch document={document} highlight={lit} className="bg-white" />;
  return <RoomPreview document={document} camera={step.camera} />;
}
