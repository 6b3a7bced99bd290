import { describe, it, expect } from "vitest";
import { demoPlan } from "@/lib/engine/demo/demo-plan";
import { generatePlan } from "@/lib/engine/demo/generate-plan";
import { deriveWithNotes } from "@/lib/engine/derive";
import { stopTrackParamsSchema } from "@/lib/engine/fixtures/stop-track/params";
import { stopTable, trackStartMm } from "@/lib/engine/fixtures/stop-track/stop-table";
import { pointInPolygon } from "@/lib/engine/geometry/polygon";
import { parsePlan } from "@/lib/engine/plan/parse";

describe("demoPlan", () => {
  const plan = demoPlan();
  const { derived, notes } = deriveWithNotes(plan);

  it("is a valid plan document and derives without notes", () => {
    expect(parsePlan(plan).ok).toBe(true);
    expect(notes).toEqual([]);
    expect(derived.fixtures).toHaveLength(plan.fixtures.length);
  });

  it("has the fixtures the demo promises: a cabinet run, a tool shelf, a stop track, wall cabinets, shelves, a rack, a panel", () => {
    const kinds = new Set(plan.fixtures.map((f) => f.kind));
    for (const k of ["base-cabinet", "tool-shelf", "stop-track", "wall-cabinet", "shelf-run", "lumber-rack"]) expect(kinds.has(k)).toBe(true);
    expect(plan.room.obstacles.some((o) => o.kind === "panel")).toBe(true);
  });

  it("the saw's table is flush with both counters (within the 1/32 in flush tolerance of the settings)", () => {
    const saw = derived.fixtures.find((f) => f.kind === "tool-shelf")!;
    const counters = derived.fixtures.filter((f) => f.kind === "base-cabinet");
    for (const c of counters) expect(Math.abs(saw.origin.z + saw.workSurfaceMm! - (c.origin.z + c.workSurfaceMm!))).toBeLessThanOrEqual(plan.settings.flushToleranceMm);
  });

  it("the stock paths stay inside the room and every stop setting is within the track's reach", () => {
    for (const z of derived.zones.filter((x) => x.purpose.startsWith("stock-path"))) {
      for (const p of z.prism.polygon) expect(pointInPolygon(p, derived.room.corners, 1)).toBe(true);
    }
    const doc = plan.fixtures.find((f) => f.kind === "stop-track")!;
    const placed = derived.fixtures.find((f) => f.id === doc.id)!;
    // The track belongs to the saw: the engine places it and works out its start from the blade.
    expect(placed.track?.attached).toBe(true);
    const params = stopTrackParamsSchema.parse(doc.params);
    const t = stopTable(params, plan.settings, trackStartMm(params, placed));
    expect(t.rows.length).toBeGreaterThan(0);
    expect(t.rows.every((r) => r.inReach)).toBe(true);
  });
});

describe("generatePlan", () => {
  it("gives exactly n fixtures, valid, and the same plan for the same seed", () => {
    for (const n of [1, 10, 50, 120]) {
      const a = generatePlan(n, 3);
      expect(a.fixtures).toHaveLength(n);
      expect(parsePlan(a).ok).toBe(true);
      expect(JSON.stringify(generatePlan(n, 3))).toBe(JSON.stringify(a));
    }
    expect(JSON.stringify(generatePlan(50, 4))).not.toBe(JSON.stringify(generatePlan(50, 3)));
  });

  it("derives every fixture, with tool shelves among cabinets on the walls", () => {
    const plan = generatePlan(120, 11);
    const { derived, notes } = deriveWithNotes(plan);
    expect(notes).toEqual([]);
    expect(derived.fixtures).toHaveLength(120);
    const shelves = derived.fixtures.filter((f) => f.kind === "tool-shelf");
    expect(shelves.length).toBeGreaterThan(0);
    for (const s of shelves) expect(s.workSurfaceMm).toBeGreaterThan(800);
  });
});
