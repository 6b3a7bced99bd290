import { describe, it, expect } from "vitest";
import { derivePlan } from "@/lib/engine/derive";
import { planPartsList } from "@/lib/engine/parts";
import { groupParts, hardwareTotals } from "@/lib/engine/parts/parts-list";
import { hardwareRows, partsListRows } from "@/lib/engine/parts/rows";
import { newPlanDocument } from "@/lib/engine/plan/defaults";
import { fixtureSchema } from "@/lib/engine/plan/schema";

const IN = 25.4;
const plan = (fixtures: unknown[]) => ({ ...newPlanDocument(), fixtures: fixtures.map((f) => fixtureSchema.parse(f)) });
const wall = (offsetMm: number) => ({ mode: "wall", wallId: "w1", offsetMm });

describe("plan parts list", () => {
  it("identical cabinets group into one line per part with doubled quantities", () => {
    const one = derivePlan(plan([{ id: "a", kind: "base-cabinet", placement: wall(0) }]));
    const two = derivePlan(plan([{ id: "a", kind: "base-cabinet", placement: wall(0) }, { id: "b", kind: "base-cabinet", placement: wall(800) }]));
    const l1 = groupParts(one.parts);
    const l2 = groupParts(two.parts);
    expect(l2).toHaveLength(l1.length);
    for (const line of l2) {
      const single = l1.find((x) => x.key === line.key)!;
      expect(line.qty).toBe(2 * single.qty);
      expect(line.fixtures.map((f) => f.fixtureId)).toEqual(["a", "b"]);
    }
    // Four carcass sides from two cabinets.
    expect(l2.find((x) => x.name === "Carcass side")!.qty).toBe(4);
  });

  it("different sizes stay on separate lines and every part is counted once", () => {
    const d = derivePlan(plan([{ id: "a", kind: "base-cabinet", placement: wall(0) }, { id: "b", kind: "base-cabinet", placement: wall(800), params: { widthMm: 24 * IN } }]));
    const lines = groupParts(d.parts);
    expect(lines.filter((x) => x.name === "Carcass bottom")).toHaveLength(2);
    expect(lines.filter((x) => x.name === "Carcass side")).toHaveLength(1);
    const total = d.parts.reduce((s, p) => s + p.qty, 0);
    expect(lines.reduce((s, l) => s + l.qty, 0)).toBe(total);
    expect(planPartsList(d).partCount).toBe(total);
  });

  it("hardware totals sum by key: 2 cabinets x 4 drawers = 8 pairs of 22 in slides, T-track in mm", () => {
    const d = derivePlan(plan([{ id: "a", kind: "base-cabinet", placement: wall(0) }, { id: "b", kind: "base-cabinet", placement: wall(800) }, { id: "t", kind: "stop-track", placement: wall(0), params: { lengthMm: 1200 } }]));
    const t = hardwareTotals(d.hardware);
    expect(t.find((x) => x.key === "slide-22in")).toMatchObject({ qty: 8, unit: "pair", fixtureIds: ["a", "b"] });
    expect(t.find((x) => x.key === "t-track")).toMatchObject({ qty: 1200, unit: "mm" });
    expect(t.find((x) => x.key === "pull")!.qty).toBe(8);
  });

  it("CSV-ready rows: a header and one row per line; lengths through a formatter", () => {
    const d = derivePlan(plan([{ id: "a", kind: "workbench", placement: wall(0) }]));
    const lines = groupParts(d.parts);
    const rows = partsListRows(lines, newPlanDocument().materials, (mm) => `${(mm / IN).toFixed(2)} in`);
    expect(rows[0][0]).toBe("Part");
    expect(rows).toHaveLength(lines.length + 1);
    const top = rows.find((r) => r[0] === "Bench top layer")!;
    expect(top[1]).toBe(2);
    expect(top[2]).toBe("72.00 in");
    expect(top[5]).toBe("3/4 in MDF (19 mm)");
    const hw = hardwareRows(hardwareTotals(d.hardware));
    expect(hw[0]).toEqual(["Item", "Key", "Qty", "Unit", "Fixtures"]);
  });
});
