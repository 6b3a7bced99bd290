import { describe, it, expect } from "vitest";
import { buildFromPlan } from "@/lib/engine/build";
import { compareLabels, fixtureLetter } from "@/lib/engine/build/labels";
import { demoPlan } from "@/lib/engine/demo/demo-plan";
import type { PlanDocument } from "@/lib/engine/plan/schema";

describe("part labels", () => {
  it("fixture letters run A..Z without I and O (they read as 1 and 0 in pencil), then AA, AB", () => {
    const first = Array.from({ length: 24 }, (_, i) => fixtureLetter(i)).join("");
    expect(first).toBe("ABCDEFGHJKLMNPQRSTUVWXYZ");
    expect(fixtureLetter(24)).toBe("AA");
    expect(fixtureLetter(25)).toBe("AB");
    expect(fixtureLetter(24 + 24 * 24)).toBe("AAA");
    expect(compareLabels("B2", "AA1")).toBeLessThan(0);
    expect(compareLabels("A10", "A9")).toBeGreaterThan(0);
  });

  it("identical parts of different fixtures merge into one row labelled after the first fixture", () => {
    const b = buildFromPlan(demoPlan());
    const sides = b.rows.find((r) => r.name === "Carcass side");
    expect(sides?.label).toBe("A3");
    // Four base cabinets of one size take two sides each.
    expect(sides?.qty).toBe(8);
    expect(sides?.fixtures.map((f) => `${f.letter}x${f.qty}`)).toEqual(["Ax2", "Bx2", "Dx2", "Ex2"]);
    // Every part id maps to its row's label.
    for (const r of b.rows) for (const id of r.partIds) expect(b.labelOf[id]).toBe(r.label);
    expect(new Set(b.rows.map((r) => r.label)).size).toBe(b.rows.length);
  });

  it("moving a fixture does not renumber; adding one appends a letter and keeps the rest", () => {
    const plan = demoPlan();
    const before = buildFromPlan(plan);
    const moved: PlanDocument = {
      ...plan,
      fixtures: plan.fixtures.map((f, i) => (i === 0 && f.placement.mode === "wall" ? { ...f, placement: { ...f.placement, offsetMm: f.placement.offsetMm + 600 } } : f)),
    };
    expect(moved.fixtures[0].placement).not.toEqual(plan.fixtures[0].placement);
    const after = buildFromPlan(moved);
    expect(after.labelOf).toEqual(before.labelOf);
    const added: PlanDocument = { ...plan, fixtures: [...plan.fixtures, { id: "new-shelf", kind: "shelf-run", label: "Extra shelves", placement: plan.fixtures[8].placement, params: {} }] };
    const grown = buildFromPlan(added);
    for (const [id, label] of Object.entries(before.labelOf)) expect(grown.labelOf[id]).toBe(label);
    expect(grown.fixtures.at(-1)?.letter).toBe(fixtureLetter(plan.fixtures.length));
  });
});
