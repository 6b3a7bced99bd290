import type { Vec2 } from "@/lib/engine/geometry/types";
import type { ToolState } from "./types";
import { createDragging } from "./dragging";
import { createIdle } from "./idle";

/** Pointer pressed on a fixture and not moved far yet: a release is a click; moving past the slop starts a drag. */
export function createPointing(fixtureId: string, start: Vec2, slopMm = 8): ToolState {
  return {
    id: "pointing",
    move(ed, input) {
      if (Math.hypot(input.point.x - start.x, input.point.y - start.y) < slopMm) return;
      const drag = createDragging(fixtureId, start);
      ed.tools.go(drag);
      drag.move?.(ed, input);
    },
    up(ed) {
      ed.tools.go(createIdle());
    },
    cancel(ed) {
      ed.tools.go(createIdle());
    },
  };
}
