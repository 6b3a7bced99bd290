import { describe, expect, it } from "vitest";
import { evaluatePlan } from "@/lib/engine/checks/evaluate";
import type { Finding } from "@/lib/engine/checks/types";
import { FT, IN, counter, derive, fixture, makePlan, rectRoom } from "./helpers";

// Longest stock 8 ft (plan default, 2438.4 mm); support each side at least half of it so the board
// cannot tip (statics: centre of mass over the support). Stock band 1-1/2 in above the table (practice).
const L = 8 * FT;
const TABLE = 36 * IN;

/** A miter station 600 mm wide with its blade 300 mm from its left end, and stock-path zones each side. */
function station(x: number) {
  return fixture("saw", {
    kind: "tool-shelf",
    label: "Miter station",
    x,
    y: 0,
    w: 600,
    d: 610,
    h: 700,
    work: TABLE,
    zones: [
      { purpose: "stock-path-left", x: 300 - L, y: 100, z: TABLE, w: L, d: 140, h: 38 },
      { purpose: "stock-path-right", x: 300, y: 100, z: TABLE, w: L, d: 140, h: 38 },
    ],
  });
}

function run(roomW: number, sawX: number, extra: ReturnType<typeof fixture>[], rightCounterEnd?: number): Finding[] {
  const plan = makePlan(roomW, 4000);
  const room = rectRoom(roomW, 4000);
  const fx = [station(sawX), counter("cl", sawX - 1300, 1300), counter("cr", sawX + 600, (rightCounterEnd ?? sawX + 1900) - (sawX + 600)), ...extra];
  return evaluatePlan(plan, derive(plan, room, fx)).filter((f) => f.ruleId === "stock-path");
}

const clearOf = (fs: Finding[], side: string) => fs.find((f) => f.severity === "conflict" && f.message.includes(`${side} of the blade`))!;
const supportOf = (fs: Finding[], side: string) => fs.find((f) => f.severity === "caution" && f.message.includes(`${side} of the blade`))!;

describe("stock path at the miter saw (clear length >= longest stock each side)", () => {
  it("passes with room and counters both sides", () => {
    const fs = run(9000, 3000, []);
    expect(fs).toHaveLength(4);
    expect(fs.every((f) => f.pass)).toBe(true);
  });

  it("is blocked by a lumber rack standing in the path, and says where and by what", () => {
    const rack = fixture("rack", { kind: "lumber-rack", label: "Lumber rack", x: 5000, y: 0, w: 300, d: 300, h: 2000 });
    const f = clearOf(run(9000, 3000, [rack]), "right");
    expect(f.pass).toBe(false);
    expect(f.measured).toBeCloseTo(5000 - 3300, 1);
    expect(f.shortfall).toBeCloseTo(L - 1700, 1);
    expect(f.message).toContain("Lumber rack");
    expect(f.fixtureIds).toContain("rack");
    expect(f.at?.x).toBeCloseTo(5000, 0);
  });

  it("rack at exactly the longest stock passes; 2.4 mm closer fails", () => {
    const at = (x: number) => clearOf(run(9000, 3000, [fixture("rack", { kind: "lumber-rack", x, y: 0, w: 300, d: 300, h: 2000 })]), "right");
    expect(at(3300 + L).pass).toBe(true);
    expect(at(3300 + L - 2.4).pass).toBe(false);
  });

  it("a wall cabinet above the stock band does not block it", () => {
    const wc = fixture("wc", { kind: "wall-cabinet", x: 4000, y: 0, z: 54 * IN, w: 600, d: 300, h: 760 });
    expect(clearOf(run(9000, 3000, [wc]), "right").pass).toBe(true);
  });

  it("is blocked by the wall: blade 2438 mm from the wall passes, 2 mm closer fails", () => {
    // Blade at sawX + 300; the left wall is at x = 0.
    const pass = clearOf(run(9000, L - 300, []), "left");
    expect(pass.pass).toBe(true);
    const fail = clearOf(run(9000, L - 302, []), "left");
    expect(fail.pass).toBe(false);
    expect(fail.measured).toBeCloseTo(L - 2, 1);
    expect(fail.message).toMatch(/wall w4/);
  });

  it("support at table height: half the longest stock passes, 2 mm less fails", () => {
    expect(supportOf(run(9000, 3000, [], 3300 + L / 2), "right").pass).toBe(true);
    const short = supportOf(run(9000, 3000, [], 3300 + L / 2 - 2), "right");
    expect(short.pass).toBe(false);
    expect(short.measured).toBeCloseTo(L / 2 - 2, 1);
    expect(short.required).toBeCloseTo(L / 2, 1);
  });
});
