import type { FixtureDoc, Placement } from "@/lib/engine/plan/schema";
import type { Editor } from "../editor";
import { addFixture, setPlacement } from "../store/fixture-ops";
import { newId } from "../store/ids";
import { wallExtent } from "../tools/neighbours";

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
  const fixture: FixtureDoc = { id: newId("fx"), kind, label: "", placement, params: ed.engine.defaultParams(kind) };
  ed.edit((d) => addFixture(d, fixture));
  ed.select([fixture.id]);
  const title = ed.engine.kinds().find((k) => k.kind === kind)?.title ?? kind;
  ed.announce(placement.mode === "wall" ? `Placed ${title} ${ed.formatLength(placement.offsetMm)} from the wall start.` : `Placed ${title}.`);
  return fixture.id;
}

/** Moves a fixture to an exact placement (typed offset); one undo step. */
export function movePlacement(ed: Editor, id: string, placement: Placement): void {
  ed.edit((d) => setPlacement(d, id, placement));
}
