import type { Editor } from "../editor";
import type { Command } from "./types";

function cycleWall(ed: Editor, step: number): void {
  const walls = ed.doc.room.walls;
  const cur = walls.findIndex((w) => w.id === ed.ui.getState().elevationWallId);
  const next = walls[(((cur < 0 ? 0 : cur + step) % walls.length) + walls.length) % walls.length];
  ed.ui.setState({ view: "elevation", elevationWallId: next.id });
  ed.announce(`Elevation of wall ${walls.indexOf(next) + 1}${next.label ? ` (${next.label})` : ""}.`);
}

export const viewCommands: Command[] = [
  { name: "view-orbit", label: "3D view", group: "view", shortcuts: ["1"], perform: (ed) => ed.ui.setState({ view: "orbit" }) },
  { name: "view-plan", label: "Plan view (from above)", group: "view", shortcuts: ["2"], perform: (ed) => ed.ui.setState({ view: "plan" }) },
  {
    name: "view-elevation",
    label: "Wall elevation",
    group: "view",
    shortcuts: ["3"],
    perform: (ed) => {
      const ui = ed.ui.getState();
      ed.ui.setState({ view: "elevation", elevationWallId: ui.elevationWallId ?? ed.doc.room.walls[0]?.id ?? null });
    },
  },
  { name: "next-wall", label: "Next wall in elevation", group: "view", shortcuts: ["]"], perform: (ed) => cycleWall(ed, 1) },
  { name: "previous-wall", label: "Previous wall in elevation", group: "view", shortcuts: ["["], perform: (ed) => cycleWall(ed, -1) },
  {
    name: "toggle-dimensions",
    label: "Show or hide dimensions",
    group: "view",
    shortcuts: ["D"],
    perform: (ed) => {
      const on = !ed.ui.getState().showDimensions;
      ed.ui.setState({ showDimensions: on });
      ed.announce(on ? "Dimensions shown." : "Dimensions hidden.");
    },
  },
  { name: "frame-all", label: "Frame the whole room", group: "view", shortcuts: ["F"], perform: (ed) => ed.frame([]) },
  { name: "frame-selection", label: "Frame the selection", group: "view", shortcuts: ["Shift+F"], perform: (ed) => ed.frame(ed.selection) },
  { name: "help", label: "Keyboard shortcuts", group: "help", shortcuts: ["?"], perform: (ed) => ed.ui.setState({ helpOpen: !ed.ui.getState().helpOpen }) },
];
