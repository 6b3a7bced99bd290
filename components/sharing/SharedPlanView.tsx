"use client";

import { useState, type ReactNode } from "react";
import { DrawingFigure } from "@/components/drawings/DrawingFigure";
import type { PlanDrawings } from "@/lib/engine/drawings/plan-drawings";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { PresetNote, type PresetInfo } from "./PresetNote";
import { RoomView3D } from "./RoomView3D";

const TABS = ["Plan", "3D", "Elevations", "Checks", "Parts", "Fixtures"] as const;
type Tab = (typeof TABS)[number];

const NO_DRAWINGS = <p className="p-4 text-sm text-brick-700">The drawings could not be made from this plan: its room measurements do not close.</p>;

interface Props {
  document: PlanDocument;
  preset: PresetInfo | null;
  /** The engine's plan view and wall elevations, made on the server; null when the room cannot be solved. */
  drawings: PlanDrawings | null;
  /** Each fixture kind's name in words, by kind id. */
  kindNames: Record<string, string>;
  checks?: ReactNode;
  parts?: ReactNode;
}

/**
 * A plan shown read-only: views to look at, nothing to change. `drawings`, `checks` and `parts`
 * are made on the server (the engine runs there) and passed in.
 */
export function SharedPlanView({ document, preset, drawings, kindNames, checks, parts }: Props) {
  const [tab, setTab] = useState<Tab>("Plan");
  const [keepClear, setKeepClear] = useState(true);
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
            <RoomView3D document={document} preset={preset ? { name: preset.name, numbers: preset.numbers } : null} />
          </div>
        )}
        {tab === "Plan" &&
          (drawings ? (
            <div className="flex flex-col gap-2">
              <label className="flex items-center gap-2 self-start text-sm text-walnut-900">
                <input type="checkbox" checked={keepClear} onChange={(e) => setKeepClear(e.target.checked)} />
                Show keep-clear zones
              </label>
              <DrawingFigure drawing={drawings.plan} showKeepClear={keepClear} />
            </div>
          ) : (
            NO_DRAWINGS
          ))}
        {tab === "Elevations" &&
          (drawings ? (
            <div className="flex flex-col gap-6">
              {drawings.elevations.map((d) => (
                <DrawingFigure key={d.wallId} drawing={d} caption={`${d.wallName ?? d.title}, seen from inside the room`} />
              ))}
            </div>
          ) : (
            NO_DRAWINGS
          ))}
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
                  <td className="py-1">{f.label || kindNames[f.kind] || "Fixture"}</td>
                  <td>{kindNames[f.kind] ?? "Unknown kind"}</td>
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
