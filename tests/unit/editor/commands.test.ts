import { describe, it, expect } from "vitest";
import { commands, handleKey, run } from "@/lib/client/commands/registry";
import { describeChord, matches } from "@/lib/client/commands/shortcuts";
import { createPlacing } from "@/lib/client/tools/placing";
import { key, makeEditor, onW1 } from "./harness";

function withOne() {
  const ed = makeEditor();
  ed.tools.go(createPlacing("base"));
  ed.tools.down(onW1(1300));
  return ed;
}
const offset = (ed: ReturnType<typeof makeEditor>, i = 0) => {
  const p = ed.doc.fixtures[i].placement;
  return p.mode === "wall" ? p.offsetMm : NaN;
};

describe("command registry", () => {
  it("has unique names and no shortcut used twice", () => {
    const names = commands.map((c) => c.name);
    expect(new Set(names).size).toBe(names.length);
    const chords = commands.flatMap((c) => c.shortcuts);
    expect(new Set(chords).size).toBe(chords.length);
  });

  it("matches chords with Ctrl or Cmd as Mod", () => {
    expect(matches("Mod+Z", key("z", { ctrl: true }))).toBe(true);
    expect(matches("Mod+Z", key("z", { meta: true }))).toBe(true);
    expect(matches("Mod+Z", key("z", { ctrl: true, shift: true }))).toBe(false);
    expect(matches("Mod+Shift+Z", key("Z", { meta: true, shift: true }))).toBe(true);
    expect(matches("?", key("?", { shift: true }))).toBe(true);
    expect(describeChord("Mod+Shift+Z", false)).toBe("Ctrl+Shift+Z");
  });
});

describe("keyboard", () => {
  it("nudges by the grid step and Shift by the big step, each one undo step", () => {
    const ed = withOne();
    expect(offset(ed)).toBe(1000);
    expect(handleKey(ed, key("ArrowRight"))).toBe(true);
    expect(offset(ed)).toBe(1010);
    handleKey(ed, key("ArrowLeft", { shift: true }));
    expect(offset(ed)).toBe(910);
    handleKey(ed, key("ArrowUp"));
    expect(ed.doc.fixtures[0].placement).toMatchObject({ elevationMm: 10 });
    handleKey(ed, key("z", { ctrl: true }));
    handleKey(ed, key("z", { ctrl: true }));
    expect(offset(ed)).toBe(1010);
    handleKey(ed, key("Z", { ctrl: true, shift: true }));
    expect(offset(ed)).toBe(910);
  });

  it("does nothing to arrows without a selection", () => {
    const ed = withOne();
    ed.select([]);
    expect(handleKey(ed, key("ArrowRight"))).toBe(false);
  });

  it("duplicates beside the original and deletes", () => {
    const ed = withOne();
    handleKey(ed, key("d", { ctrl: true }));
    expect(ed.doc.fixtures).toHaveLength(2);
    expect(offset(ed, 1)).toBe(1600);
    expect(ed.selection).toEqual([ed.doc.fixtures[1].id]);
    handleKey(ed, key("Delete"));
    expect(ed.doc.fixtures).toHaveLength(1);
    handleKey(ed, key("a", { meta: true }));
    expect(ed.selection).toHaveLength(1);
  });

  it("switches views, cycles walls, frames and opens help", () => {
    const ed = withOne();
    handleKey(ed, key("2"));
    expect(ed.ui.getState().view).toBe("plan");
    handleKey(ed, key("3"));
    expect(ed.ui.getState()).toMatchObject({ view: "elevation", elevationWallId: "w1" });
    handleKey(ed, key("]"));
    expect(ed.ui.getState().elevationWallId).toBe("w2");
    handleKey(ed, key("["));
    handleKey(ed, key("["));
    expect(ed.ui.getState().elevationWallId).toBe("w4");
    const n = ed.ui.getState().frameRequest.n;
    handleKey(ed, key("f"));
    expect(ed.ui.getState().frameRequest).toEqual({ ids: [], n: n + 1 });
    handleKey(ed, key("?", { shift: true }));
    expect(ed.ui.getState().helpOpen).toBe(true);
    handleKey(ed, key("Escape"));
    expect(ed.ui.getState().helpOpen).toBe(false);
  });

  it("rotates only free fixtures", () => {
    const ed = withOne();
    expect(run(ed, "rotate")).toBe(true);
    expect(ed.history.canUndo()).toBe(true);
    expect(ed.doc.fixtures[0].placement.mode).toBe("wall");
  });
});
