"use client";
import { useEditor } from "@/lib/client/react/EditorContext";
import { useDerived, useDoc } from "@/lib/client/react/useEditorState";
import { newId } from "@/lib/client/store/ids";
import { addWall, removeWall, setCeilingHeight, setDiagonal, setWallLabel, setWallLength } from "@/lib/client/store/room-ops";
import { LengthInput } from "./LengthInput";
import { RoomItems } from "./RoomItems";
import { SquarenessReport } from "./SquarenessReport";

/** Pairs of corners a diagonal can join (not neighbours), for rooms up to six walls. */
function diagonalPairs(n: number): [number, number][] {
  const out: [number, number][] = [];
  if (n > 6) return out;
  for (let i = 0; i < n; i++) for (let j = i + 2; j < n; j++) if (!(i === 0 && j === n - 1)) out.push([i, j]);
  return out;
}

/** The room as measured: wall lengths, optional diagonals, ceiling height; then openings and obstacles. */
export function RoomForm() {
  const ed = useEditor();
  const walls = useDoc((d) => d.room.walls);
  const diagonals = useDoc((d) => d.room.diagonals);
  const ceiling = useDoc((d) => d.room.ceilingHeightMm);
  const error = useDerived((s) => s.error);
  const letter = (i: number) => String.fromCharCode(65 + i);
  return (
    <div className="flex flex-col gap-4">
      <section aria-labelledby="walls-h">
        <h2 id="walls-h" className="text-sm font-semibold text-walnut-900">
          Walls, as measured
        </h2>
        <p className="mb-2 text-xs text-walnut-500">Go round the room counter-clockwise from the corner where wall 1 starts (corner A). Type lengths as you read them off the tape.</p>
        <ol className="flex flex-col gap-2">
          {walls.map((w, i) => (
            <li key={w.id} className="grid grid-cols-[1fr_1fr_auto] items-start gap-2">
              <LengthInput label={`Wall ${i + 1} (${letter(i)} to ${letter((i + 1) % walls.length)})`} valueMm={w.lengthMm} testId={`wall-length-${i + 1}`} onCommit={(mm) => ed.edit((d) => setWallLength(d, w.id, mm))} />
              <div>
                <label className="block text-xs font-medium text-walnut-700" htmlFor={`wall-label-${w.id}`}>
                  Name
                </label>
                <input
                  id={`wall-label-${w.id}`}
                  className="mt-0.5 w-full rounded border border-walnut-300 bg-white px-2 py-1 text-sm focus-visible:outline-none focus-visible:ring-2 focus-visible:ring-amberline-500"
                  defaultValue={w.label}
                  key={w.label}
                  onBlur={(e) => e.target.value !== w.label && ed.edit((d) => setWallLabel(d, w.id, e.target.value.slice(0, 60)))}
                />
              </div>
              <button type="button" className="mt-5 rounded px-1 text-xs text-brick-700 underline disabled:opacity-40" disabled={walls.length <= 3} aria-label={`Remove wall ${i + 1}`} onClick={() => ed.edit((d) => removeWall(d, w.id))}>
                Remove
              </button>
            </li>
          ))}
        </ol>
        <button type="button" className="mt-1 text-xs text-walnut-700 underline" onClick={() => ed.edit((d) => addWall(d, newId("w"), 1000))}>
          Add a wall
        </button>
      </section>

      {diagonalPairs(walls.length).length ? (
        <section aria-labelledby="diag-h">
          <h2 id="diag-h" className="text-sm font-semibold text-walnut-900">
            Diagonals (optional)
          </h2>
          <p className="mb-2 text-xs text-walnut-500">Corner to corner across the floor. With them the room&apos;s true shape is solved; without, it is taken as square.</p>
          <div className="grid grid-cols-2 gap-2">
            {diagonalPairs(walls.length).map(([a, b]) => {
              const d = diagonals.find((x) => (x.from === a && x.to === b) || (x.from === b && x.to === a));
              return (
                <LengthInput
                  key={`${a}-${b}`}
                  label={`${letter(a)} to ${letter(b)}`}
                  valueMm={d?.lengthMm ?? null}
                  placeholder="not measured"
                  testId={`diagonal-${letter(a)}${letter(b)}`}
                  onCommit={(mm) => ed.edit((doc) => setDiagonal(doc, a, b, mm))}
                  onClear={() => ed.edit((doc) => setDiagonal(doc, a, b, null))}
                />
              );
            })}
          </div>
        </section>
      ) : null}

      <LengthInput label="Ceiling height" valueMm={ceiling} testId="ceiling-height" onCommit={(mm) => ed.edit((d) => setCeilingHeight(d, mm))} />
      {error ? (
        <p role="alert" className="rounded border border-brick-500 bg-brick-100 p-2 text-xs text-brick-700">
          The room cannot be solved from these measurements: {error}
        </p>
      ) : null}
      <SquarenessReport />
      <RoomItems />
    </div>
  );
}
