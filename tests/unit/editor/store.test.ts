import { describe, it, expect } from "vitest";
import { addFixture, duplicateFixtures, removeFixtures, setPlacement } from "@/lib/client/store/fixture-ops";
import { addWall, removeWall, setDiagonal, setWallLength } from "@/lib/client/store/room-ops";
import { makeEditor, roomDoc } from "./harness";

const fx = (id: string, offsetMm: number) => ({ id, kind: "base", label: "", params: { widthMm: 600 }, placement: { mode: "wall" as const, wallId: "w1", offsetMm, elevationMm: 0 } });

describe("document edits", () => {
  it("return new documents and leave the input alone", () => {
    const doc = roomDoc();
    const frozen = JSON.stringify(doc);
    const a = addFixture(doc, fx("a", 0));
    expect(a).not.toBe(doc);
    expect(JSON.stringify(doc)).toBe(frozen);
    expect(setPlacement(a, "a", a.fixtures[0].placement)).toBe(a);
    expect(removeFixtures(a, ["zzz"])).toBe(a);
  });

  it("duplicates with a shift and fresh ids", () => {
    let n = 0;
    const doc = addFixture(roomDoc(), fx("a", 100));
    const r = duplicateFixtures(doc, ["a"], 600, () => `c${++n}`);
    expect(r.ids).toEqual(["c1"]);
    expect(r.doc.fixtures[1].placement).toMatchObject({ mode: "wall", offsetMm: 700 });
  });

  it("edits walls and diagonals", () => {
    let doc = setWallLength(roomDoc(), "w2", 3100);
    expect(doc.room.walls[1].lengthMm).toBe(3100);
    doc = setDiagonal(doc, 0, 2, 5000);
    doc = setDiagonal(doc, 2, 0, 5010);
    expect(doc.room.diagonals).toEqual([{ from: 2, to: 0, lengthMm: 5010 }]);
    expect(setDiagonal(doc, 0, 2, null).room.diagonals).toEqual([]);
    doc = addWall(addFixture(doc, fx("a", 0)), "w5", 1000);
    expect(doc.room.walls).toHaveLength(5);
    const less = removeWall(doc, "w1");
    expect(less.room.walls.map((w) => w.id)).toEqual(["w2", "w3", "w4", "w5"]);
    expect(less.fixtures).toHaveLength(0);
  });
});

describe("undo and redo", () => {
  it("undoes and redoes each edit", () => {
    const ed = makeEditor();
    ed.edit((d) => addFixture(d, fx("a", 0)));
    ed.edit((d) => addFixture(d, fx("b", 600)));
    expect(ed.doc.fixtures).toHaveLength(2);
    ed.history.undo();
    expect(ed.doc.fixtures.map((f) => f.id)).toEqual(["a"]);
    ed.history.undo();
    expect(ed.doc.fixtures).toHaveLength(0);
    expect(ed.history.canUndo()).toBe(false);
    ed.history.redo();
    ed.history.redo();
    expect(ed.doc.fixtures).toHaveLength(2);
  });

  it("records no step for an edit that changes nothing", () => {
    const ed = makeEditor();
    expect(ed.edit((d) => d)).toBe(false);
    expect(ed.history.canUndo()).toBe(false);
  });

  it("makes a gesture one undo step, and a cancelled gesture none", () => {
    const ed = makeEditor();
    ed.edit((d) => addFixture(d, fx("a", 0)));
    ed.history.beginGesture();
    for (let x = 10; x <= 500; x += 10) ed.edit((d) => setPlacement(d, "a", { mode: "wall", wallId: "w1", offsetMm: x, elevationMm: 0 }));
    ed.history.endGesture();
    expect(ed.history.store.temporal.getState().pastStates).toHaveLength(2);
    ed.history.undo();
    expect(ed.doc.fixtures[0].placement).toMatchObject({ offsetMm: 0 });
    ed.history.redo();
    expect(ed.doc.fixtures[0].placement).toMatchObject({ offsetMm: 500 });

    ed.history.beginGesture();
    ed.edit((d) => setPlacement(d, "a", { mode: "wall", wallId: "w1", offsetMm: 900, elevationMm: 0 }));
    ed.history.cancelGesture();
    expect(ed.doc.fixtures[0].placement).toMatchObject({ offsetMm: 500 });
    expect(ed.history.store.temporal.getState().pastStates).toHaveLength(2);
  });

  it("re-derives on every change, including undo", () => {
    const ed = makeEditor();
    ed.edit((d) => addFixture(d, fx("a", 0)));
    expect(ed.derived.getState().fixtureById.has("a")).toBe(true);
    ed.history.undo();
    expect(ed.derived.getState().fixtureById.has("a")).toBe(false);
  });

  it("drops deleted fixtures from the selection", () => {
    const ed = makeEditor();
    ed.edit((d) => addFixture(d, fx("a", 0)));
    ed.select(["a"]);
    ed.history.undo();
    expect(ed.selection).toEqual([]);
  });
});
