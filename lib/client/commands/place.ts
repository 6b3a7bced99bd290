import type { FixtureDoc, Placement } from "@/lib/engine/plan/schema";
import type { Editor } from "../editor";
import { addFixture, setPlacement } from "../store/fixture-ops";
import { newId } from "../store/ids";
import { wallExtent } from "../tools/neighbours";
import { attachNear } from "../tools/track-attach";
import { frameOfWall, wallToWorld } from "@/lib/engine/room/wall-frame";

/** The first free spot along a wall after the fixtures already on it, mm from its start. */
export function nextFreeOffset(ed: Editor, wallId: string): number {
  let end = 0;
  for (const f of ed.doc.fixtures) {
    if (f.placement.mode !== "wall" || f.placement.wallId !== wallId) continue;
    end = Math.max(end, f.placement.offsetMm + wallExtent(ed, f.id).x1);
  }
  return end;
}

/** Adds a fixture of a kind with its default parameters at an exact placement (the keyboard way to place); one undo step. */
export function placeFixture(ed: Editor, kind: string, placement: Placement): string {
  // A stop track typed onto a wall with a saw station near that spot belongs to the saw (see attachNear).
  const defaults = ed.engine.defaultParams(kind);
  const wall = placement.mode === "wall" ? ed.wall(placement.wallId) : undefined;
  const spot = wall && placement.mode === "wall" ? wallToWorld(frameOfWall(wall), placement.offsetMm, 300) : placement.mode === "free" ? { x: placement.xMm, y: placement.yMm } : null;
  const attached = spot ? attachNear(ed, kind, defaults, spot) : null;
  const fixture: FixtureDoc = { id: newId("fx"), kind, label: "", placement: attached?.placement ?? placement, params: attached?.params ?? defaults };
  ed.edit((d) => addFixture(d, fixture));
  ed.select([fixture.id]);
  const title = ed.engine.kinds().find((k) => k.kind === kind)?.title ?? kind;
  if (attached) ed.announce(`Placed ${title} on ${ed.placed(String(attached.params.sawId))?.label ?? "the saw"}, ${String(attached.params.side)} of the blade.`);
  else ed.announce(placement.mode === "wall" ? `Placed ${title} ${ed.formatLength(placement.offsetMm)} from the wall start.` : `Placed ${title}.`);
  return fixture.id;
}

/** Moves a fixture to an exact placement (typed offset); one undo step. */
export function movePlacement(ed: Editor, id: string, placement: Placement): void {
  ed.edit((d) => setPlacement(d, id, placement));
}
