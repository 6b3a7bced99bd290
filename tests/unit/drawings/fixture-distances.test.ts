import { describe, expect, it } from "vitest";
import { demoPlan } from "@/lib/engine/demo/demo-plan";
import { derivePlan } from "@/lib/engine/derive";
import { fixtureDistances, offsetForGap, selectionElevationDimensions } from "@/lib/engine/drawings/fixture-distances";
import { wallElevation } from "@/lib/engine/drawings/wall-elevation";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { frameOfWall } from "@/lib/engine/room/wall-frame";
import { formatLength } from "@/lib/engine/units/format-length";

const plan = demoPlan();
const derived = derivePlan(plan);
const back = derived.room.walls.find((w) => w.id === "w3")!;
const L = back.solvedLengthMm!;
const dist = (id: string, p: PlanDocument = plan) => fixtureDistances(p, derivePlan(p), id)!;
const offsetOf = (id: string, p: PlanDocument = plan) => {
  const pl = p.fixtures.find((f) => f.id === id)!.placement;
  return pl.mode === "wall" ? pl.offsetMm : NaN;
};
const moved = (id: string, offsetMm: number): PlanDocument => ({
  ...plan,
  fixtures: plan.fixtures.map((f) => (f.id === id && f.placement.mode === "wall" ? { ...f, placement: { ...f.placement, offsetMm } } : f)),
});

describe("a wall fixture's distances to its neighbours, as a person facing the wall sees them", () => {
  it("runs from the start corner on the right to the next cabinet on the left", () => {
    const d = dist("cab-1");
    // cab-1 stands 600 mm from the wall's start; the start corner is on the viewer's right.
    expect(d.right.to).toEqual({ kind: "corner" });
    expect(d.right.gapMm).toBeCloseTo(d.fromMm, 6);
    expect(d.left.to).toMatchObject({ kind: "fixture", id: "cab-2" });
    expect(d.left.gapMm).toBeCloseTo(0, 3);
    // Gaps and width add up to the wall with the neighbours in between.
    const end = dist("cab-4");
    expect(end.left.to).toEqual({ kind: "corner" });
    expect(end.toMm + end.left.gapMm).toBeCloseTo(L, 6);
  });

  it("counts neighbours at its own height only: uppers beside uppers, not the counters under them", () => {
    const u = dist("upper-1");
    expect(u.left.to).toMatchObject({ kind: "fixture", id: "upper-2" });
    expect(u.right.to).toEqual({ kind: "corner" });
    const saw = dist("saw");
    expect(saw.left.to).toMatchObject({ id: "cab-3" });
    expect(saw.right.to).toMatchObject({ id: "cab-2" });
  });

  it("moves the fixture so a typed gap is left, its neighbour staying put", () => {
    const before = dist("cab-4");
    const want = 100;
    const next = moved("cab-4", offsetForGap(before, offsetOf("cab-4"), "left", want));
    const after = dist("cab-4", next);
    expect(after.left.gapMm).toBeCloseTo(want, 6);
    expect(after.widthMm).toBeCloseTo(before.widthMm, 6);
    expect(after.right.gapMm).toBeCloseTo(before.right.gapMm + before.left.gapMm - want, 6);
    const right = moved("cab-1", offsetForGap(dist("cab-1"), offsetOf("cab-1"), "right", 250));
    expect(dist("cab-1", right).right.gapMm).toBeCloseTo(250, 6);
  });

  it("is null for a fixture standing free or missing", () => {
    expect(fixtureDistances(plan, derived, "nope")).toBeNull();
    const free: PlanDocument = { ...plan, fixtures: plan.fixtures.map((f) => (f.id === "cab-1" ? { ...f, placement: { mode: "free", xMm: 2000, yMm: 2000, rotationDeg: 0, elevationMm: 0 } } : f)) };
    expect(fixtureDistances(free, derivePlan(free), "cab-1")).toBeNull();
  });

  it("draws the selection's gaps, width and height on the elevation, matching the wall's own chain", () => {
    const d = dist("cab-3");
    const fmt = (mm: number) => formatLength(mm, { units: plan.settings.units, precision: plan.settings.precision });
    const dims = selectionElevationDimensions(d, frameOfWall(back), derived.fixtures.find((f) => f.id === "cab-3")!.body.zMin, { sizeMm: 100, format: fmt, chain: "" });
    const width = dims.find((x) => x.note === "Width")!;
    expect(width.valueMm).toBeCloseTo(d.widthMm, 6);
    expect(dims.every((x) => x.chain === "selection" && x.ref === "cab-3")).toBe(true);
    // The width is one of the elevation's running-chain steps.
    const chain = wallElevation(plan, derived, "w3")!.dimensions.filter((x) => x.chain === "fixtures");
    expect(chain.some((x) => Math.abs(x.valueMm - d.widthMm) < 0.01)).toBe(true);
    expect(dims.find((x) => x.note === "Height")!.valueMm).toBeCloseTo(d.heightMm, 6);
  });
});
