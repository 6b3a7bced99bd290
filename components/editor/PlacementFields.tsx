"use client";
import type { FixtureDoc, Placement } from "@/lib/engine/plan/schema";
import { movePlacement } from "@/lib/client/commands/place";
import { useEditor } from "@/lib/client/react/EditorContext";
import { useDoc } from "@/lib/client/react/useEditorState";
import { LengthInput } from "./LengthInput";

const selectCls = "mt-0.5 w-full rounded border border-walnut-300 bg-white px-2 py-1 text-sm focus-visible:outline-none focus-visible:ring-2 focus-visible:ring-amberline-500";

/** Where a fixture stands, typed exactly: wall and offset from its start, or free position and turn. */
export function FixturePlacement({ fixture }: { fixture: FixtureDoc }) {
  const ed = useEditor();
  const walls = useDoc((d) => d.room.walls);
  const p = fixture.placement;
  const set = (next: Placement) => movePlacement(ed, fixture.id, next);
  return (
    <fieldset className="grid grid-cols-2 gap-2 rounded border border-walnut-100 p-2">
      <legend className="px-1 text-xs font-semibold text-walnut-700">Position</legend>
      <div className="col-span-2">
        <label htmlFor={`${fixture.id}-where`} className="block text-xs font-medium text-walnut-700">
          Stands
        </label>
        <select
          id={`${fixture.id}-where`}
          className={selectCls}
          value={p.mode === "wall" ? p.wallId : ""}
          onChange={(e) => {
            const v = e.target.value;
            const placed = ed.placed(fixture.id);
            set(v ? { mode: "wall", wallId: v, offsetMm: 0, elevationMm: p.elevationMm } : { mode: "free", xMm: placed?.origin.x ?? 1000, yMm: placed?.origin.y ?? 1000, rotationDeg: placed ? (placed.rotation * 180) / Math.PI : 0, elevationMm: p.elevationMm });
          }}
        >
          {walls.map((w, i) => (
            <option key={w.id} value={w.id}>
              Against wall {i + 1}
              {w.label ? ` (${w.label})` : ""}
            </option>
          ))}
          <option value="">Free in the room</option>
        </select>
      </div>
      {p.mode === "wall" ? (
        <LengthInput label="From wall start" valueMm={p.offsetMm} allowZero allowNegative testId="fixture-offset" onCommit={(mm) => set({ ...p, offsetMm: mm })} />
      ) : (
        <>
          <LengthInput label="x" valueMm={p.xMm} allowZero allowNegative onCommit={(mm) => set({ ...p, xMm: mm })} />
          <LengthInput label="y" valueMm={p.yMm} allowZero allowNegative onCommit={(mm) => set({ ...p, yMm: mm })} />
          <div>
            <label htmlFor={`${fixture.id}-rot`} className="block text-xs font-medium text-walnut-700">
              Turn (degrees)
            </label>
            <input
              id={`${fixture.id}-rot`}
              type="number"
              step={15}
              key={p.rotationDeg}
              defaultValue={p.rotationDeg}
              className={selectCls}
              onBlur={(e) => Number.isFinite(e.target.valueAsNumber) && e.target.valueAsNumber !== p.rotationDeg && set({ ...p, rotationDeg: e.target.valueAsNumber })}
            />
          </div>
        </>
      )}
      <LengthInput label="Raised off the floor" valueMm={p.elevationMm} allowZero onCommit={(mm) => set({ ...p, elevationMm: mm })} />
    </fieldset>
  );
}
