"use client";
import type { Obstacle, Opening, Placement } from "@/lib/engine/plan/schema";
import { useEditor } from "@/lib/client/react/EditorContext";
import { useDoc } from "@/lib/client/react/useEditorState";
import { addObstacle, addOpening, removeObstacle, removeOpening, updateObstacle, updateOpening } from "@/lib/client/store/room-ops";
import { LengthInput } from "./LengthInput";
import { newObstacle, newOpening, obstacleTitles, obstacleVariant, openingTitles, openingVariant } from "./room-item-defaults";
import { SchemaForm } from "./SchemaForm";

const HIDE_OPENING = ["id", "kind", "wallId"];
const HIDE_OBSTACLE = ["id", "kind", "placement"];
const selectCls = "mt-0.5 w-full rounded border border-walnut-300 bg-white px-2 py-1 text-sm focus-visible:outline-none focus-visible:ring-2 focus-visible:ring-amberline-500";

function WallSelect({ id, value, onChange, allowFree }: { id: string; value: string; onChange(v: string): void; allowFree?: boolean }) {
  const walls = useDoc((d) => d.room.walls);
  return (
    <div>
      <label htmlFor={id} className="block text-xs font-medium text-walnut-700">
        Where
      </label>
      <select id={id} className={selectCls} value={value} onChange={(e) => onChange(e.target.value)}>
        {walls.map((w, i) => (
          <option key={w.id} value={w.id}>
            Wall {i + 1}
            {w.label ? ` (${w.label})` : ""}
          </option>
        ))}
        {allowFree ? <option value="">Free on the floor</option> : null}
      </select>
    </div>
  );
}

function PlacementFields({ ob, onChange }: { ob: Obstacle; onChange(p: Placement): void }) {
  const p = ob.placement;
  const firstWall = useDoc((d) => d.room.walls[0].id);
  return (
    <div className="grid grid-cols-2 gap-2">
      <WallSelect id={`${ob.id}-where`} value={p.mode === "wall" ? p.wallId : ""} allowFree onChange={(v) => onChange(v ? { mode: "wall", wallId: v || firstWall, offsetMm: p.mode === "wall" ? p.offsetMm : 300, elevationMm: p.elevationMm } : { mode: "free", xMm: 1000, yMm: 1000, rotationDeg: 0, elevationMm: 0 })} />
      {p.mode === "wall" ? (
        <LengthInput label="From wall start" valueMm={p.offsetMm} allowZero onCommit={(mm) => onChange({ ...p, offsetMm: mm })} />
      ) : (
        <>
          <LengthInput label="Across (x)" valueMm={p.xMm} allowZero allowNegative onCommit={(mm) => onChange({ ...p, xMm: mm })} />
          <LengthInput label="Along (y)" valueMm={p.yMm} allowZero allowNegative onCommit={(mm) => onChange({ ...p, yMm: mm })} />
        </>
      )}
    </div>
  );
}

/** Openings (doors, windows) and obstacles (panel, water heater, post, outlet, parking bay). */
export function RoomItems() {
  const ed = useEditor();
  const openings = useDoc((d) => d.room.openings);
  const obstacles = useDoc((d) => d.room.obstacles);
  const btn = "rounded border border-walnut-300 px-2 py-0.5 text-xs text-walnut-700 hover:bg-walnut-50 focus-visible:outline-none focus-visible:ring-2 focus-visible:ring-amberline-500";
  return (
    <>
      <section aria-labelledby="openings-h">
        <h2 id="openings-h" className="text-sm font-semibold text-walnut-900">
          Openings
        </h2>
        <div className="my-1 flex flex-wrap gap-1">
          {(Object.keys(openingTitles) as Opening["kind"][]).map((k) => (
            <button key={k} type="button" className={btn} onClick={() => ed.edit((d) => addOpening(d, newOpening(k, d)))}>
              Add {openingTitles[k].toLowerCase()}
            </button>
          ))}
        </div>
        {openings.map((o) => (
          <details key={o.id} className="mb-1 rounded border border-walnut-100 bg-white/60 p-2" open>
            <summary className="cursor-pointer text-xs font-semibold">{openingTitles[o.kind]}</summary>
            <WallSelect id={`${o.id}-wall`} value={o.wallId} onChange={(v) => ed.edit((d) => updateOpening(d, o.id, { ...o, wallId: v }))} />
            <SchemaForm idPrefix={o.id} schema={openingVariant(o.kind)} value={o} hide={HIDE_OPENING} onValid={(next) => ed.edit((d) => updateOpening(d, o.id, next as Opening))} />
            <button type="button" className="mt-1 text-xs text-brick-700 underline" onClick={() => ed.edit((d) => removeOpening(d, o.id))}>
              Remove {openingTitles[o.kind].toLowerCase()}
            </button>
          </details>
        ))}
      </section>
      <section aria-labelledby="obstacles-h">
        <h2 id="obstacles-h" className="text-sm font-semibold text-walnut-900">
          Obstacles
        </h2>
        <div className="my-1 flex flex-wrap gap-1">
          {(Object.keys(obstacleTitles) as Obstacle["kind"][]).map((k) => (
            <button key={k} type="button" className={btn} onClick={() => ed.edit((d) => addObstacle(d, newObstacle(k, d)))}>
              Add {obstacleTitles[k].toLowerCase()}
            </button>
          ))}
        </div>
        {obstacles.map((o) => (
          <details key={o.id} className="mb-1 rounded border border-walnut-100 bg-white/60 p-2" open>
            <summary className="cursor-pointer text-xs font-semibold">{obstacleTitles[o.kind]}</summary>
            {o.kind === "panel" ? <p className="text-[11px] text-amberline-700">Keep the working space in front of the panel clear (NEC 110.26). Electrical work is for a licensed electrician; follow local codes.</p> : null}
            <PlacementFields ob={o} onChange={(p) => ed.edit((d) => updateObstacle(d, o.id, { ...o, placement: p } as Obstacle))} />
            <SchemaForm idPrefix={o.id} schema={obstacleVariant(o.kind)} value={o} hide={HIDE_OBSTACLE} onValid={(next) => ed.edit((d) => updateObstacle(d, o.id, { ...(next as Obstacle), placement: o.placement }))} />
            <button type="button" className="mt-1 text-xs text-brick-700 underline" onClick={() => ed.edit((d) => removeObstacle(d, o.id))}>
              Remove {obstacleTitles[o.kind].toLowerCase()}
            </button>
          </details>
        ))}
      </section>
    </>
  );
}
