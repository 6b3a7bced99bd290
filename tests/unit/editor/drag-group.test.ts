import { describe, it, expect } from "vitest";
import type { FixtureDoc, Placement } from "@/lib/engine/plan/schema";
import { run } from "@/lib/client/commands/registry";
import { addFixture } from "@/lib/client/store/fixture-ops";
import { gridSteps, gridStepFor } from "@/lib/client/store/grid-steps";
import { REATTACH_MM, wallToJoin } from "@/lib/client/tools/dragging";
import { makeEditor, onFixture, roomDoc } from "./harness";

// Harness room: 4000 x 3000 mm, w1 along +x from (0,0), w2 up +y from (4000,0), w3 back along -x, w4 down -y.
// Fixtures are 600 mm wide and 600 mm deep. Metric plan: grid 10 mm, Shift 100 mm. Edge snap 40 mm.

function put(ed: ReturnType<typeof makeEditor>, id: string, placement: Placement) {
  const f: FixtureDoc = { id, kind: "base", label: "", placement, params: { widthMm: 600 } };
  ed.edit((doc) => addFixture(doc, f));
  return id;
}
const onWall = (wallId: string, offsetMm: number): Placement => ({ mode: "wall", wallId, offsetMm, elevationMm: 0 });
const pastSteps = (ed: ReturnType<typeof makeEditor>) => ed.history.store.temporal.getState().pastStates.length;

function drag(ed: ReturnType<typeof makeEditor>, id: string, from: { x: number; y: number }, path: { x: number; y: number }[]) {
  ed.tools.down(onFixture(id, from.x, from.y));
  for (const p of path) ed.tools.move(onFixture(id, p.x, p.y));
  const last = path[path.length - 1];
  ed.tools.up(onFixture(id, last.x, last.y));
}

describe("dragging a wall fixture onto another wall", () => {
  it("moves onto the wall the pointer comes near, keeps where it was held, and undoes in one step", () => {
    const ed = makeEditor();
    const a = put(ed, "a", onWall("w1", 700));
    const steps = pastSteps(ed);
    // Held 300 mm from its left end; carried across the room to 100 mm from wall 2, 1500 mm along it.
    drag(ed, a, { x: 1000, y: 300 }, [{ x: 1500, y: 600 }, { x: 3000, y: 1200 }, { x: 3900, y: 1500 }]);
    // 1500 along wall 2 - 300 held = 1200 (on the 10 mm grid).
    expect(ed.fixture(a)!.placement).toEqual(onWall("w2", 1200));
    expect(pastSteps(ed)).toBe(steps + 1);
    expect(ed.ui.getState().announcement).toBe("Moved to wall 2, 1200 mm from its start.");
    ed.history.undo();
    expect(ed.fixture(a)!.placement).toEqual(onWall("w1", 700));
  });

  it("snaps against a neighbour on the new wall and to its ends", () => {
    const ed = makeEditor();
    put(ed, "n", onWall("w2", 0));
    const a = put(ed, "a", onWall("w1", 700));
    // Along wall 2 at 925 - 300 held = 625: within 40 mm of the neighbour's end at 600.
    drag(ed, a, { x: 1000, y: 300 }, [{ x: 3000, y: 1200 }, { x: 3900, y: 925 }]);
    expect(ed.fixture(a)!.placement).toEqual(onWall("w2", 600));
    // Across to the far wall (w3 runs from x 4000 to 0): 2000 along it - 300 held = 1700.
    drag(ed, a, { x: 3700, y: 900 }, [{ x: 3000, y: 2000 }, { x: 2000, y: 2990 }]);
    expect(ed.fixture(a)!.placement).toEqual(onWall("w3", 1700));
    // Then along w3 toward its start: 10 along - 300 held would be -290; it stops at the wall start.
    drag(ed, a, { x: 2300, y: 2700 }, [{ x: 3300, y: 2700 }, { x: 3990, y: 2700 }]);
    expect(ed.fixture(a)!.placement).toEqual(onWall("w3", 0));
  });

  it("pushed into a corner it stays on its own wall (no turn while the pointer is in front of it)", () => {
    const ed = makeEditor();
    const a = put(ed, "a", onWall("w1", 700));
    drag(ed, a, { x: 1000, y: 300 }, [{ x: 3000, y: 300 }, { x: 3850, y: 300 }, { x: 3990, y: 300 }]);
    // 4000 mm wall - 600 mm wide = 3400: at the wall end, still on wall 1.
    expect(ed.fixture(a)!.placement).toEqual(onWall("w1", 3400));
  });

  it("chooses the joining wall only outside the band in front of the current one, within the snap distance", () => {
    const ed = makeEditor();
    const walls = ed.derived.getState().derived!.room.walls;
    const band = 600 + REATTACH_MM;
    expect(wallToJoin(walls, { x: 3900, y: 500 }, "w1", band)).toBeUndefined();
    expect(wallToJoin(walls, { x: 3900, y: 1500 }, "w1", band)?.id).toBe("w2");
    expect(wallToJoin(walls, { x: 3700, y: 1500 }, "w1", band)).toBeUndefined();
    expect(wallToJoin(walls, { x: 2000, y: 2990 }, "w1", band)?.id).toBe("w3");
  });

  it("a drag of several fixtures never changes walls", () => {
    const ed = makeEditor();
    const a = put(ed, "a", onWall("w1", 700));
    const b = put(ed, "b", onWall("w1", 2000));
    ed.select([a, b]);
    drag(ed, a, { x: 1000, y: 300 }, [{ x: 3000, y: 1200 }, { x: 3900, y: 1500 }]);
    expect(ed.fixture(a)!.placement).toMatchObject({ wallId: "w1" });
    expect(ed.fixture(b)!.placement).toMatchObject({ wallId: "w1" });
  });
});

describe("dragging several fixtures", () => {
  it("free fixtures translate by the drag; wall fixtures slide along their own wall by its share; one undo step", () => {
    const ed = makeEditor();
    const lead = put(ed, "lead", { mode: "free", xMm: 1000, yMm: 1000, rotationDeg: 0, elevationMm: 0 });
    const free = put(ed, "free", { mode: "free", xMm: 2000, yMm: 1500, rotationDeg: 0, elevationMm: 0 });
    const w1 = put(ed, "on-w1", onWall("w1", 1000));
    const w2 = put(ed, "on-w2", onWall("w2", 1000));
    const w3 = put(ed, "on-w3", onWall("w3", 1000));
    ed.select([lead, free, w1, w2, w3]);
    const steps = pastSteps(ed);
    // Grab at (1300, 1300), release at (1603, 1096): the lead moves (+303, -204) -> grid (+300, -200).
    drag(ed, lead, { x: 1300, y: 1300 }, [{ x: 1450, y: 1200 }, { x: 1603, y: 1096 }]);
    expect(ed.fixture(lead)!.placement).toMatchObject({ xMm: 1300, yMm: 800 });
    expect(ed.fixture(free)!.placement).toMatchObject({ xMm: 2300, yMm: 1300 });
    // w1 runs along +x: +300; w2 along +y: -200; w3 along -x: -300.
    expect(ed.fixture(w1)!.placement).toMatchObject({ wallId: "w1", offsetMm: 1300 });
    expect(ed.fixture(w2)!.placement).toMatchObject({ wallId: "w2", offsetMm: 800 });
    expect(ed.fixture(w3)!.placement).toMatchObject({ wallId: "w3", offsetMm: 700 });
    expect(pastSteps(ed)).toBe(steps + 1);
    ed.history.undo();
    expect(ed.fixture(w2)!.placement).toMatchObject({ offsetMm: 1000 });
    expect(ed.fixture(free)!.placement).toMatchObject({ xMm: 2000, yMm: 1500 });
  });

  it("with a wall fixture leading, followers on a crossing wall follow the pointer across it, and stay on their walls", () => {
    const ed = makeEditor();
    const lead = put(ed, "lead", onWall("w1", 1000));
    const w2 = put(ed, "on-w2", onWall("w2", 2300));
    ed.select([lead, w2]);
    // Along w1 +500 (lead 1000 -> 1500); across w1 (into the room, +y) +404 -> grid 400: w2 slides +400, clamped at 3000 - 600 = 2400.
    drag(ed, lead, { x: 1300, y: 300 }, [{ x: 1500, y: 500 }, { x: 1800, y: 704 }]);
    expect(ed.fixture(lead)!.placement).toMatchObject({ wallId: "w1", offsetMm: 1500 });
    expect(ed.fixture(w2)!.placement).toMatchObject({ wallId: "w2", offsetMm: 2400 });
  });
});

describe("arrow-key nudge of several fixtures", () => {
  it("moves all selected like a drag: along the lead's wall, projected on each wall; one undo step", () => {
    const ed = makeEditor();
    const lead = put(ed, "lead", onWall("w1", 1000));
    const w3 = put(ed, "on-w3", onWall("w3", 1000));
    const w2 = put(ed, "on-w2", onWall("w2", 1000));
    const free = put(ed, "free", { mode: "free", xMm: 2000, yMm: 1500, rotationDeg: 0, elevationMm: 0 });
    ed.select([lead, w3, w2, free]);
    const steps = pastSteps(ed);
    run(ed, "nudge-right-big");
    // Right along w1 (+x) by 100 mm: w3 runs the other way (-100), w2 is square to it (0), the free one +x.
    expect(ed.fixture(lead)!.placement).toMatchObject({ offsetMm: 1100 });
    expect(ed.fixture(w3)!.placement).toMatchObject({ offsetMm: 900 });
    expect(ed.fixture(w2)!.placement).toMatchObject({ offsetMm: 1000 });
    expect(ed.fixture(free)!.placement).toMatchObject({ xMm: 2100, yMm: 1500 });
    expect(pastSteps(ed)).toBe(steps + 1);
    run(ed, "nudge-up");
    expect(ed.fixture(lead)!.placement).toMatchObject({ elevationMm: 10 });
    expect(ed.fixture(w3)!.placement).toMatchObject({ elevationMm: 10 });
  });
});

describe("grid steps follow the plan's units", () => {
  it("imperial: 1/16 in, 1 in, 6 in; metric: 1, 10, 100 mm", () => {
    // 1 in = 25.4 mm exactly (NIST SP 811).
    expect(gridSteps("in")).toEqual({ fineMm: 1.5875, normalMm: 25.4, bigMm: 152.4 });
    expect(gridSteps("ft-in")).toEqual(gridSteps("in"));
    expect(gridSteps("mm")).toEqual({ fineMm: 1, normalMm: 10, bigMm: 100 });
    expect(gridStepFor("in", "fine")).toBe(1.5875);
    expect(gridStepFor("in", "fine", true)).toBe(152.4);
  });

  it("the editor's drag and nudge use the plan's units and the fine grid when chosen", () => {
    const doc = roomDoc();
    const ed = makeEditor({ ...doc, settings: { ...doc.settings, units: "in" } });
    const a = put(ed, "a", onWall("w1", 0));
    ed.select([a]);
    run(ed, "nudge-right");
    expect(ed.fixture(a)!.placement).toMatchObject({ offsetMm: 25.4 });
    run(ed, "toggle-fine-grid");
    expect(ed.ui.getState().gridSize).toBe("fine");
    run(ed, "nudge-right");
    expect((ed.fixture(a)!.placement as { offsetMm: number }).offsetMm).toBeCloseTo(25.4 + 1.5875, 9);
    // Units changed to metric: the same commands now step 10 mm.
    run(ed, "toggle-fine-grid");
    ed.edit((d) => ({ ...d, settings: { ...d.settings, units: "mm" } }));
    expect(ed.gridStepMm()).toBe(10);
    expect(ed.gridStepMm(true)).toBe(100);
  });
});
