"use client";
import { counterHeightSuggestion } from "@/lib/engine/ergonomics/counter-suggestion";
import { elbowHeight } from "@/lib/engine/ergonomics/elbow";
import { useEditor } from "@/lib/client/react/EditorContext";
import { useDoc } from "@/lib/client/react/useEditorState";
import { setSettings } from "@/lib/client/store/room-ops";
import { LengthInput } from "./LengthInput";

/** Rounding step of the suggested counter height: 1/4 in for inch plans, 5 mm for metric ones. */
const stepMm = (units: string) => (units === "mm" ? 5 : 6.35);

/**
 * The plan's counter height (base cabinets and workbenches follow it) with what it means for the
 * person's elbow: the light and heavy work ranges with numbers, and a height to try.
 */
export function CounterHeightField({ canEdit }: { canEdit: boolean }) {
  const ed = useEditor();
  const settings = useDoc((d) => d.settings);
  const len = (mm: number) => ed.engine.formatLength(mm, settings);
  const s = counterHeightSuggestion(settings.counterHeightMm, elbowHeight(settings), len, stepMm(settings.units));
  const far = Math.abs(s.suggestedMm - settings.counterHeightMm) > 0.5;
  return (
    <div data-testid="counter-height">
      {canEdit ? (
        <LengthInput label="Counter height (floor to the top)" valueMm={settings.counterHeightMm} testId="setting-counterHeightMm" onCommit={(mm) => ed.edit((d) => setSettings(d, { counterHeightMm: mm }))} />
      ) : (
        <p className="text-xs font-medium text-walnut-700">Counter height: {len(settings.counterHeightMm)}</p>
      )}
      <p className="text-[11px] text-walnut-700" data-testid="counter-height-verdict">
        {s.verdict} {s.ranges}
      </p>
      {far && canEdit ? (
        <button type="button" className="mt-1 text-xs text-walnut-800 underline" onClick={() => ed.edit((d) => setSettings(d, { counterHeightMm: s.suggestedMm }))}>
          Use {len(s.suggestedMm)} (suits light work)
        </button>
      ) : null}
      <p className="text-[11px] text-walnut-500">Base cabinets and workbenches follow it unless one has its own height; tool shelves follow the counters beside them.</p>
    </div>
  );
}
