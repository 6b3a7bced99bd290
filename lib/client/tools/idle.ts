import type { ToolState } from "./types";
import { createPointing } from "./pointing";

/** Nothing under way: a press on a fixture selects it and may start a drag; elsewhere clears the selection. */
export function createIdle(): ToolState {
  return {
    id: "idle",
    down(ed, input) {
      const hit = input.hit;
      if (hit?.type === "fixture") {
        if (input.shift || input.mod) {
          ed.toggleSelected(hit.id);
          return;
        }
        if (!ed.selection.includes(hit.id)) ed.select([hit.id]);
        ed.tools.go(createPointing(hit.id, input.point));
        return;
      }
      if (!input.shift) ed.select([]);
    },
    cancel(ed) {
      ed.select([]);
    },
  };
}
