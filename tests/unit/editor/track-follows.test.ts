import { describe, expect, it } from "vitest";
import { newPlanDocument } from "@/lib/engine/plan/defaults";
import { frameOfWall, worldToWall } from "@/lib/engine/room/wall-frame";
import { run } from "@/lib/client/commands/registry";
import { Editor } from "@/lib/client/editor";
import { liveEngine } from "@/lib/client/engine-live";
import { createPlacing } from "@/lib/client/tools/placing";

/** Places a kind on wall w3 with its start-corner end at `offsetMm` (pointer at its centre, snapping off). */
function place(ed: Editor, kind: string, offsetMm: number): string {
  ed.ui.setState({ snapping: false });
  const wall = ed.wall("w3")!;
  const w = ed.engine.footprint(kind, ed.engine.defaultParams(kind), ed.doc).widthMm;
  const along = offsetMm + w / 2;
  ed.tools.go(createPlacing(kind));
  ed.tools.down({ point: { x: wall.start.x + wall.dir.x * along, y: wall.start.y + wall.dir.y * along }, hit: { type: "wall", wallId: "w3" } });
  return ed.selection[0];
}

/** Cabinet, tool shelf, cabinet on wall w3, then a stop track clicked 200 mm along from the saw's far end. */
function station() {
  const ed = new Editor({ doc: newPlanDocument(), engine: liveEngine });
  const a = place(ed, "base-cabinet", 0);
  const aw = ed.footprint(a)!.widthMm;
  const saw = place(ed, "tool-shelf", aw);
  const sw = ed.footprint(saw)!.widthMm;
  const b = place(ed, "base-cabinet", aw + sw);
  const track = place(ed, "stop-track", aw + sw + 200);
  return { ed, saw, track, a, b, aw, sw };
}

const along = (ed: Editor, id: string) => {
  const f = ed.fixture(id)!;
  return f.placement.mode === "wall" ? f.placement.offsetMm : NaN;
};

describe("a stop track placed near a saw (editor, real engine)", () => {
  it("belongs to that saw, on the side clicked (along the wall from the start corner is the viewer's left), on the counter", () => {
    const { ed, saw, track, b, aw, sw } = station();
    const doc = ed.fixture(track)!;
    expect(doc.params).toMatchObject({ sawId: saw, side: "left" });
    const placed = ed.placed(track)!;
    expect(placed.track?.attached).toBe(true);
    // The document says where it is: the bay's far end, on the counter top.
    expect(along(ed, track)).toBeCloseTo(aw + sw, 6);
    const counter = ed.placed(b)!;
    expect(placed.origin.z).toBeCloseTo(counter.origin.z + counter.workSurfaceMm!, 9);
    expect(doc.placement.elevationMm).toBeCloseTo(counter.origin.z + counter.workSurfaceMm!, 9);
    // One 30 in cabinet beside the saw: the new track is cut to the 30 in of counter, so it fits.
    expect(Number(doc.params.lengthMm)).toBeCloseTo(30 * 25.4, 6);
    const run = ed.derived.getState().findings.filter((f) => f.subjectId === track || f.fixtureIds[0] === track);
    expect(run.find((f) => f.ruleId === "stop-track-run")?.pass).toBe(true);
    expect(run.find((f) => f.ruleId === "stop-track-height")?.pass).toBe(true);
  });

  it("follows the saw when it is dragged one cabinet along, and one undo puts both back", () => {
    const { ed, saw, track, aw } = station();
    const steps = ed.history.store.temporal.getState().pastStates.length;
    const before = along(ed, track);
    const wall = ed.wall("w3")!;
    const frame = frameOfWall(wall);
    const at = (o: number) => ({ point: { x: wall.start.x + wall.dir.x * o + wall.inward.x * 300, y: wall.start.y + wall.dir.y * o + wall.inward.y * 300 }, hit: { type: "fixture" as const, id: saw } });
    const grab = aw + 100;
    ed.tools.go(createPlacing("tool-shelf"));
    ed.tools.cancel();
    ed.tools.down(at(grab));
    for (let o = grab; o >= grab - aw; o -= 50) ed.tools.move(at(o));
    ed.tools.move(at(grab - aw));
    ed.tools.up(at(grab - aw));
    const sawNow = along(ed, saw);
    expect(sawNow).toBeLessThan(aw / 2);
    // The track moved with the saw, by the same distance.
    expect(before - along(ed, track)).toBeCloseTo(aw - sawNow, 6);
    expect(worldToWall(frame, ed.placed(track)!.origin).offsetAlongMm).toBeCloseTo(along(ed, track), 6);
    expect(ed.history.store.temporal.getState().pastStates.length).toBe(steps + 1);
    ed.history.undo();
    expect(along(ed, saw)).toBeCloseTo(aw, 6);
    expect(along(ed, track)).toBeCloseTo(before, 6);
  });

  it("deleting the saw keeps the track where it was, marked detached with a finding", () => {
    const { ed, saw, track } = station();
    const body = ed.placed(track)!.body.polygon;
    ed.select([saw]);
    run(ed, "delete");
    const placed = ed.placed(track)!;
    expect(placed.track?.attached).toBe(false);
    for (let i = 0; i < body.length; i++) {
      expect(placed.body.polygon[i].x).toBeCloseTo(body[i].x, 6);
      expect(placed.body.polygon[i].y).toBeCloseTo(body[i].y, 6);
    }
    const f = ed.derived.getState().findings.find((x) => x.ruleId === "stop-track-attached" && x.fixtureIds.includes(track))!;
    expect(f.pass).toBe(false);
    expect(f.message).toMatch(/detached/);
  });
});
