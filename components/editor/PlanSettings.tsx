"use client";
import { PresetPicker } from "@/components/teaching/PresetPicker";
import type { Units } from "@/lib/engine/plan/schema";
import { useEditor } from "@/lib/client/react/EditorContext";
import { useDoc, useUi } from "@/lib/client/react/useEditorState";
import { setSettings } from "@/lib/client/store/room-ops";
import { CounterHeightField } from "./CounterHeightField";

const unitChoices: { value: Units; text: string }[] = [
  { value: "in", text: "Inches and fractions" },
  { value: "ft-in", text: "Feet and inches" },
  { value: "mm", text: "Millimetres" },
];

/**
 * The plan's settings in the editor: units (labels, typing and the grid steps follow them), fraction
 * precision, the counter height, and the class preset whose numbers the checks use. Every choice is an edit of the
 * document, saved by the autosave with its version like any other edit.
 */
export function PlanSettings({ planId, canEdit }: { planId: string; canEdit: boolean }) {
  const ed = useEditor();
  const units = useDoc((d) => d.settings.units);
  const precision = useDoc((d) => d.settings.precision);
  const presetId = useDoc((d) => d.settings.presetId);
  const presetName = useUi((s) => s.presetName);
  const field = "mt-0.5 w-full rounded border border-walnut-300 bg-white px-2 py-1 text-sm focus-visible:outline-none focus-visible:ring-2 focus-visible:ring-amberline-500";
  return (
    <details className="rounded border border-walnut-100 bg-white/60 p-2" data-testid="plan-settings">
      <summary className="cursor-pointer text-sm font-semibold text-walnut-900">Plan settings{presetName ? `: ${presetName}` : ""}</summary>
      <div className="mt-2 flex flex-col gap-3">
        <div className="grid grid-cols-2 gap-2">
          <label className="text-xs font-medium text-walnut-700">
            Units
            <select className={field} value={units} disabled={!canEdit} onChange={(e) => ed.edit((d) => setSettings(d, { units: e.target.value as Units }))}>
              {unitChoices.map((u) => (
                <option key={u.value} value={u.value}>
                  {u.text}
                </option>
              ))}
            </select>
          </label>
          <label className="text-xs font-medium text-walnut-700">
            Fractions to
            <select className={field} value={precision} disabled={!canEdit || units === "mm"} onChange={(e) => ed.edit((d) => setSettings(d, { precision: Number(e.target.value) === 32 ? 32 : 16 }))}>
              <option value={16}>1/16 in</option>
              <option value={32}>1/32 in</option>
            </select>
          </label>
        </div>
        <CounterHeightField canEdit={canEdit} />
        <PresetPicker
          planId={planId}
          canEdit={canEdit}
          headingLevel={3}
          value={presetId}
          onAdopt={(id) => {
            if (id !== ed.doc.settings.presetId) ed.edit((d) => setSettings(d, { presetId: id }));
          }}
        />
        {presetName ? <p className="text-xs text-walnut-700" data-testid="preset-in-force">The checks use the numbers of “{presetName}”.</p> : null}
      </div>
    </details>
  );
}
