"use client";

import { useState, type ReactNode } from "react";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { ElevationSketch } from "./ElevationSketch";
import { PlanSketch } from "./PlanSketch";
import { PresetNote, type PresetInfo } from "./PresetNote";
import { RoomView3D } from "./RoomView3D";

const TABS = ["Plan", "3D", "Elevations", "Checks", "Parts", "Fixtures"] as const;
type Tab = (typeof TABS)[number];

/** A plan shown read-only: views to look at, nothing to change. */
/** `checks` and `parts` are rendered on the server (the engine runs there) and passed in. */
export function SharedPlanView({ document, preset, checks, parts }: { document: PlanDocument; preset: PresetInfo | null; checks?: ReactNode; parts?: ReactNode }) {
  const [tab, setTab] = useState<Tab>("Plan");
  return (
    <div className="flex flex-col gap-3">
      <div role="tablist" aria-label="Views" className="flex flex-wrap gap-1">
        {TABS.map((t) => (
          <button key={t} role="tab" aria-selected={tab === t} onClick={() => setTab(t)} className={`rounded-md px-3 py-1.5 text-sm ${tab === t ? "bg-walnut-700 text-paper" : "bg-paper-deep text-walnut-900 hover:bg-walnut-100"}`}>
            {t}
          </button>
        ))}
      </div>
      <div role="tabpanel" aria-label={tab} className="min-h-80">
        {tab === "3D" && (
          <div className="h-[60vh] min-h-80 overflow-hidden rounded-lg border border-walnut-100">
            <RoomView3D document={document} />
          </div>
        )}
        {tab === "Plan" && (
          <div className="h-[60vh] min-h-80 rounded-lg border border-walnut-100 bg-white p-2">
            <PlanSketch document={document} />
          </div>
        )}
        {tab === "Elevations" && (
          <div className="grid gap-4 md:grid-cols-2">
            {document.room.walls.map((w) => (
              <ElevationSketch key={w.id} document={document} wallId={w.id} />
            ))}
          </div>
        )}
        {tab === "Checks" && (
          <div className="flex flex-col gap-3">
            <PresetNote preset={preset} document={document} />
            {checks}
          </div>
        )}
        {tab === "Parts" && parts}
        {tab === "Fixtures" && (
          <table className="w-full text-left text-sm">
            <thead>
              <tr className="border-b border-walnut-100 text-walnut-500">
                <th className="py-1">Fixture</th>
                <th>Kind</th>
                <th>Where</th>
              </tr>
            </thead>
            <tbody>
              {document.fixtures.map((f) => (
                <tr key={f.id} className="border-b border-walnut-50">
                  <td className="py-1">{f.label || f.id}</td>
                  <td>{f.kind}</td>
                  <td>{f.placement.mode === "wall" ? `against ${document.room.walls.find((w) => w.id === (f.placement as { wallId: string }).wallId)?.label || "a wall"}` : "free-standing"}</td>
                </tr>
              ))}
              {!document.fixtures.length && (
                <tr>
                  <td colSpan={3} className="py-2 text-walnut-500">No fixtures placed yet.</td>
                </tr>
              )}
            </tbody>
          </table>
        )}
      </div>
    </div>
  );
}
