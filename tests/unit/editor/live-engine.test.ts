import { describe, it, expect } from "vitest";
import { newPlanDocument } from "@/lib/engine/plan/defaults";
import { Editor } from "@/lib/client/editor";
import { liveEngine } from "@/lib/client/engine-live";
import { createPlacing } from "@/lib/client/tools/placing";
import { setParams } from "@/lib/client/store/fixture-ops";

/** A default cabinet follows the 36 in counter height: its carcass is 914.4 mm less its 32.95 mm countertop (12.7 + 19.05 + 1.2). */
const carcassOf = (p: Record<string, unknown>) => (typeof p.carcassHeightMm === "number" ? p.carcassHeightMm : 914.4 - 32.95);

/** Places a kind on wall w3 with its left end at `offsetMm` (pointer at its centre, snapping off). */
function place(ed: Editor, kind: string, offsetMm: number): string {
  ed.ui.setState({ snapping: false });
  const wall = ed.wall("w3")!;
  const w = ed.engine.footprint(kind, ed.engine.defaultParams(kind), ed.doc).widthMm;
  const along = offsetMm + w / 2;
  ed.tools.go(createPlacing(kind));
  ed.tools.down({ point: { x: wall.start.x + wall.dir.x * along, y: wall.start.y + wall.dir.y * along }, hit: { type: "wall", wallId: "w3" } });
  return ed.selection[0];
}

describe("editor on the real engine", () => {
  it("a tool shelf between two counters is flush on both sides; raising one counter breaks flush", () => {
    const ed = new Editor({ doc: newPlanDocument(), engine: liveEngine });
    const left = place(ed, "base-cabinet", 0);
    const leftW = ed.footprint(left)!.widthMm;
    const shelf = place(ed, "tool-shelf", leftW);
    const right = place(ed, "base-cabinet", leftW + ed.footprint(shelf)!.widthMm);
    const flush = () => ed.derived.getState().findings.filter((f) => f.ruleId === "table-flush");
    // Tool shelf top = counter height - table height (TRADE.md, derived): flush on both sides.
    expect(flush()).toHaveLength(2);
    expect(flush().every((f) => f.pass)).toBe(true);
    // Raise the right cabinet by 1 in. The shelf follows the mean of its two counters (engine rule),
    // so each side is 12.7 mm off, past the 1/32 in tolerance (plan setting).
    const f = ed.fixture(right)!;
    ed.edit((d) => setParams(d, right, { ...f.params, carcassHeightMm: carcassOf(f.params) + 25.4 }));
    const failing = flush().filter((x) => !x.pass);
    expect(failing).toHaveLength(2);
    for (const x of failing) expect(x.measured).toBeCloseTo(12.7, 3);
    ed.history.undo();
    expect(flush().every((x) => x.pass)).toBe(true);
  });
});

describe("incremental analysis", () => {
  it("a drag step re-derives and re-checks to the same result as a full run", async () => {
    const { derivePlan } = await import("@/lib/engine/derive");
    const { evaluatePlan } = await import("@/lib/engine/checks/evaluate");
    const ed = new Editor({ doc: newPlanDocument(), engine: liveEngine });
    const a = place(ed, "base-cabinet", 0);
    place(ed, "tool-shelf", 1000);
    const b = place(ed, "base-cabinet", 2500);
    const start = ed.doc.fixtures.find((f) => f.id === b)!.placement;
    ed.history.beginGesture();
    for (let i = 1; i <= 10; i++) ed.edit((d) => ({ ...d, fixtures: d.fixtures.map((f) => (f.id === b && start.mode === "wall" ? { ...f, placement: { ...start, offsetMm: start.offsetMm - i * 60 } } : f)) }));
    ed.history.endGesture();
    const full = evaluatePlan(ed.doc, derivePlan(ed.doc));
    const live = ed.derived.getState().findings;
    const key = (x: { ruleId: string; pass: boolean; message: string }) => `${x.ruleId}|${x.pass}|${x.message}`;
    expect(live.map(key).sort()).toEqual(full.map(key).sort());
    expect(ed.derived.getState().fixtureById.get(a)).toBeDefined();
  });
});

describe("snapping to what a fixture really occupies", () => {
  it("a cabinet dragged to the wall start snaps its body (with overhangs) to the corner, not past it", async () => {
    const { frameOfWall, worldToWall } = await import("@/lib/engine/room/wall-frame");
    const ed = new Editor({ doc: newPlanDocument(), engine: liveEngine });
    const id = place(ed, "base-cabinet", 600);
    ed.ui.setState({ snapping: true, gridSize: "normal" });
    const wall = ed.wall("w3")!;
    const at = (t: number) => ({ x: wall.start.x + wall.dir.x * t + wall.inward.x * 300, y: wall.start.y + wall.dir.y * t + wall.inward.y * 300 });
    ed.tools.down({ point: at(900), hit: { type: "fixture", id } });
    ed.tools.move({ point: at(320), hit: { type: "fixture", id } });
    ed.tools.up({ point: at(320), hit: { type: "fixture", id } });
    const body = ed.placed(id)!.body.polygon.map((p) => worldToWall(frameOfWall(wall), p).offsetAlongMm);
    // The body's first edge lands on the corner (within float noise): 0 mm along the wall.
    expect(Math.min(...body)).toBeCloseTo(0, 6);
    const outside = ed.derived.getState().findings.filter((f) => f.ruleId === "in-room" && !f.pass && f.fixtureIds.includes(id));
    expect(outside).toHaveLength(0);
  });
});

describe("an adopted class preset", () => {
  it("puts its numbers in force in the live checks, and the standard numbers come back without it", () => {
    const ed = new Editor({ doc: newPlanDocument(), engine: liveEngine });
    const left = place(ed, "base-cabinet", 0);
    const shelf = place(ed, "tool-shelf", ed.footprint(left)!.widthMm);
    const right = place(ed, "base-cabinet", ed.footprint(left)!.widthMm + ed.footprint(shelf)!.widthMm);
    const f = ed.fixture(right)!;
    // Raise the right counter 1/2 in: each side of the shelf is 6.35 mm off (the shelf follows the mean).
    ed.edit((d) => setParams(d, right, { ...f.params, carcassHeightMm: carcassOf(f.params) + 12.7 }));
    const flush = () => ed.derived.getState().findings.filter((x) => x.ruleId === "table-flush");
    // Standard tolerance 1/32 in (0.79 mm, plan setting): both sides fail.
    expect(flush().filter((x) => !x.pass)).toHaveLength(2);
    // A made-up class preset allowing 1/2 in (12.7 mm): both pass, and the finding's required number is the preset's.
    ed.setPreset({ id: "p1", name: "Intro class", numbers: { flushToleranceMm: 12.7 } });
    expect(flush().every((x) => x.pass)).toBe(true);
    expect(flush()[0].required).toBeCloseTo(12.7, 6);
    expect(ed.ui.getState().presetName).toBe("Intro class");
    // Still in force for incremental re-checks after an edit (a drag step).
    ed.edit((d) => setParams(d, right, { ...ed.fixture(right)!.params, carcassHeightMm: carcassOf(f.params) + 12 }));
    expect(flush().every((x) => x.pass)).toBe(true);
    ed.setPreset(null);
    expect(flush().filter((x) => !x.pass)).toHaveLength(2);
  });
});
