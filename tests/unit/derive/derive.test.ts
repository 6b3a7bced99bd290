import { describe, it, expect } from "vitest";
import { derivePlan, deriveWithNotes, placeFixture, planFixtureContext, rederiveFixtures } from "@/lib/engine/derive";
import { baseCabinetParamsSchema } from "@/lib/engine/fixtures/base-cabinet/params";
import { resolvedTool, toolShelfParamsSchema } from "@/lib/engine/fixtures/tool-shelf/params";
import { solveRoom } from "@/lib/engine/room/solve";
import { IN, onWall, planWith } from "./helpers";

const bounds = (poly: { x: number; y: number }[]) => ({
  minX: Math.min(...poly.map((p) => p.x)),
  maxX: Math.max(...poly.map((p) => p.x)),
  minY: Math.min(...poly.map((p) => p.y)),
  maxY: Math.max(...poly.map((p) => p.y)),
});

describe("derivePlan: placement (world mm; wall 0 along +x from the origin, corners counter-clockwise)", () => {
  it("a cabinet on the first wall: origin at wall.start + dir * offset, local +y = inward", () => {
    const d = derivePlan(planWith([{ id: "c1", kind: "base-cabinet", placement: onWall("w1", 1000) }]));
    const f = d.fixtures[0];
    expect(f.origin).toEqual({ x: expect.closeTo(1000, 6), y: expect.closeTo(0, 6), z: 0 });
    expect(f.rotation).toBeCloseTo(0, 9);
    const b = bounds(f.body.polygon);
    // 30 in wide; 24 in deep plus the 1 in countertop overhang.
    expect(b.minX).toBeCloseTo(1000, 6);
    expect(b.maxX).toBeCloseTo(1000 + 30 * IN, 6);
    expect(b.minY).toBeCloseTo(0, 6);
    expect(b.maxY).toBeCloseTo(25 * IN, 6);
    expect(f.body.zMax).toBeCloseTo(f.workSurfaceMm!, 6);
  });

  it("a cabinet on the second wall faces -x (the room is to the wall's left)", () => {
    const plan = planWith([{ id: "c2", kind: "base-cabinet", placement: onWall("w2", 500) }]);
    const room = solveRoom(plan.room);
    const w2 = room.walls[1];
    const f = derivePlan(plan).fixtures[0];
    expect(f.origin.x).toBeCloseTo(w2.start.x + w2.dir.x * 500, 6);
    expect(f.origin.y).toBeCloseTo(w2.start.y + w2.dir.y * 500, 6);
    expect(f.rotation).toBeCloseTo(Math.atan2(w2.dir.y, w2.dir.x), 9);
    const b = bounds(f.body.polygon);
    expect(b.maxX).toBeCloseTo(w2.start.x, 3);
    expect(b.minX).toBeCloseTo(w2.start.x - 25 * IN, 3);
  });

  it("free placement uses x, y and the rotation (degrees, counter-clockwise)", () => {
    const f = derivePlan(planWith([{ id: "b", kind: "workbench", placement: { mode: "free", xMm: 3000, yMm: 3000, rotationDeg: 90 } }])).fixtures[0];
    expect(f.rotation).toBeCloseTo(Math.PI / 2, 9);
    const b = bounds(f.body.polygon);
    // 72 x 30 in bench turned a quarter: its width runs along +y, its depth along -x.
    expect(b.maxY - b.minY).toBeCloseTo(72 * IN, 6);
    expect(b.maxX - b.minX).toBeCloseTo(30 * IN, 6);
    expect(b.maxX).toBeCloseTo(3000, 6);
  });

  it("a wall cabinet's body floats at its mounting height", () => {
    const f = derivePlan(planWith([{ id: "u", kind: "wall-cabinet", placement: onWall("w1", 0) }])).fixtures[0];
    expect(f.body.zMin).toBeCloseTo(54 * IN, 6);
    expect(f.body.zMax).toBeCloseTo(84 * IN, 6);
  });

  it("fixture zones become world prisms with ids fixture:key, next to the room's zones", () => {
    const plan = planWith([{ id: "c1", kind: "base-cabinet", placement: onWall("w1", 1000) }], {});
    const withPanel = { ...plan, room: { ...plan.room, obstacles: [{ id: "p1", kind: "panel" as const, placement: onWall("w3", 1000, 1200), widthMm: 380, heightMm: 760, depthMm: 100, voltageClass: "0-150" as const, condition: 1 as const }] } };
    const d = derivePlan(withPanel);
    const pull = d.zones.find((z) => z.id === "c1:drawer-pull-1")!;
    expect(pull.ownerId).toBe("c1");
    const b = bounds(pull.prism.polygon);
    expect(b.minY).toBeCloseTo(24 * IN, 6);
    expect(b.maxY).toBeCloseTo(24 * IN + 22 * IN, 6);
    expect(d.zones.some((z) => z.ownerId === "p1")).toBe(true);
    expect(d.obstacles).toHaveLength(1);
    expect(d.obstacles[0].body.zMin).toBeCloseTo(1200, 6);
  });

  it("parts and hardware are listed per fixture with fixture-prefixed ids", () => {
    const d = derivePlan(planWith([{ id: "c1", kind: "base-cabinet", placement: onWall("w1", 0) }, { id: "c2", kind: "base-cabinet", placement: onWall("w1", 762) }]));
    expect(d.parts.filter((p) => p.fixtureId === "c1").length).toBeGreaterThan(5);
    expect(d.parts.every((p) => p.id.startsWith(`${p.fixtureId}:`))).toBe(true);
    expect(d.hardware.filter((h) => h.key === "slide-22in").reduce((s, h) => s + h.qty, 0)).toBe(8);
  });

  it("unknown kinds and unparsable parameters are skipped with a note", () => {
    const r = deriveWithNotes(planWith([{ id: "x", kind: "hovercraft", placement: onWall("w1", 0) }, { id: "y", kind: "workbench", placement: onWall("w1", 0), params: { widthMm: -3 } }, { id: "z", kind: "workbench", placement: onWall("nowall", 0) }]));
    expect(r.derived.fixtures).toHaveLength(0);
    expect(r.notes).toHaveLength(3);
    expect(r.notes[0]).toMatch(/unknown kind "hovercraft"/);
  });

  it("does not change its input", () => {
    const plan = planWith([{ id: "c1", kind: "base-cabinet", placement: onWall("w1", 0) }]);
    const before = JSON.stringify(plan);
    derivePlan(plan);
    expect(JSON.stringify(plan)).toBe(before);
  });
});

describe("derivePlan: tool shelf flush between counters (TRADE.md derived row: shelf top = counter height - tool table height)", () => {
  const run = (cabElevation = 0) =>
    planWith([
      { id: "left", kind: "base-cabinet", placement: onWall("w3", 0, cabElevation) },
      { id: "saw", kind: "tool-shelf", placement: onWall("w3", 30 * IN), params: { preset: "compact-miter-saw" } },
      { id: "right", kind: "base-cabinet", placement: onWall("w3", 62 * IN, cabElevation) },
    ]);

  it("the tool's table lands at the counters' height", () => {
    const d = derivePlan(run());
    const counter = d.fixtures.find((f) => f.id === "left")!.workSurfaceMm!;
    const saw = d.fixtures.find((f) => f.id === "saw")!;
    expect(saw.workSurfaceMm).toBeCloseTo(counter, 6);
    const tool = resolvedTool(toolShelfParamsSchema.parse({ preset: "compact-miter-saw" }));
    const shelfTop = Math.max(...saw.boxes.filter((b) => b.role === "shelf").map((b) => b.z + b.h));
    expect(shelfTop).toBeCloseTo(counter - tool.tableHeightMm, 6);
  });

  it("follows counters raised on a platform (neighbour height is relative to the shelf's base)", () => {
    const d = derivePlan(run(50));
    const counterWorld = 50 + d.fixtures.find((f) => f.id === "left")!.workSurfaceMm!;
    expect(d.fixtures.find((f) => f.id === "saw")!.workSurfaceMm).toBeCloseTo(counterWorld, 6);
  });

  it("falls back to 36 in (practice) with no counter on its wall", () => {
    const d = derivePlan(planWith([{ id: "saw", kind: "tool-shelf", placement: onWall("w3", 1000) }]));
    expect(d.fixtures[0].workSurfaceMm).toBeCloseTo(36 * IN, 6);
  });

  it("placeFixture re-derives one fixture with a given neighbour height", () => {
    const plan = run();
    const room = solveRoom(plan.room);
    const ctx = { ...planFixtureContext(plan), neighbourCounterHeightMm: 900 };
    const r = placeFixture(plan.fixtures[1], room, ctx)!;
    expect(r.placed.workSurfaceMm).toBeCloseTo(900, 6);
    expect(r.parts.length).toBeGreaterThan(0);
    expect(placeFixture({ ...plan.fixtures[1], kind: "nope" }, room, ctx)).toBeNull();
  });
});

describe("rederiveFixtures (incremental)", () => {
  it("after moving one cabinet, equals a full derive", () => {
    const plan = planWith([
      { id: "left", kind: "base-cabinet", placement: onWall("w3", 0) },
      { id: "saw", kind: "tool-shelf", placement: onWall("w3", 30 * IN) },
      { id: "right", kind: "base-cabinet", placement: onWall("w3", 62 * IN) },
      { id: "bench", kind: "workbench", placement: { mode: "free", xMm: 2500, yMm: 3000, rotationDeg: 0 } },
    ]);
    const d0 = derivePlan(plan);
    const p = baseCabinetParamsSchema.parse({ carcassHeightMm: 35 * IN });
    const moved = { ...plan, fixtures: plan.fixtures.map((f) => (f.id === "left" ? { ...f, params: p as unknown as Record<string, unknown> } : f.id === "bench" ? { ...f, placement: { mode: "free" as const, xMm: 2000, yMm: 2500, rotationDeg: 30, elevationMm: 0 } } : f)) };
    const inc = rederiveFixtures(moved, d0, ["left", "bench"]);
    const full = derivePlan(moved);
    expect(inc.fixtures).toEqual(full.fixtures);
    expect(inc.parts).toEqual(full.parts);
    expect(inc.hardware).toEqual(full.hardware);
    expect(new Set(inc.zones.map((z) => z.id))).toEqual(new Set(full.zones.map((z) => z.id)));
    // The saw shelf followed the raised left counter (mean of 35 in and 34-1/2 in carcasses plus the top).
    expect(inc.fixtures.find((f) => f.id === "saw")!.workSurfaceMm).not.toBeCloseTo(d0.fixtures.find((f) => f.id === "saw")!.workSurfaceMm!, 3);
  });

  it("drops deleted fixtures", () => {
    const plan = planWith([{ id: "a", kind: "workbench", placement: onWall("w1", 0) }, { id: "b", kind: "pegboard", placement: onWall("w1", 2000) }]);
    const d0 = derivePlan(plan);
    const inc = rederiveFixtures({ ...plan, fixtures: [plan.fixtures[0]] }, d0, ["b"]);
    expect(inc.fixtures.map((f) => f.id)).toEqual(["a"]);
    expect(inc.parts.some((p) => p.fixtureId === "b")).toBe(false);
    expect(inc.zones.some((z) => z.ownerId === "b")).toBe(false);
  });
});
