import type { FixtureDoc, Placement } from "@/lib/engine/plan/schema";
import type { Editor } from "../editor";
import { addFixture } from "../store/fixture-ops";
import { newId } from "../store/ids";
import { createIdle } from "./idle";
import { wallSpans, SNAP_THRESHOLD_MM } from "./neighbours";
import { snapAlongWall, snapToGrid } from "./snap";
import { attachNear } from "./track-attach";
import type { PointerInput, ToolState } from "./types";
import { frameOfWall, worldToWall } from "@/lib/engine/room/wall-frame";

/** Where a new fixture of `kind` would go for this pointer: centred on the pointer, snapped. */
export function placementFor(ed: Editor, kind: string, params: Record<string, unknown>, input: PointerInput): Placement | null {
  const fp = ed.engine.footprint(kind, params, ed.doc);
  const ui = ed.ui.getState();
  const snap = ui.snapping && !input.alt;
  if (input.hit?.type === "wall") {
    const wall = ed.wall(input.hit.wallId);
    if (!wall) return null;
    const { offsetMm } = snapAlongWall({
      offsetMm: worldToWall(frameOfWall(wall), input.point).offsetAlongMm - fp.widthMm / 2,
      widthMm: fp.widthMm,
      wallLengthMm: wall.lengthMm,
      neighbours: wallSpans(ed, wall.id, new Set()),
      gridStepMm: ed.gridStepMm(),
      thresholdMm: SNAP_THRESHOLD_MM,
      enabled: snap,
    });
    return { mode: "wall", wallId: wall.id, offsetMm, elevationMm: 0 };
  }
  if (input.hit?.type === "floor") {
    const g = (v: number) => (snap ? snapToGrid(v, ed.gridStepMm()) : v);
    return { mode: "free", xMm: g(input.point.x - fp.widthMm / 2), yMm: g(input.point.y - fp.depthMm / 2), rotationDeg: 0, elevationMm: 0 };
  }
  return null;
}

/** Placing a fixture chosen in the catalogue: a ghost follows the pointer; a press on a wall or the floor puts it there. Shift keeps placing. */
export function createPlacing(kind: string): ToolState {
  let params: Record<string, unknown> = {};
  return {
    id: "placing",
    enter(ed) {
      params = ed.engine.defaultParams(kind);
      ed.ui.setState({ placingKind: kind, ghost: null });
    },
    exit(ed) {
      ed.ui.setState({ placingKind: null, ghost: null });
    },
    move(ed, input) {
      const placement = attachNear(ed, kind, params, input.point)?.placement ?? placementFor(ed, kind, params, input);
      ed.ui.setState({ ghost: placement ? { kind, placement } : null });
    },
    down(ed, input) {
      // A stop track pressed near a saw station belongs to that saw; anything else goes where the pointer is.
      const attached = attachNear(ed, kind, params, input.point);
      const placement = attached?.placement ?? placementFor(ed, kind, params, input);
      if (!placement) return;
      const fixture: FixtureDoc = { id: newId("fx"), kind, label: "", placement, params: structuredClone(attached?.params ?? params) };
      ed.edit((doc) => addFixture(doc, fixture));
      ed.select([fixture.id]);
      ed.announce(attached ? `Placed ${kind} on ${ed.placed(String(attached.params.sawId))?.label ?? "the saw"}, ${String(attached.params.side)} of the blade.` : `Placed ${kind}.`);
      if (!input.shift) ed.tools.go(createIdle());
    },
    cancel(ed) {
      ed.tools.go(createIdle());
    },
  };
}
