import { describe, expect, it } from "vitest";
import { buildContext } from "@/lib/engine/checks/context";
import { evaluatePlan } from "@/lib/engine/checks/evaluate";
import { demoPlan } from "@/lib/engine/demo/demo-plan";
import { derivePlan } from "@/lib/engine/derive";
import { planView, planViewDimensions } from "@/lib/engine/drawings/plan-view";
import { frameOfWall, worldToWall } from "@/lib/engine/room/wall-frame";

const plan = demoPlan();
const derived = derivePlan(plan);
const dims = planViewDimensions(plan, derived, { detail: true });
const chain = (name: string) => dims.filter((x) => x.chain === name);
const placed = (id: string) => derived.fixtures.find((f) => f.id === id)!;
const fromPlanSheet = (p: { x: number; y: number }) => ({ x: p.x, y: -p.y });

describe("plan view detail of the demo plan", () => {
  it("keeps the plain plan view's dimensions as they were, and adds the detail only when asked", () => {
    const plain = planView(plan, derived);
    expect(planViewDimensions(plan, derived).map((d) => [d.chain, d.ref, d.text])).toEqual(plain.dimensions.map((d) => [d.chain, d.ref, d.text]));
    expect(plain.dimensions.every((d) => d.chain === "overall")).toBe(true);
    expect(planView(plan, derived, { detail: true }).dimensions.length).toBe(dims.length);
  });

  it("gives each wall fixture's depth from the wall's face to its front", () => {
    const wall = frameOfWall(derived.room.walls.find((w) => w.id === "w3")!);
    for (const id of ["cab-1", "saw", "upper-1"]) {
      const d = chain("depths").find((x) => x.ref === id)!;
      const front = Math.max(...placed(id).body.polygon.map((p) => worldToWall(wall, p).distanceFromWallMm));
      expect(d.valueMm, id).toBeCloseTo(front, 6);
      // It starts on the wall's face and ends at the fixture's front.
      expect(worldToWall(wall, fromPlanSheet(d.from)).distanceFromWallMm).toBeCloseTo(0, 1);
      expect(worldToWall(wall, fromPlanSheet(d.to)).distanceFromWallMm).toBeCloseTo(front, 1);
    }
  });

  it("gives the walkway in front of the base run as the walkway check measures it", () => {
    const ctx = buildContext(plan, derived);
    const saw = chain("walkways").find((x) => x.ref === "saw")!;
    expect(saw).toBeDefined();
    expect(saw.note).toMatch(/^Walkway in front of Miter saw station/);
    // Where the check passes it reports its full 36 in; the dimension goes on to what ends the way.
    const finding = evaluatePlan(plan, derived).find((f) => f.ruleId === "walkway" && f.subjectId === "saw");
    if (finding?.measured !== undefined) expect(saw.valueMm).toBeGreaterThanOrEqual(finding.measured - 0.5);
    expect(saw.valueMm).toBeGreaterThan(ctx.numbers.walkwayMinMm);
    // Neighbours in a run with the same clear way share one dimension.
    const refs = chain("walkways").map((x) => x.ref);
    expect(new Set(refs).size).toBe(refs.length);
    expect(refs).not.toContain("cab-2");
  });

  it("gives the clear length each side of the saw's blade, one on each side, as far as the stock path check sees", () => {
    const blade = chain("blade-clear").filter((x) => x.ref === "saw");
    expect(blade).toHaveLength(2);
    expect(blade.map((b) => b.note!.includes("on the left")).sort()).toEqual([false, true]);
    const findings = evaluatePlan(plan, derived).filter((f) => f.ruleId === "stock-path" && f.subjectId === "saw" && f.severity === "conflict");
    for (const f of findings) if (f.measured !== undefined) expect(Math.max(...blade.map((b) => b.valueMm))).toBeGreaterThanOrEqual(f.measured - 0.5);
    // Both start at the blade: the same point.
    expect(blade[0].from.x).toBeCloseTo(blade[1].from.x, 1);
  });
});
