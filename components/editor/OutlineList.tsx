"use client";
import { useEditor } from "@/lib/client/react/EditorContext";
import { useDoc, useUi } from "@/lib/client/react/useEditorState";

/**
 * The plan as a list: each wall with its fixtures in order along it, then free fixtures. Screen
 * reader users (and anyone) select fixtures here; the arrow keys then nudge them.
 */
export function OutlineList() {
  const ed = useEditor();
  const walls = useDoc((d) => d.room.walls);
  const fixtures = useDoc((d) => d.fixtures);
  const selection = useUi((s) => s.selection);
  const title = (kind: string) => ed.engine.kinds().find((k) => k.kind === kind)?.title ?? kind;
  const item = (id: string, text: string) => (
    <li key={id}>
      <button
        type="button"
        aria-pressed={selection.includes(id)}
        data-testid="outline-item"
        className="w-full rounded px-1 py-0.5 text-left text-xs hover:bg-walnut-50 focus-visible:outline-none focus-visible:ring-2 focus-visible:ring-amberline-500 aria-pressed:bg-walnut-700 aria-pressed:text-paper"
        onClick={(e) => (e.shiftKey || e.metaKey || e.ctrlKey ? ed.toggleSelected(id) : ed.select([id]))}
      >
        {text}
      </button>
    </li>
  );
  const free = fixtures.filter((f) => f.placement.mode === "free");
  return (
    <nav aria-label="Plan outline">
      <h2 className="text-sm font-semibold text-walnut-900">Outline</h2>
      <ul className="flex flex-col gap-1">
        {walls.map((w, i) => {
          const on = fixtures
            .filter((f) => f.placement.mode === "wall" && f.placement.wallId === w.id)
            .sort((a, b) => (a.placement.mode === "wall" && b.placement.mode === "wall" ? a.placement.offsetMm - b.placement.offsetMm : 0));
          return (
            <li key={w.id}>
              <span className="text-xs font-medium text-walnut-700">
                Wall {i + 1}
                {w.label ? ` (${w.label})` : ""}, {ed.formatLength(w.lengthMm)}
              </span>
              {on.length ? (
                <ul className="ml-2">{on.map((f) => item(f.id, `${f.label || title(f.kind)} at ${ed.formatLength(f.placement.mode === "wall" ? f.placement.offsetMm : 0)}`))}</ul>
              ) : (
                <p className="ml-2 text-[11px] text-walnut-500">Nothing against it.</p>
              )}
            </li>
          );
        })}
        {free.length ? (
          <li>
            <span className="text-xs font-medium text-walnut-700">Free in the room</span>
            <ul className="ml-2">{free.map((f) => item(f.id, f.label || title(f.kind)))}</ul>
          </li>
        ) : null}
      </ul>
    </nav>
  );
}
