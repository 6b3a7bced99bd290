import { describe, it, expect } from "vitest";
import { createPlacing } from "@/lib/client/tools/placing";
import { createMeasuring } from "@/lib/client/tools/measuring";
import { makeEditor, onFixture, onFloor, onW1 } from "./harness";

// Grid step 10 mm and big step 100 mm in the harness; edge snap threshold 40 mm (editor choices).

function placeAt(ed: ReturnType<typeof makeEditor>, kind: string, x: number) {
  ed.tools.go(createPlacing(kind));
  ed.tools.move(onW1(x));
  ed.tools.down(onW1(x));
  return ed.doc.fixtures[ed.doc.fixtures.length - 1];
}

describe("placing", () => {
  it("shows a ghost, then places centred on the pointer, snapped to the grid, in one undo step", () => {
    const ed = makeEditor();
    ed.tools.go(createPlacing("base"));
    ed.tools.move(onW1(1004));
    expect(ed.ui.getState().ghost?.placement).toMatchObject({ mode: "wall", wallId: "w1", offsetMm: 700 });
    ed.tools.down(onW1(1004));
    const f = ed.doc.fixtures[0];
    // 1004 - 600/2 = 704 -> grid 10 -> 700.
    expect(f.placement).toEqual({ mode: "wall", wallId: "w1", offsetMm: 700, elevationMm: 0 });
    expect(ed.selection).toEqual([f.id]);
    expect(ed.ui.getState().tool).toBe("idle");
    expect(ed.ui.getState().ghost).toBeNull();
    ed.history.undo();
    expect(ed.doc.fixtures).toHaveLength(0);
  });

  it("snaps to the wall start and against a neighbour", () => {
    const ed = makeEditor();
    expect(placeAt(ed, "base", 320).placement).toMatchObject({ offsetMm: 0 });
    // Pointer at 925: left end would be 625, within 40 mm of the neighbour's end at 600.
    expect(placeAt(ed, "base", 925).placement).toMatchObject({ offsetMm: 600 });
  });

  it("places free fixtures on the floor", () => {
    const ed = makeEditor();
    ed.tools.go(createPlacing("base"));
    ed.tools.down(onFloor(2000, 1500));
    expect(ed.doc.fixtures[0].placement).toEqual({ mode: "free", xMm: 1700, yMm: 1200, rotationDeg: 0, elevationMm: 0 });
  });

  it("keeps placing while Shift is held, and Escape leaves the tool", () => {
    const ed = makeEditor();
    ed.tools.go(createPlacing("base"));
    ed.tools.down({ ...onW1(400), shift: true });
    ed.tools.down({ ...onW1(1500), shift: true });
    expect(ed.doc.fixtures).toHaveLength(2);
    ed.tools.cancel();
    expect(ed.ui.getState().tool).toBe("idle");
  });
});

describe("dragging", () => {
  it("slides along the wall with snapping, and the whole drag is one undo step", () => {
    const ed = makeEditor();
    const a = placeAt(ed, "base", 300);
    const steps = ed.history.store.temporal.getState().pastStates.length;
    ed.tools.down(onFixture(a.id, 300));
    expect(ed.ui.getState().tool).toBe("pointing");
    for (let x = 310; x <= 1503; x += 37) ed.tools.move(onFixture(a.id, x));
    expect(ed.ui.getState().tool).toBe("dragging");
    ed.tools.move(onFixture(a.id, 1503));
    ed.tools.up(onFixture(a.id, 1503));
    // Grabbed at 300, released at 1503: offset 1203 -> grid 1200.
    expect(ed.doc.fixtures[0].placement).toMatchObject({ offsetMm: 1200 });
    expect(ed.history.store.temporal.getState().pastStates.length).toBe(steps + 1);
    ed.history.undo();
    expect(ed.doc.fixtures[0].placement).toMatchObject({ offsetMm: 0 });
  });

  it("snaps the right end to the wall end and stays on the wall", () => {
    const ed = makeEditor();
    const a = placeAt(ed, "base", 300);
    ed.tools.down(onFixture(a.id, 300));
    ed.tools.move(onFixture(a.id, 3690));
    ed.tools.up(onFixture(a.id, 3690));
    // 4000 mm wall - 600 mm fixture = 3400.
    expect(ed.doc.fixtures[0].placement).toMatchObject({ offsetMm: 3400 });
    ed.tools.down(onFixture(a.id, 3700));
    ed.tools.move(onFixture(a.id, 9000));
    ed.tools.up(onFixture(a.id, 9000));
    expect(ed.doc.fixtures[0].placement).toMatchObject({ offsetMm: 3400 });
  });

  it("a click without moving selects and records nothing", () => {
    const ed = makeEditor();
    const a = placeAt(ed, "base", 300);
    const b = placeAt(ed, "base", 2000);
    ed.select([]);
    const steps = ed.history.store.temporal.getState().pastStates.length;
    ed.tools.down(onFixture(b.id, 2000));
    ed.tools.move(onFixture(b.id, 2003));
    ed.tools.up(onFixture(b.id, 2003));
    expect(ed.selection).toEqual([b.id]);
    ed.tools.down({ ...onFixture(a.id, 300), shift: true });
    expect(ed.selection).toEqual([b.id, a.id]);
    expect(ed.history.store.temporal.getState().pastStates.length).toBe(steps);
  });

  it("moves the rest of the selection by the same amount; Escape springs back", () => {
    const ed = makeEditor();
    const a = placeAt(ed, "base", 300);
    const b = placeAt(ed, "base", 2000);
    ed.select([a.id, b.id]);
    ed.tools.down(onFixture(a.id, 300));
    ed.tools.move(onFixture(a.id, 800));
    expect(ed.doc.fixtures.map((f) => (f.placement.mode === "wall" ? f.placement.offsetMm : NaN))).toEqual([500, 2200]);
    ed.tools.cancel();
    expect(ed.doc.fixtures.map((f) => (f.placement.mode === "wall" ? f.placement.offsetMm : NaN))).toEqual([0, 1700]);
    expect(ed.history.inGesture).toBe(false);
  });

  it("moves free fixtures on the grid", () => {
    const ed = makeEditor();
    ed.tools.go(createPlacing("base"));
    ed.tools.down(onFloor(2000, 1500));
    const id = ed.doc.fixtures[0].id;
    ed.tools.down(onFixture(id, 2000, 1500));
    ed.tools.move(onFixture(id, 2234, 1406));
    ed.tools.up(onFixture(id, 2234, 1406));
    expect(ed.doc.fixtures[0].placement).toMatchObject({ xMm: 1930, yMm: 1110 });
  });
});

describe("measuring", () => {
  it("pins a reading on the second press", () => {
    const ed = makeEditor();
    ed.tools.go(createMeasuring());
    ed.tools.down(onFloor(0, 0));
    ed.tools.move(onFloor(300, 400));
    expect(ed.ui.getState().measurement).toMatchObject({ done: false, to: { x: 300, y: 400 } });
    ed.tools.down(onFloor(300, 400));
    expect(ed.ui.getState().measurement?.done).toBe(true);
    expect(ed.ui.getState().announcement).toBe("Measured 500 mm.");
    ed.tools.cancel();
    expect(ed.ui.getState().measurement).toBeNull();
  });
});
