import { describe, expect, it } from "vitest";
import { demoPlan } from "@/lib/engine/demo/demo-plan";
import { derivePlan } from "@/lib/engine/derive";
import { dimensionTextRect, fittingDimensionTexts } from "@/lib/engine/drawings/dimension-texts";
import { elevationSheetToRoom } from "@/lib/engine/drawings/sheet-to-world";
import { rectsOverlap } from "@/lib/engine/drawings/text-fit";
import { wallElevation } from "@/lib/engine/drawings/wall-elevation";
import { frameOfWall } from "@/lib/engine/room/wall-frame";
import { formatLength } from "@/lib/engine/units/format-length";

const plan = demoPlan();
const derived = derivePlan(plan);
const back = derived.room.walls.find((w) => w.id === "w3")!;
const L = back.solvedLengthMm!;
const plain = wallElevation(plan, derived, "w3")!;
const d = wallElevation(plan, derived, "w3", { detail: true })!;
const chain = (name: string) => d.dimensions.filter((x) => x.chain === name);
const fmt = (mm: number) => formatLength(mm, { units: plan.settings.units, precision: plan.settings.precision });
const placed = (id: string) => derived.fixtures.find((f) => f.id === id)!;
// Numbers come from the engine (counter height follows the plan's settings, whatever they are).
const counterTop = placed("cab-1").origin.z + placed("cab-1").workSurfaceMm!;

describe("the demo back wall's elevation, with the detail a woodworker checks", () => {
  it("keeps the running chains of the plain drawing, adding up to the solved wall length", () => {
    for (const name of ["fixtures", "wall-hung", "overall"]) {
      expect(chain(name).reduce((a, x) => a + x.valueMm, 0), name).toBeCloseTo(L, 6);
      expect(chain(name)).toEqual(plain.dimensions.filter((x) => x.chain === name));
    }
    // The plain drawing (shared page, packet) is unchanged by the option's existence.
    expect(plain.dimensions.some((x) => x.note !== undefined)).toBe(false);
  });

  it("gives the counter height from the floor at the viewer's left, named", () => {
    const levels = chain("levels");
    expect(levels).toHaveLength(1);
    expect(levels[0].valueMm).toBeCloseTo(counterTop, 6);
    expect(levels[0].note).toBe("Counter height");
    expect(levels[0].text).toBe(`Counter ${fmt(counterTop)}`);
    // Left of the wall's left corner, standing off it.
    expect(levels[0].line[0].x).toBeLessThan(0);
    expect(levels[0].line[1].y).toBeCloseTo(-counterTop, 1);
  });

  it("gives the saw shelf's top and the saw table above it, which adds up to the table height", () => {
    const saw = chain("fixture-heights").filter((x) => x.ref === "saw");
    expect(saw).toHaveLength(2);
    const tool = placed("saw").boxes.find((b) => b.role === "tool")!;
    expect(saw[0].valueMm).toBeCloseTo(placed("saw").origin.z + tool.z, 6);
    expect(saw[0].note).toMatch(/shelf top/);
    expect(saw[1].note).toMatch(/miter saw table above the shelf/);
    const table = placed("saw").origin.z + placed("saw").workSurfaceMm!;
    expect(saw[0].valueMm + saw[1].valueMm).toBeCloseTo(table, 6);
    // Drawn inside the saw station's bay on the drawing.
    const box = d.shapes.filter((s) => s.ref === "saw").flatMap((s) => s.points);
    const x = saw[0].line[0].x;
    expect(x).toBeGreaterThan(Math.min(...box.map((p) => p.x)));
    expect(x).toBeLessThan(Math.max(...box.map((p) => p.x)));
  });

  it("gives the clear gap from the counter to each upper cabinet, and none for what sits on the counter", () => {
    const gaps = chain("gaps");
    for (const id of ["upper-1", "upper-2"]) {
      const g = gaps.find((x) => x.ref === id)!;
      expect(g, id).toBeDefined();
      expect(g.valueMm).toBeCloseTo(placed(id).body.zMin - counterTop, 6);
      expect(g.note).toBe("Counter to Upper cabinet: clear gap");
    }
    expect(gaps.some((x) => x.ref === "stops")).toBe(false);
  });

  it("gives shelf and rack-arm heights on the side walls, each chain adding up to the top one", () => {
    const rack = wallElevation(plan, derived, "w2", { detail: true })!.dimensions.filter((x) => x.ref === "rack");
    const arms = placed("rack").boxes.filter((b) => b.role === "arm");
    const topArm = Math.max(...arms.map((b) => placed("rack").origin.z + b.z + b.h));
    expect(rack.length).toBe(new Set(arms.map((b) => b.z)).size);
    expect(rack.reduce((a, x) => a + x.valueMm, 0)).toBeCloseTo(topArm, 6);
    expect(rack[1].note).toContain("from the floor");
    const shelves = wallElevation(plan, derived, "w4", { detail: true })!.dimensions.filter((x) => x.ref === "shelves");
    expect(shelves.length).toBeGreaterThan(1);
  });

  it("lays text out at a given height for a live view, the chains unchanged in value", () => {
    const big = wallElevation(plan, derived, "w3", { detail: true, textSizeMm: 300 })!;
    expect(big.textSizeMm).toBe(300);
    expect(big.dimensions.map((x) => x.valueMm)).toEqual(d.dimensions.map((x) => x.valueMm));
  });

  it("maps elevation sheet points back onto the wall: the viewer's left is the wall's end corner", () => {
    const f = frameOfWall(back);
    const left = elevationSheetToRoom(f, { x: 0, y: 0 }, 0);
    expect(left.x).toBeCloseTo(back.end.x, 6);
    expect(left.y).toBeCloseTo(back.end.y, 6);
    const up = elevationSheetToRoom(f, { x: L, y: -1000 }, 5);
    expect(up.z).toBe(1000);
    expect(up.x).toBeCloseTo(back.start.x + back.inward.x * 5, 6);
  });
});

describe("dimension texts that fit at a zoom", () => {
  it("keeps texts that do not overlap and drops the rest, keeping every shown pair apart", () => {
    for (const size of [40, 111, 250, 600]) {
      const dd = wallElevation(plan, derived, "w3", { detail: true, textSizeMm: size })!;
      const shown = fittingDimensionTexts(dd.dimensions, size);
      expect(shown).toHaveLength(dd.dimensions.length);
      const boxes = dd.dimensions.filter((_, i) => shown[i]).map((x) => dimensionTextRect(x, size));
      for (let i = 0; i < boxes.length; i++) for (let j = i + 1; j < boxes.length; j++) expect(rectsOverlap(boxes[i], boxes[j])).toBe(false);
      // The overall length always shows.
      expect(shown[dd.dimensions.findIndex((x) => x.chain === "overall")]).toBe(true);
    }
    // Text far too large for the drawing: something has to go.
    const huge = wallElevation(plan, derived, "w3", { detail: true, textSizeMm: 600 })!;
    expect(fittingDimensionTexts(huge.dimensions, 600).some((x) => !x)).toBe(true);
  });
});
