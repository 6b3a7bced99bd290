import { describe, expect, it } from "vitest";
import { demoPlan } from "@/lib/engine/demo/demo-plan";
import { generatePlan } from "@/lib/engine/demo/generate-plan";
import { derivePlan } from "@/lib/engine/derive";
import { planDrawings, planDrawingsOrNull } from "@/lib/engine/drawings/plan-drawings";
import { planView } from "@/lib/engine/drawings/plan-view";
import { FIXTURE_KIND_NAMES } from "@/lib/engine/fixtures/registry";
import { PLAN_SCHEMA_VERSION, planDocumentSchema } from "@/lib/engine/plan/schema";
import { formatLength } from "@/lib/engine/units/format-length";
import { namings } from "./helpers";

const plan = demoPlan();
const derived = derivePlan(plan);
const d = planView(plan, derived);

describe("plan view of the demo plan", () => {
  it("dimensions each wall with its solved length, formatted in the plan's units", () => {
    for (const w of derived.room.walls) {
      const dim = d.dimensions.find((x) => x.ref === w.id)!;
      expect(dim, w.id).toBeDefined();
      expect(dim.valueMm).toBeCloseTo(w.solvedLengthMm!, 6);
      // Drawn at scale: the dimension line is as long on the sheet as the wall.
      expect(Math.hypot(dim.line[1].x - dim.line[0].x, dim.line[1].y - dim.line[0].y)).toBeCloseTo(w.solvedLengthMm!, 0);
      expect(dim.text).toBe(formatLength(w.solvedLengthMm!, { units: plan.settings.units, precision: plan.settings.precision }));
      // Outside the room: the line stands off the wall away from the room's inside.
      const mid = { x: (dim.line[0].x + dim.line[1].x) / 2, y: -(dim.line[0].y + dim.line[1].y) / 2 };
      expect((mid.x - w.start.x) * w.inward.x + (mid.y - w.start.y) * w.inward.y).toBeLessThan(0);
    }
  });

  it("names every wall, and every fixture once in words", () => {
    const wallNames = d.labels.filter((l) => l.kind === "wall-name").map((l) => l.text);
    expect(wallNames).toEqual(plan.room.walls.map((w) => w.label));
    for (const f of derived.fixtures) expect(namings(d, f.id), f.id).toEqual([f.label]);
    const kindIds = new Set(FIXTURE_KIND_NAMES);
    for (const l of d.labels) expect(kindIds.has(l.text), l.text).toBe(false);
  });

  it("draws footprints where the engine placed them, wall-hung ones dashed", () => {
    for (const f of derived.fixtures) {
      const s = d.shapes.find((x) => x.ref === f.id && (x.role === "fixture" || x.role === "fixture-above"))!;
      expect(s.role, f.id).toBe(f.body.zMin > 1 ? "fixture-above" : "fixture");
      s.points.forEach((p, i) => {
        expect(p.x).toBeCloseTo(f.body.polygon[i].x, 0);
        expect(p.y).toBeCloseTo(-f.body.polygon[i].y, 0);
      });
    }
    expect(d.shapes.find((s) => s.ref === "upper-1")!.role).toBe("fixture-above");
  });

  it("cuts the walls at openings and draws the entry door's swing about its hinge", () => {
    expect(d.shapes.some((s) => s.ref === "garage-door" && s.role === "opening")).toBe(true);
    const swing = d.shapes.filter((s) => s.ref === "house-door" && s.role === "door-swing");
    expect(swing).toHaveLength(2);
    const [arc, leaf] = swing;
    const hinge = leaf.points[0];
    const width = plan.room.openings.find((o) => o.id === "house-door")!.widthMm;
    for (const p of arc.points) expect(Math.hypot(p.x - hinge.x, p.y - hinge.y)).toBeCloseTo(width, 0);
    // The hinge is the jamb the engine's swing zone turns about.
    const zone = derived.zones.find((z) => z.id === "house-door:swing")!;
    expect(zone.prism.polygon.some((p) => Math.abs(p.x - hinge.x) < 0.1 && Math.abs(-p.y - hinge.y) < 0.1)).toBe(true);
  });

  it("keeps the keep-clear zones on their own layer, left out on request", () => {
    const zones = d.shapes.filter((s) => s.role === "keep-clear");
    expect(zones.length).toBe(derived.zones.length);
    expect(zones.every((s) => s.layer === "keep-clear")).toBe(true);
    expect(planView(plan, derived, { keepClear: false }).shapes.some((s) => s.role === "keep-clear")).toBe(false);
  });

  it("holds everything inside its bounds", () => {
    const pts = [...d.shapes.flatMap((s) => s.points), ...d.labels.flatMap((l) => l.lines.map((x) => x.at)), ...d.dimensions.map((x) => x.textAt)];
    for (const p of pts) {
      expect(p.x).toBeGreaterThanOrEqual(d.bounds.minX);
      expect(p.x).toBeLessThanOrEqual(d.bounds.maxX);
      expect(p.y).toBeGreaterThanOrEqual(d.bounds.minY);
      expect(p.y).toBeLessThanOrEqual(d.bounds.maxY);
    }
  });
});

describe("plan drawings", () => {
  it("make the plan view and one elevation per wall", () => {
    const all = planDrawings(plan);
    expect(all.plan.title).toBe("Floor plan of the room");
    expect(all.elevations.map((e) => e.wallId)).toEqual(plan.room.walls.map((w) => w.id));
    expect(all.elevations[2].title).toBe("Elevation of Back wall");
  });

  it("name every fixture once on a plan of 300 fixtures, in bounded time", () => {
    const big = generatePlan(300, 7);
    const dd = derivePlan(big);
    const t0 = performance.now();
    const all = planDrawings(big, dd);
    const ms = performance.now() - t0;
    for (const f of dd.fixtures) expect(namings(all.plan, f.id).length, f.id).toBe(1);
    // A generous ceiling only to catch a runaway layout; speed itself is measured in the bench.
    expect(ms).toBeLessThan(20_000);
  });

  it("are null when the room cannot be solved", () => {
    // A stored document the schema would refuse (a wall of 0 mm) must not break the page.
    const bad = { ...plan, room: { ...plan.room, walls: plan.room.walls.map((w, i) => (i === 0 ? { ...w, lengthMm: 0 } : w)) } };
    expect(planDrawingsOrNull(bad)).toBeNull();
    expect(planDrawingsOrNull(planDocumentSchema.parse({ schemaVersion: PLAN_SCHEMA_VERSION, room: { walls: [{ id: "a", lengthMm: 1000 }, { id: "b", lengthMm: 1000 }, { id: "c", lengthMm: 1000 }] } }))).not.toBeNull();
  });
});
