"use client";

import dynamic from "next/dynamic";
import { DrawingSvg } from "@/components/drawings/DrawingSvg";
import type { PlanDrawings } from "@/lib/engine/drawings/plan-drawings";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import type { Step } from "./steps";

// The 3D room is WebGL: client only, loaded when a 3D step is first shown.
const RoomPreview = dynamic(() => import("@/scene/RoomPreview"), { ssr: false, loading: () => <p className="p-6 text-walnut-500">Loading the 3D view…</p> });

/**
 * What a step shows: the engine's plan view, one wall's elevation, or the 3D room from the step's
 * saved view, with its fixtures and zones highlighted. `drawings` are made on the server.
 */
export function StepStage({ document, drawings, step }: { document: PlanDocument; drawings: PlanDrawings | null; step: Step }) {
  const lit = [...step.highlight.fixtureIds, ...step.highlight.zoneIds];
  if (step.view === "elevation" || step.view === "plan") {
    const wallId = step.wallId ?? document.room.walls[0]?.id;
    const drawing = step.view === "plan" ? drawings?.plan : (drawings?.elevations.find((d) => d.wallId === wallId) ?? drawings?.elevations[0]);
    if (!drawing) return <p className="p-6 text-brick-700">This view could not be drawn: the plan&apos;s room measurements do not close.</p>;
    return (
      <div className="flex h-full items-center justify-center overflow-auto bg-white p-4">
        {/* Zones show only where the step picks them out. */}
        <DrawingSvg drawing={drawing} highlight={lit} showKeepClear={false} className="h-full max-h-full w-full max-w-6xl" />
      </div>
    );
  }
  return <RoomPreview document={document} camera={step.camera} highlight={step.highlight.fixtureIds} />;
}
