import { pinTracksOf } from "@/lib/engine/fixtures/stop-track/follow";
import { duplicateFixtures, removeFixtures } from "../store/fixture-ops";
import { newId } from "../store/ids";
import { createIdle } from "../tools/idle";
import { createMeasuring } from "../tools/measuring";
import { nudgeSelection, rotateSelection } from "./nudge";
import type { Command } from "./types";

const hasSelection = (ed: { selection: string[] }) => ed.selection.length > 0;

export const editCommands: Command[] = [
  { name: "undo", label: "Undo", group: "edit", shortcuts: ["Mod+Z"], perform: (ed) => ed.history.undo(), enabled: (ed) => ed.history.canUndo() },
  { name: "redo", label: "Redo", group: "edit", shortcuts: ["Mod+Shift+Z", "Mod+Y"], perform: (ed) => ed.history.redo(), enabled: (ed) => ed.history.canRedo() },
  {
    name: "delete",
    label: "Delete selected",
    group: "edit",
    shortcuts: ["Delete", "Backspace"],
    enabled: hasSelection,
    perform: (ed) => {
      const ids = ed.selection;
      // Tracks on a deleted saw keep their place and start, and show as detached.
      const derived = ed.derived.getState().derived;
      if (ed.edit((doc) => removeFixtures(derived ? pinTracksOf(doc, derived, ids) : doc, ids))) ed.announce(`Deleted ${ids.length} fixture${ids.length > 1 ? "s" : ""}.`);
    },
  },
  {
    name: "duplicate",
    label: "Duplicate selected",
    group: "edit",
    shortcuts: ["Mod+D"],
    enabled: hasSelection,
    perform: (ed) => {
      const ids = ed.selection;
      // Shift the copy by the first fixture's width so it lands beside the original.
      const shift = ed.footprint(ids[0])?.widthMm ?? ed.gridStepMm(true);
      let made: string[] = [];
      ed.edit((doc) => {
        const r = duplicateFixtures(doc, ids, shift, () => newId("fx"));
        made = r.ids;
        return r.doc;
      });
      if (made.length) {
        ed.select(made);
        ed.announce(`Duplicated ${made.length} fixture${made.length > 1 ? "s" : ""}.`);
      }
    },
  },
  { name: "select-all", label: "Select all fixtures", group: "edit", shortcuts: ["Mod+A"], perform: (ed) => ed.select(ed.doc.fixtures.map((f) => f.id)) },
  {
    name: "escape",
    label: "Cancel / clear selection",
    group: "edit",
    shortcuts: ["Escape"],
    perform: (ed) => {
      if (ed.ui.getState().helpOpen) ed.ui.setState({ helpOpen: false });
      else ed.tools.cancel();
    },
  },
  { name: "nudge-left", label: "Nudge left (along the wall)", group: "arrange", shortcuts: ["ArrowLeft"], enabled: hasSelection, perform: (ed) => nudgeSelection(ed, -1, 0, false) },
  { name: "nudge-right", label: "Nudge right (along the wall)", group: "arrange", shortcuts: ["ArrowRight"], enabled: hasSelection, perform: (ed) => nudgeSelection(ed, 1, 0, false) },
  { name: "nudge-up", label: "Nudge up (raise on a wall)", group: "arrange", shortcuts: ["ArrowUp"], enabled: hasSelection, perform: (ed) => nudgeSelection(ed, 0, 1, false) },
  { name: "nudge-down", label: "Nudge down (lower on a wall)", group: "arrange", shortcuts: ["ArrowDown"], enabled: hasSelection, perform: (ed) => nudgeSelection(ed, 0, -1, false) },
  { name: "nudge-left-big", label: "Nudge left, big step", group: "arrange", shortcuts: ["Shift+ArrowLeft"], enabled: hasSelection, perform: (ed) => nudgeSelection(ed, -1, 0, true) },
  { name: "nudge-right-big", label: "Nudge right, big step", group: "arrange", shortcuts: ["Shift+ArrowRight"], enabled: hasSelection, perform: (ed) => nudgeSelection(ed, 1, 0, true) },
  { name: "nudge-up-big", label: "Nudge up, big step", group: "arrange", shortcuts: ["Shift+ArrowUp"], enabled: hasSelection, perform: (ed) => nudgeSelection(ed, 0, 1, true) },
  { name: "nudge-down-big", label: "Nudge down, big step", group: "arrange", shortcuts: ["Shift+ArrowDown"], enabled: hasSelection, perform: (ed) => nudgeSelection(ed, 0, -1, true) },
  { name: "rotate", label: "Turn free fixture 90°", group: "arrange", shortcuts: ["R"], enabled: hasSelection, perform: (ed) => rotateSelection(ed, 90) },
  { name: "rotate-fine", label: "Turn free fixture 15°", group: "arrange", shortcuts: ["Shift+R"], enabled: hasSelection, perform: (ed) => rotateSelection(ed, 15) },
  {
    name: "toggle-snap",
    label: "Snapping on/off",
    group: "tools",
    shortcuts: ["G"],
    perform: (ed) => {
      const snapping = !ed.ui.getState().snapping;
      ed.ui.setState({ snapping });
      ed.announce(snapping ? "Snapping on." : "Snapping off.");
    },
  },
  {
    name: "toggle-fine-grid",
    label: "Fine grid on/off",
    group: "tools",
    shortcuts: ["Shift+G"],
    perform: (ed) => {
      const gridSize = ed.ui.getState().gridSize === "fine" ? "normal" : "fine";
      ed.ui.setState({ gridSize });
      ed.announce(`Grid step ${ed.formatLength(ed.gridStepMm())}.`);
    },
  },
  { name: "tool-select", label: "Select tool", group: "tools", shortcuts: ["V"], perform: (ed) => ed.tools.go(createIdle()) },
  { name: "tool-measure", label: "Tape measure", group: "tools", shortcuts: ["M"], perform: (ed) => ed.tools.go(createMeasuring()) },
];
