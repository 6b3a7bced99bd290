"use client";
import { useState } from "react";
import { nextFreeOffset, placeFixture } from "@/lib/client/commands/place";
import { useEditor } from "@/lib/client/react/EditorContext";
import { useDoc, useUi } from "@/lib/client/react/useEditorState";
import { createPlacing } from "@/lib/client/tools/placing";
import { KindIcon } from "./icons";
import { LengthInput } from "./LengthInput";

const selectCls = "mt-0.5 w-full rounded border border-walnut-300 bg-white px-2 py-1 text-sm focus-visible:outline-none focus-visible:ring-2 focus-visible:ring-amberline-500";

/** The fixture kinds: pick one, then click a wall in the view; or place it at a typed spot. */
export function Catalogue() {
  const ed = useEditor();
  const kinds = ed.engine.kinds();
  const placing = useUi((s) => s.placingKind);
  const walls = useDoc((d) => d.room.walls);
  const fixtures = useDoc((d) => d.fixtures);
  const [kind, setKind] = useState(kinds[0]?.kind ?? "");
  const [wallId, setWallId] = useState(walls[0]?.id ?? "");
  const [offset, setOffset] = useState<number | null>(null);
  const wall = walls.find((w) => w.id === wallId) ? wallId : (walls[0]?.id ?? "");
  // The spot after the last fixture on the wall, until the user types another (recomputed as fixtures change).
  const free = fixtures && wall ? nextFreeOffset(ed, wall) : 0;
  const at = offset ?? free;
  return (
    <section aria-labelledby="catalogue-h" className="flex flex-col gap-2">
      <h2 id="catalogue-h" className="text-sm font-semibold text-walnut-900">
        Catalogue
      </h2>
      <p className="text-xs text-walnut-500">Choose a fixture, then click a wall (or the floor) in the view. Shift keeps placing; Esc stops.</p>
      <ul className="grid grid-cols-2 gap-1">
        {kinds.map((k) => (
          <li key={k.kind}>
            <button
              type="button"
              aria-pressed={placing === k.kind}
              title={k.blurb}
              data-kind={k.kind}
              className="flex w-full flex-col items-center gap-1 rounded border border-walnut-100 bg-white p-2 text-xs text-walnut-900 hover:border-walnut-300 focus-visible:outline-none focus-visible:ring-2 focus-visible:ring-amberline-500 aria-pressed:border-walnut-700 aria-pressed:bg-walnut-50"
              onClick={() => ed.tools.go(createPlacing(k.kind))}
            >
              <KindIcon kind={k.kind} />
              {k.title}
            </button>
          </li>
        ))}
      </ul>
      <fieldset className="rounded border border-walnut-100 p-2">
        <legend className="px-1 text-xs font-semibold text-walnut-700">Place at a typed spot</legend>
        <div className="grid grid-cols-2 gap-2">
          <div>
            <label htmlFor="place-kind" className="block text-xs font-medium text-walnut-700">
              Fixture
            </label>
            <select id="place-kind" className={selectCls} value={kind} onChange={(e) => setKind(e.target.value)}>
              {kinds.map((k) => (
                <option key={k.kind} value={k.kind}>
                  {k.title}
                </option>
              ))}
            </select>
          </div>
          <div>
            <label htmlFor="place-wall" className="block text-xs font-medium text-walnut-700">
              Wall
            </label>
            <select
              id="place-wall"
              className={selectCls}
              value={wall}
              onChange={(e) => {
                setWallId(e.target.value);
                setOffset(null);
              }}
            >
              {walls.map((w, i) => (
                <option key={w.id} value={w.id}>
                  Wall {i + 1}
                  {w.label ? ` (${w.label})` : ""}
                </option>
              ))}
            </select>
          </div>
          <LengthInput label="From wall start" valueMm={at} allowZero testId="place-offset" onCommit={setOffset} />
          <button
            type="button"
            className="mt-4 h-8 rounded bg-walnut-700 px-3 text-sm font-medium text-paper hover:bg-walnut-900 focus-visible:outline-none focus-visible:ring-2 focus-visible:ring-amberline-500"
            onClick={() => {
              placeFixture(ed, kind, { mode: "wall", wallId: wall, offsetMm: at, elevationMm: 0 });
              setOffset(null);
            }}
          >
            Add
          </button>
        </div>
      </fieldset>
    </section>
  );
}
