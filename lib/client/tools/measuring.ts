import type { ToolState } from "./types";
import { createIdle } from "./idle";

/** A tape measure: press to start, move, press again to pin the reading; Escape leaves the tool. */
export function createMeasuring(): ToolState {
  return {
    id: "measuring",
    down(ed, input) {
      const m = ed.ui.getState().measurement;
      if (!m || m.done) {
        ed.ui.setState({ measurement: { from: input.point, to: input.point, done: false } });
        return;
      }
      const done = { ...m, to: input.point, done: true };
      ed.ui.setState({ measurement: done });
      ed.announce(`Measured ${ed.formatLength(Math.hypot(done.to.x - done.from.x, done.to.y - done.from.y))}.`);
    },
    move(ed, input) {
      const m = ed.ui.getState().measurement;
      if (m && !m.done) ed.ui.setState({ measurement: { ...m, to: input.point } });
    },
    cancel(ed) {
      ed.ui.setState({ measurement: null });
      ed.tools.go(createIdle());
    },
  };
}
