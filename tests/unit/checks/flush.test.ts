import { describe, expect, it } from "vitest";
import { evaluatePlan } from "@/lib/engine/checks/evaluate";
import { IN, counter, derive, fixture, makePlan, rectRoom } from "./helpers";

// Flush tolerance 1/32 in (0.79375 mm), the plan's default setting (practice; PS 1 thickness tolerance is +/-1/32 in).
const TOL = IN / 32;

function setup(tableMm: number, preset?: Record<string, number>) {
  const plan = makePlan(6000, 4000);
  const room = rectRoom(6000, 4000);
  const shelf = fixture("saw", { kind: "tool-shelf", label: "Miter station", x: 1000, y: 0, w: 600, d: 610, h: 800, work: tableMm });
  const d = derive(plan, room, [counter("left", 0, 1000), shelf, counter("right", 1600, 1000)]);
  return evaluatePlan(plan, d, { preset }).filter((f) => f.ruleId === "table-flush");
}

describe("tool table flush with the counters (tolerance 1/32 in, plan setting)", () => {
  it("passes just inside the tolerance on both sides", () => {
    const f = setup(36 * IN - (TOL - 0.01));
    expect(f).toHaveLength(2);
    expect(f.every((x) => x.pass)).toBe(true);
  });
  it("fails just outside the tolerance and says by how much", () => {
    const f = setup(36 * IN - (TOL + 0.01));
    expect(f.every((x) => !x.pass && x.severity === "conflict")).toBe(true);
    expect(f[0].measured).toBeCloseTo(TOL + 0.01, 2);
    expect(f[0].shortfall).toBeCloseTo(0.01, 2);
    expect(f[0].message).toMatch(/below/);
  });
  it("a class preset can tighten the tolerance, and the finding says so", () => {
    const f = setup(36 * IN - 0.6, { flushToleranceMm: 0.5 });
    expect(f[0].pass).toBe(false);
    expect(f[0].message).toContain("(class preset)");
    expect(setup(36 * IN - 0.6)[0].pass).toBe(true);
  });
});
