"use client";
import { chooseTrackSide, sawStations } from "@/lib/engine/fixtures/stop-track/attach";
import { stopTrackParamsSchema } from "@/lib/engine/fixtures/stop-track/params";
import { stopTable, trackStartMm } from "@/lib/engine/fixtures/stop-track/stop-table";
import type { FixtureDoc } from "@/lib/engine/plan/schema";
import { useEditor } from "@/lib/client/react/EditorContext";
import { useDerived, useDoc } from "@/lib/client/react/useEditorState";
import { setParams } from "@/lib/client/store/fixture-ops";
import { LengthInput } from "./LengthInput";

const selectCls = "mt-0.5 w-full rounded border border-walnut-300 bg-white px-2 py-1 text-sm focus-visible:outline-none focus-visible:ring-2 focus-visible:ring-amberline-500";
const labelCls = "block text-xs font-medium text-walnut-700";

/** Fields of a stop track the properties panel shows itself (the rest come from its schema). */
export const TRACK_MOUNT_FIELDS = ["sawId", "side", "startFromBladeMm"] as const;

/** A stop track's saw, side of the blade and start, and where the engine put it, with its stop table. */
export function TrackMount({ fixture }: { fixture: FixtureDoc }) {
  const ed = useEditor();
  const fixtures = useDoc((d) => d.fixtures);
  const saws = sawStations({ ...ed.doc, fixtures });
  const placed = useDerived((s) => s.fixtureById.get(fixture.id));
  const settings = useDoc((d) => d.settings);
  const parsed = stopTrackParamsSchema.safeParse(fixture.params);
  if (!parsed.success) return null;
  const p = parsed.data;
  const t = placed?.track;
  const set = (next: Record<string, unknown>) => ed.edit((d) => setParams(d, fixture.id, next));
  const sawName = (id: string) => ed.placed(id)?.label ?? saws.find((s) => s.id === id)?.label ?? id;
  const f = ed.formatLength.bind(ed);
  const table = stopTable(p, settings, trackStartMm(p, placed));
  const id = fixture.id;
  return (
    <fieldset className="flex flex-col gap-2 rounded border border-walnut-100 p-2" data-testid="track-mount">
      <legend className="px-1 text-xs font-semibold text-walnut-700">On the saw</legend>
      <div>
        <label htmlFor={`${id}-saw`} className={labelCls}>
          Saw
        </label>
        <select
          id={`${id}-saw`}
          className={selectCls}
          value={p.sawId && saws.some((s) => s.id === p.sawId) ? p.sawId : ""}
          onChange={(e) => {
            const sawId = e.target.value || null;
            const derived = ed.derived.getState().derived;
            const side = sawId && derived ? chooseTrackSide(ed.doc, derived, sawId, p, p.side) : p.side;
            set({ ...fixture.params, sawId, side });
          }}
        >
          {saws.map((s) => (
            <option key={s.id} value={s.id}>
              {sawName(s.id)}
            </option>
          ))}
          <option value="">No saw (the track stays where it is)</option>
        </select>
      </div>
      <div>
        <label htmlFor={`${id}-side`} className={labelCls}>
          Side of the blade, as you face the wall
        </label>
        <select id={`${id}-side`} className={selectCls} value={p.side} onChange={(e) => set({ ...fixture.params, side: e.target.value })}>
          <option value="left">Left of the blade</option>
          <option value="right">Right of the blade</option>
        </select>
      </div>
      <LengthInput
        label="Start from the blade"
        valueMm={p.startFromBladeMm ?? null}
        allowZero
        placeholder={t?.attached ? `at the saw's bay end (${f(t.startFromBladeMm)})` : "0"}
        testId="track-start"
        onCommit={(mm) => set({ ...fixture.params, startFromBladeMm: mm })}
        onClear={() => {
          const rest = { ...fixture.params };
          delete rest.startFromBladeMm;
          set(rest);
        }}
      />
      <p className="text-xs text-walnut-700" data-testid="track-where">
        {t?.attached
          ? `On ${sawName(t.sawId!)}, ${t.side} of the blade: starts ${f(t.startFromBladeMm)} from the blade${t.counterTopMm !== undefined ? `, on the counter at ${f(t.counterTopMm)}` : ", with no counter under it"}. It follows the saw.`
          : p.sawId
            ? "Detached: its saw is no longer in the plan. Choose a saw above."
            : "Detached: choose the saw it belongs to above."}
      </p>
      {/* The stop table itself (plan crosscuts and typed lengths, with labels) is StopTrackTable, below these fields. */}
      <p className="text-xs text-walnut-500" data-testid="track-reach">
        Stops set cuts from {f(table.minCutMm)} to {f(table.maxCutMm)} from the blade.
      </p>
    </fieldset>
  );
}
