"use client";
import { getCommand, run } from "@/lib/client/commands/registry";
import { describeChord } from "@/lib/client/commands/shortcuts";
import { useEditor } from "@/lib/client/react/EditorContext";
import { useDoc, useHistoryFlags, useUi } from "@/lib/client/react/useEditorState";
import { gridStepFor } from "@/lib/client/store/grid-steps";
import { Icon } from "./icons";

const isMac = () => typeof navigator !== "undefined" && /Mac|iPhone|iPad/.test(navigator.platform);

function CommandButton({ name, icon, pressed, disabled }: { name: string; icon: string; pressed?: boolean; disabled?: boolean }) {
  const ed = useEditor();
  const c = getCommand(name);
  const chord = c.shortcuts[0] ? ` (${describeChord(c.shortcuts[0], isMac())})` : "";
  return (
    <button
      type="button"
      className="rounded p-1.5 text-walnut-700 hover:bg-walnut-100 focus-visible:outline-none focus-visible:ring-2 focus-visible:ring-amberline-500 disabled:opacity-40 aria-pressed:bg-walnut-700 aria-pressed:text-paper"
      aria-label={c.label}
      title={`${c.label}${chord}`}
      aria-pressed={pressed}
      disabled={disabled}
      data-command={name}
      onClick={() => run(ed, name)}
    >
      <Icon name={icon} />
    </button>
  );
}

/** The grid step in force, in the plan's units, beside the snapping button; a press switches fine and normal steps. */
function GridStep() {
  const ed = useEditor();
  const settings = useDoc((d) => d.settings);
  const size = useUi((s) => s.gridSize);
  const snapping = useUi((s) => s.snapping);
  const f = (mm: number) => ed.engine.formatLength(mm, settings);
  const step = f(gridStepFor(settings.units, size));
  const big = f(gridStepFor(settings.units, size, true));
  return (
    <button
      type="button"
      data-testid="grid-step"
      className="rounded px-1.5 py-1 text-xs tabular-nums text-walnut-700 hover:bg-walnut-100 focus-visible:outline-none focus-visible:ring-2 focus-visible:ring-amberline-500 aria-pressed:bg-walnut-100"
      aria-pressed={size === "fine"}
      aria-label={`Grid ${step}${snapping ? "" : " (snapping off)"}: fine grid on/off; Shift snaps to ${big}`}
      title={`Grid step ${step} (Shift: ${big}). Fine grid on/off (Shift+G)`}
      onClick={() => run(ed, "toggle-fine-grid")}
    >
      <span className={snapping ? "" : "line-through"}>Grid {step}</span>
    </button>
  );
}

/** The editor's buttons; each is a registered command, so labels and shortcuts match the keyboard and the help sheet. */
export function Toolbar() {
  const { canUndo, canRedo } = useHistoryFlags();
  const view = useUi((s) => s.view);
  const tool = useUi((s) => s.tool);
  const snapping = useUi((s) => s.snapping);
  const hasSel = useUi((s) => s.selection.length > 0);
  const showAll = useUi((s) => s.showAllZones);
  const ed = useEditor();
  const sep = <span className="mx-1 h-6 w-px bg-walnut-100" aria-hidden="true" />;
  return (
    <div role="toolbar" aria-label="Editor tools" className="flex flex-wrap items-center gap-0.5">
      <CommandButton name="undo" icon="undo" disabled={!canUndo} />
      <CommandButton name="redo" icon="redo" disabled={!canRedo} />
      {sep}
      <CommandButton name="tool-select" icon="select" pressed={tool === "idle" || tool === "pointing" || tool === "dragging"} />
      <CommandButton name="tool-measure" icon="tape" pressed={tool === "measuring"} />
      <CommandButton name="toggle-snap" icon="snap" pressed={snapping} />
      <GridStep />
      {sep}
      <CommandButton name="duplicate" icon="duplicate" disabled={!hasSel} />
      <CommandButton name="delete" icon="delete" disabled={!hasSel} />
      {sep}
      <CommandButton name="view-orbit" icon="orbit" pressed={view === "orbit"} />
      <CommandButton name="view-plan" icon="plan" pressed={view === "plan"} />
      <CommandButton name="view-elevation" icon="elevation" pressed={view === "elevation"} />
      <CommandButton name="frame-all" icon="frame" />
      <button
        type="button"
        className="rounded p-1.5 text-walnut-700 hover:bg-walnut-100 focus-visible:outline-none focus-visible:ring-2 focus-visible:ring-amberline-500 aria-pressed:bg-walnut-700 aria-pressed:text-paper"
        aria-label="Show all keep-clear zones"
        title="Show all keep-clear zones"
        aria-pressed={showAll}
        onClick={() => ed.ui.setState({ showAllZones: !showAll })}
      >
        <Icon name="zones" />
      </button>
      {sep}
      <CommandButton name="help" icon="help" />
    </div>
  );
}
