import { describe, it, expect } from "vitest";
import { buildFromPlan, buildPlan } from "@/lib/engine/build";
import { readJoinery } from "@/lib/engine/build/joinery";
import { demoPlan } from "@/lib/engine/demo/demo-plan";
import type { Part } from "@/lib/engine/fixtures/types";
import type { PlanDocument } from "@/lib/engine/plan/schema";

const IN = 25.4;

describe("setups", () => {
  const b = buildFromPlan(demoPlan());
  const rips = b.setups.filter((s) => s.kind === "rip");
  const cross = b.setups.filter((s) => s.kind === "crosscut");

  it("rips run widest first, one setup per fence reading, every rip at the table saw's fence with its cautions", () => {
    const w = rips.map((s) => s.setting.fenceMm ?? 0);
    expect(w).toEqual([...w].sort((a, b) => b - a));
    const titles = rips.map((s) => s.title);
    expect(new Set(titles).size).toBe(titles.length);
    for (const s of rips) {
      expect(s.station).toBe("table-saw-fence");
      expect(s.tools).toContain("riving knife");
      expect(s.cautions.some((c) => /maker's manual/.test(c))).toBe(true);
      expect(s.kerfSide).toMatch(/offcut side/);
      expect(s.testCut).toMatch(/scrap/);
    }
    // Drawer bottoms of 1/4 in plywood: 546.8 x 648.4 mm, grain along the length, ripped at 648.4 mm (25 1/2 in).
    const bottoms = b.rows.find((r) => r.name === "Drawer box bottom" && r.qty === 9);
    const rip = rips.find((s) => bottoms && s.items.some((i) => i.label === bottoms.label));
    expect(rip?.setting.fenceMm).toBeCloseTo(648.4, 0);
    expect(rip?.title).toBe('Rip fence at 25 1/2" from the blade');
  });

  it("crosscuts run by station, longest first within each; narrow pieces used after the track is fitted go to the stop track", () => {
    const order = ["panel-cut", "table-saw-sled", "miter-saw", "miter-saw-stop-track"];
    const st = cross.map((s) => order.indexOf(s.station));
    expect(st).toEqual([...st].sort((a, b) => a - b));
    for (const station of order) {
      const L = cross.filter((s) => s.station === station).map((s) => s.setting.lengthMm ?? 0);
      expect(L).toEqual([...L].sort((a, b) => b - a));
    }
    const rails = b.rows.find((r) => r.name === "Face-frame rail");
    const railCut = cross.find((s) => rails && s.items.some((i) => i.label === rails.label));
    expect(railCut?.station).toBe("miter-saw-stop-track");
    expect(railCut?.stopTrackId).toBe("stops");
    // Toe-kick rails are narrow and in reach, but are needed before the counters (and the track on them) exist.
    const kick = b.rows.find((r) => r.name === "Toe-kick rail");
    expect(cross.find((s) => kick && s.items.some((i) => i.label === kick.label))?.station).toBe("miter-saw");
    // The track's own fence is not cut on the track.
    const fence = b.rows.find((r) => r.name === "Stop-track fence");
    expect(cross.find((s) => fence && s.items.some((i) => i.label === fence.label))?.stopTrackId).toBeUndefined();
    // The 82 1/2 in rack uprights are past the 48 in track's reach: a measured mark at the miter saw.
    const uprights = b.rows.find((r) => r.name === "Upright" && r.materialId === "lumber-2x");
    expect(cross.find((s) => uprights && s.items.some((i) => i.label === uprights.label))?.station).toBe("miter-saw");
  });

  it("joinery setups read width x depth from the parts' notes; the drawer-bottom groove is as wide as the 1/4 in bottom", () => {
    expect(readJoinery("rabbet 0.5 in deep x 0.71875 in along the bottom inside edge for the bottom")).toMatchObject({ kind: "rabbet", depthMm: 12.7, widthMm: 0.71875 * IN });
    expect(readJoinery("2 dado(s) 0.71875 in wide x 0.25 in deep for the dividers")).toMatchObject({ kind: "dado", count: 2, widthMm: 0.71875 * IN, depthMm: 0.25 * IN });
    expect(readJoinery("groove 8/32 in deep, 16/32 in up, for the bottom")).toMatchObject({ kind: "groove", depthMm: 0.25 * IN, fenceDistanceMm: 0.5 * IN });
    expect(readJoinery("groove 19.0 mm wide x 9.5 mm deep along the top for the T-track")).toMatchObject({ kind: "groove", widthMm: 19, depthMm: 9.5 });
    expect(readJoinery("pocket screws into the sides")?.kind).toBe("pocket-screw");
    expect(readJoinery("glued and screwed under the core")).toBeNull();
    const groove = b.setups.find((s) => s.kind === "groove" && s.setting.fenceDistanceMm !== undefined);
    expect(groove?.setting.widthMm).toBe(6);
    expect(groove?.station).toBe("dado-stack");
    expect(groove?.cautions.some((c) => /riving knife/.test(c))).toBe(true);
    const pockets = b.setups.filter((s) => s.kind === "pocket-screw");
    expect(pockets.length).toBeGreaterThan(0);
    for (const p of pockets) expect(p.setting.stockThicknessMm).toBeGreaterThan(0);
  });

  it("run order numbers every setup once: rips, crosscuts, machined joints, the stop track's repeat lengths, pocket holes", () => {
    expect(b.setups.map((s) => s.order)).toEqual(b.setups.map((_, i) => i + 1));
    const rank = (s: (typeof b.setups)[number]) => (s.kind === "rip" ? 0 : s.kind === "crosscut" ? (s.stopTrackId ? 3 : 1) : s.kind === "pocket-screw" ? 4 : 2);
    const kinds = b.setups.map(rank);
    expect(kinds).toEqual([...kinds].sort((a, c) => a - c));
    expect(new Set(kinds)).toEqual(new Set([0, 1, 2, 3, 4]));
  });
});

describe("bad input gives notes, not exceptions", () => {
  const plan = demoPlan();
  it("a plan with no fixtures has nothing to cut and says so", () => {
    const b = buildFromPlan({ ...plan, fixtures: [] });
    expect(b.rows).toEqual([]);
    expect(b.setups).toEqual([]);
    expect(b.notes.join(" ")).toMatch(/no fixtures/);
  });
  it("a part thinner than its stock is named with both thicknesses", () => {
    const part: Part = { id: "cab-1:shim", fixtureId: "cab-1", name: "Shim strip", qty: 2, lengthMm: 300, widthMm: 40, thicknessMm: 6, materialId: "ply-18", stock: "sheet", grain: "length", edges: [], joinery: [] };
    const b = buildPlan(plan, { parts: [part] });
    expect(b.notes.join(" ")).toMatch(/A1 Shim strip is .* thinner than its stock/);
  });
  it("a part of zero or NaN size is left out of the setups with a note", () => {
    const bad: Part = { id: "cab-1:x", fixtureId: "cab-1", name: "Broken", qty: 1, lengthMm: Number.NaN, widthMm: 0, thicknessMm: 18, materialId: "ply-18", stock: "sheet", grain: "length", edges: [], joinery: [] };
    const b = buildPlan(plan, { parts: [bad] });
    expect(b.setups).toEqual([]);
    expect(b.notes.join(" ")).toMatch(/not a number/);
  });
  it("a stop track with no saw in the plan still gets its table, with a note", () => {
    const noSaw: PlanDocument = { ...plan, fixtures: plan.fixtures.filter((f) => f.kind !== "tool-shelf") };
    const b = buildFromPlan(noSaw);
    expect(b.stopTables).toHaveLength(1);
    expect(b.stopTables[0].notes.join(" ")).toMatch(/No saw: its saw \(saw\) is gone/);
    // Letters follow the stored order: with the tool shelf gone the track is the fifth fixture.
    expect(b.notes.join(" ")).toMatch(/Stop track E \(Stop track\)/);
  });
  it("an unsolvable room gives an empty result with a note", () => {
    const b = buildFromPlan({ ...plan, room: { ...plan.room, walls: plan.room.walls.slice(0, 1) } });
    if (b.rows.length === 0) expect(b.notes.length).toBeGreaterThan(0);
  });
});
