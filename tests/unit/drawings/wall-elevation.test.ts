import { describe, expect, it } from "vitest";
import { demoPlan } from "@/lib/engine/demo/demo-plan";
import { derivePlan } from "@/lib/engine/derive";
import { wallElevation } from "@/lib/engine/drawings/wall-elevation";
import { textWidthMm, LINE_PITCH_EM } from "@/lib/engine/drawings/text-fit";
import { FIXTURE_KIND_NAMES } from "@/lib/engine/fixtures/registry";
import { PLAN_SCHEMA_VERSION, planDocumentSchema } from "@/lib/engine/plan/schema";
import { formatLength } from "@/lib/engine/units/format-length";
import { boxOf, namings } from "./helpers";

const plan = demoPlan();
const derived = derivePlan(plan);
const back = derived.room.walls.find((w) => w.id === "w3")!;
const L = back.solvedLengthMm!;
const d = wallElevation(plan, derived, "w3")!;
const chain = (name: string) => d.dimensions.filter((x) => x.chain === name);
const sum = (name: string) => chain(name).reduce((a, x) => a + x.valueMm, 0);
const onBack = plan.fixtures.filter((f) => f.placement.mode === "wall" && f.placement.wallId === "w3");

describe("wall elevation of the demo's back wall", () => {
  it("has running dimension chains that each add up to the solved wall length", () => {
    for (const name of ["fixtures", "wall-hung", "openings", "overall"]) {
      expect(chain(name).length, name).toBeGreaterThan(0);
      expect(sum(name), name).toBeCloseTo(L, 6);
    }
    // Corner, fixtures and gaps: the floor chain starts at one corner and ends at the other.
    const f = chain("fixtures");
    expect(f[0].from.x).toBe(0);
    expect(f[f.length - 1].to.x).toBeCloseTo(L, 1);
    // The base run: a 600 mm gap at the start corner, then 30" cabinets, the 32" saw station.
    const values = f.map((x) => Math.round(x.valueMm));
    expect(values.slice(-5)).toEqual([762, 813, 762, 762, 600]);
    expect(chain("overall")[0].text).toBe(formatLength(L, { units: plan.settings.units, precision: plan.settings.precision }));
  });

  it("has a height chain from the floor to the ceiling through the counter height", () => {
    const h = chain("heights");
    expect(h.reduce((a, x) => a + x.valueMm, 0)).toBeCloseTo(derived.room.ceilingHeightMm, 6);
    const counter = derived.fixtures.find((f) => f.id === "cab-1")!.workSurfaceMm!;
    expect(h[0].valueMm).toBeCloseTo(counter, 6);
    // The upper cabinets' bottom and top are breakpoints.
    const upper = derived.fixtures.find((f) => f.id === "upper-1")!;
    let z = 0;
    const zs = h.map((x) => (z += x.valueMm));
    expect(zs.some((v) => Math.abs(v - upper.body.zMin) < 1e-6)).toBe(true);
    expect(zs.some((v) => Math.abs(v - upper.body.zMax) < 1e-6)).toBe(true);
  });

  it("names every fixture on the wall once, in words", () => {
    for (const f of onBack) {
      const placed = derived.fixtures.find((p) => p.id === f.id)!;
      expect(namings(d, f.id), f.id).toEqual([placed.label]);
    }
    const kindIds = new Set(FIXTURE_KIND_NAMES);
    for (const l of d.labels) expect(kindIds.has(l.text), l.text).toBe(false);
    // Fixtures on other walls are not drawn here.
    expect(d.shapes.some((s) => s.ref === "rack" || s.ref === "shelves")).toBe(false);
  });

  it("draws the fixture near the wall's start corner on the right, as a person facing the wall sees it", () => {
    // cab-1 stands 600 mm from the start corner; facing the wall from the room, the start is on the right.
    const b = boxOf(d, "cab-1");
    expect(b.x1).toBeCloseTo(L - 600, 1);
    expect(b.x0).toBeCloseTo(L - 600 - 762, 1);
    expect(boxOf(d, "cab-4").x1).toBeLessThan(b.x0);
    // The saw station sits between the two runs on the drawing too.
    const saw = boxOf(d, "saw");
    expect(saw.x1).toBeLessThanOrEqual(boxOf(d, "cab-2").x0 + 0.1);
    expect(saw.x0).toBeGreaterThanOrEqual(boxOf(d, "cab-3").x1 - 0.1);
  });

  it("draws front faces by what they are, the counter above the carcass", () => {
    const roles = new Set(d.shapes.filter((s) => s.ref === "cab-1").map((s) => s.role));
    for (const r of ["carcass", "front", "counter"]) expect(roles.has(r as never), r).toBe(true);
    expect(d.shapes.some((s) => s.ref === "saw" && s.role === "tool")).toBe(true);
    expect(d.shapes.some((s) => s.ref === "saw" && s.role === "shelf")).toBe(true);
    const counterTop = Math.min(...d.shapes.filter((s) => s.ref === "cab-1" && s.role === "counter").flatMap((s) => s.points.map((p) => p.y)));
    expect(-counterTop).toBeCloseTo(derived.fixtures.find((f) => f.id === "cab-1")!.workSurfaceMm!, 0);
  });

  it("keeps every label inside its own box unless it is set outside with a leader", () => {
    for (const l of d.labels.filter((x) => x.kind === "name" || x.kind === "tag")) {
      const hasLeader = d.shapes.some((s) => s.role === "leader" && s.ref === l.ref);
      if (hasLeader) continue;
      const b = boxOf(d, l.ref!);
      for (const line of l.lines) {
        const w = textWidthMm(line.text, l.sizeMm);
        const h = LINE_PITCH_EM * l.sizeMm;
        expect(line.at.x - w / 2, l.text).toBeGreaterThanOrEqual(b.x0 - 0.1);
        expect(line.at.x + w / 2, l.text).toBeLessThanOrEqual(b.x1 + 0.1);
        expect(line.at.y - h / 2, l.text).toBeGreaterThanOrEqual(b.y0 - 0.1);
        expect(line.at.y + h / 2, l.text).toBeLessThanOrEqual(b.y1 + 0.1);
      }
    }
    // The stop track is too thin for its name: it goes outside with a leader.
    expect(d.shapes.some((s) => s.role === "leader" && s.ref === "stops")).toBe(true);
  });

  it("shows the wall's openings and obstacles", () => {
    const door = wallElevation(plan, derived, "w1")!;
    expect(door.shapes.some((s) => s.ref === "garage-door" && s.role === "opening")).toBe(true);
    expect(namings(door, "garage-door")).toEqual(["Garage door"]);
    const right = wallElevation(plan, derived, "w2")!;
    expect(right.shapes.some((s) => s.ref === "panel" && s.role === "obstacle")).toBe(true);
    // The free-standing water heater in the back-left corner shows on the back wall, at the viewer's left.
    const heater = boxOf(d, "heater");
    expect(heater.x0).toBeLessThan(L / 2);
  });

  it("is laid out from the solved wall length, not the measured one", () => {
    // Four walls that do not close square: solving spreads the gap, so solved and measured lengths differ.
    const p = planDocumentSchema.parse({ schemaVersion: PLAN_SCHEMA_VERSION, room: { walls: [{ id: "a", lengthMm: 5000 }, { id: "b", lengthMm: 4000 }, { id: "c", lengthMm: 5100 }, { id: "e", lengthMm: 4000 }] }, fixtures: [] });
    const dd = derivePlan(p);
    const w = dd.room.walls.find((x) => x.id === "c")!;
    expect(Math.abs(w.solvedLengthMm! - w.lengthMm)).toBeGreaterThan(10);
    const el = wallElevation(p, dd, "c")!;
    expect(el.dimensions.find((x) => x.chain === "overall")!.valueMm).toBeCloseTo(w.solvedLengthMm!, 6);
    expect(boxOf(el, "c").x1).toBeCloseTo(w.solvedLengthMm!, 1);
  });

  it("is the same drawing every time, and null for a wall not in the room", () => {
    expect(JSON.stringify(wallElevation(plan, derivePlan(plan), "w3"))).toBe(JSON.stringify(d));
    expect(wallElevation(plan, derived, "nope")).toBeNull();
  });
});
