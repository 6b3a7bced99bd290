"use client";
import { run } from "@/lib/client/commands/registry";
import { useEditor } from "@/lib/client/react/EditorContext";
import { useDoc, useUi } from "@/lib/client/react/useEditorState";

const views = [
  { view: "orbit", cmd: "view-orbit", text: "3D" },
  { view: "plan", cmd: "view-plan", text: "Plan" },
  { view: "elevation", cmd: "view-elevation", text: "Elevation" },
] as const;

/** View switcher above the canvas; the elevation's wall is chosen here. */
export function ViewBar() {
  const ed = useEditor();
  const view = useUi((s) => s.view);
  const wallId = useUi((s) => s.elevationWallId);
  const walls = useDoc((d) => d.room.walls);
  const tool = useUi((s) => s.tool);
  const placing = useUi((s) => s.placingKind);
  const dims = useUi((s) => s.showDimensions);
  return (
    <div className="flex flex-wrap items-center gap-2">
      <div role="group" aria-label="View" className="inline-flex overflow-hidden rounded border border-walnut-300">
        {views.map((v) => (
          <button key={v.view} type="button" aria-pressed={view === v.view} className="px-2 py-1 text-xs focus-visible:outline-none focus-visible:ring-2 focus-visible:ring-amberline-500 aria-pressed:bg-walnut-700 aria-pressed:text-paper" onClick={() => run(ed, v.cmd)}>
            {v.text}
          </button>
        ))}
      </div>
      {view !== "orbit" ? (
        <button type="button" aria-pressed={dims} title="Show or hide dimensions (D)" className="rounded border border-walnut-300 px-2 py-1 text-xs focus-visible:outline-none focus-visible:ring-2 focus-visible:ring-amberline-500 aria-pressed:bg-walnut-700 aria-pressed:text-paper" onClick={() => run(ed, "toggle-dimensions")}>
          Dimensions
        </button>
      ) : null}
      {view === "elevation" ? (
        <label className="flex items-center gap-1 text-xs">
          <span aria-hidden="true">Wall</span>
          <select aria-label="Elevation wall" className="rounded border border-walnut-300 bg-white px-1 py-0.5" value={wallId ?? walls[0]?.id} onChange={(e) => ed.ui.setState({ elevationWallId: e.target.value })}>
            {walls.map((w, i) => (
              <option key={w.id} value={w.id}>
                {i + 1}
                {w.label ? ` ${w.label}` : ""}
              </option>
            ))}
          </select>
        </label>
      ) : null}
      <span className="text-xs text-walnut-500" aria-live="polite">
        {tool === "placing" ? `Placing ${ed.engine.kinds().find((k) => k.kind === placing)?.title ?? ""}: click a wall or the floor (Esc to stop).` : tool === "measuring" ? "Tape: click two points (Esc to stop)." : ""}
      </span>
    </div>
  );
}
