import { describe, expect, it } from "vitest";
import { evaluatePlan } from "@/lib/engine/checks/evaluate";
import { FT, counter, derive, fixture, makePlan, obstacle, rectRoom } from "./helpers";

// Panel: NFPA 70 (NEC) Table 110.26(A)(1) depth 3 ft for 0-150 V; 110.26(A)(2) width 30 in; (A)(3) 6.5 ft; (E)(1)(a) dedicated space.
describe("panel working space rule", () => {
  const room = rectRoom(6000, 6000, 2743);
  const plan = (voltageClass = "0-150", condition = 1) =>
    makePlan(6000, 6000, {
      room: { obstacles: [{ id: "p", kind: "panel", placement: { mode: "wall", wallId: "w1", offsetMm: 1000, elevationMm: 1200 }, widthMm: 380, heightMm: 760, depthMm: 100, voltageClass, condition } as never] },
    });
  const panelBody = obstacle("p", "panel", 1000, 0, 380, 100, 1200, 1960);
  const cart = (y: number) => fixture("cart", { kind: "workbench", label: "Rolling cart", x: 900, y, w: 600, d: 600, h: 900 });
  const depthFinding = (p: ReturnType<typeof plan>, fx: ReturnType<typeof fixture>[]) =>
    evaluatePlan(p, derive(p, room, fx, [panelBody])).filter((f) => f.ruleId === "panel-working-space" && /clear in front|working space clear/.test(f.message))[0];

  it("3 ft clear in front passes; a cart 1 mm closer fails", () => {
    expect(depthFinding(plan(), [cart(100 + 3 * FT)]).pass).toBe(true);
    const f = depthFinding(plan(), [cart(100 + 3 * FT - 1)]);
    expect(f.pass).toBe(false);
    expect(f.measured).toBeCloseTo(914.4 - 1, 1);
    expect(f.required).toBeCloseTo(914.4, 1);
    expect(f.message).toContain("Rolling cart");
  });
  it("151-600 V condition 2 asks 3.5 ft", () => {
    const f = depthFinding(plan("151-600", 2), [cart(100 + 3.5 * FT - 1)]);
    expect(f.pass).toBe(false);
    expect(f.required).toBeCloseTo(1066.8, 1);
    expect(depthFinding(plan("151-600", 2), [cart(100 + 3.5 * FT)]).pass).toBe(true);
  });
  it("a base cabinet under the panel is in the dedicated space", () => {
    const p = plan();
    const fs = evaluatePlan(p, derive(p, room, [counter("under", 1000, 600)], [panelBody])).filter((f) => f.ruleId === "panel-working-space" && !f.pass);
    expect(fs.some((f) => /110\.26\(E\)/.test(f.message) && f.fixtureIds.includes("under"))).toBe(true);
  });
  it("headroom: a 6 ft 6 in ceiling passes, 1 mm lower fails", () => {
    const p = plan();
    const head = (ceil: number) =>
      evaluatePlan(p, derive(p, rectRoom(6000, 6000, ceil), [], [obstacle("p", "panel", 1000, 0, 380, 100, 1000, 1700)])).find((f) => /headroom|ceiling at/.test(f.message))!;
    expect(head(6.5 * FT).pass).toBe(true);
    expect(head(6.5 * FT - 1).pass).toBe(false);
  });
});

describe("doors, overhead door and windows clear (practice)", () => {
  const room = rectRoom(6000, 6000, 2743);
  const plan = makePlan(6000, 6000, {
    room: {
      openings: [
        { id: "d", kind: "entry-door", wallId: "w1", offsetMm: 1000, widthMm: 900, hinge: "left", swing: "in" },
        { id: "g", kind: "garage-door", wallId: "w3", offsetMm: 1000, widthMm: 2743, heightMm: 2134, trackDepthMm: 3300, trackDropMm: 380 },
      ],
    },
  });
  const find = (fx: ReturnType<typeof fixture>[], zone: string) => evaluatePlan(plan, derive(plan, room, fx)).filter((f) => f.ruleId === "openings-clear" && f.zoneIds.includes(zone));
  it("a cabinet beside the swing passes; one reaching 10 mm into it fails", () => {
    // Door from x = 1000 to 1900, hinged on the left as seen from inside the room (x = 1900 on wall w1): the swing reaches x = 1900.
    expect(find([counter("c", 1900, 600)], "d:swing")[0].pass).toBe(true);
    const f = find([counter("c", 1890, 600)], "d:swing")[0];
    expect(f.pass).toBe(false);
    // The swing is drawn as an 8-segment arc, so the depth is within a few hundredths of a mm.
    expect(f.measured).toBeCloseTo(10, 0);
  });
  it("a tall rack under the overhead door track fails; a counter under it passes", () => {
    // Wall w3 runs from (6000, 6000) to (0, 6000): the door spans x 2257..5000 and the track reaches y = 2700.
    const rack = fixture("rack", { kind: "lumber-rack", x: 3000, y: 3000, w: 600, d: 300, h: 2400 });
    expect(find([rack], "g:track")[0].pass).toBe(false);
    const low = fixture("bench", { kind: "workbench", x: 3000, y: 3000, w: 600, d: 600, h: 900 });
    expect(find([low], "g:track")[0].pass).toBe(true);
  });
});

describe("parking bay: vehicle and opened doors fit", () => {
  const plan = (D: number) =>
    makePlan(6000, D, {
      room: { obstacles: [{ id: "bay", kind: "parking-bay", placement: { mode: "wall", wallId: "w1", offsetMm: 500 }, vehicleLengthMm: 4900, vehicleWidthMm: 1900, doorSwingMm: 760 }] },
    });
  const run = (D: number, fx: ReturnType<typeof fixture>[] = []) => evaluatePlan(plan(D), derive(plan(D), rectRoom(6000, D), fx)).filter((f) => f.ruleId === "parking-bay");
  it("fits exactly in a room as deep as the car is long", () => {
    expect(run(4900).every((f) => f.pass)).toBe(true);
  });
  it("10 mm too short fails", () => {
    const f = run(4890).filter((x) => !x.pass);
    expect(f.length).toBeGreaterThan(0);
    expect(f[0].measured).toBeCloseTo(10, 1);
  });
  it("a cabinet in the door strip fails", () => {
    const cab = fixture("cab", { x: 700, y: 2000, w: 400, d: 400, h: 900 });
    const f = run(6000, [cab]).find((x) => !x.pass)!;
    expect(f.fixtureIds).toEqual(["cab"]);
    expect(f.measured).toBeCloseTo(400, 1);
  });
});

describe("collisions and fixtures inside the room (geometry, 1 mm tolerance of our own)", () => {
  const plan = makePlan(4000, 4000);
  const room = rectRoom(4000, 4000, 2400);
  const run = (fx: ReturnType<typeof fixture>[], obs: ReturnType<typeof obstacle>[] = []) => evaluatePlan(plan, derive(plan, room, fx, obs));
  it("touching neighbours pass; 2 mm of overlap fails", () => {
    expect(run([counter("a", 0, 600), counter("b", 600, 600)]).filter((f) => f.ruleId === "collisions")).toHaveLength(0);
    const f = run([counter("a", 0, 600), counter("b", 598, 600)]).filter((f) => f.ruleId === "collisions");
    expect(f).toHaveLength(1);
    expect(f[0].measured).toBeCloseTo(2, 1);
    expect(f[0].subjectId).toBe("a|b");
  });
  it("a cabinet on a water heater collides", () => {
    const f = run([counter("a", 0, 600)], [obstacle("wh", "water-heater", 500, 100, 560, 560, 0, 1500)]).filter((x) => x.ruleId === "collisions");
    expect(f[0].measured).toBeCloseTo(100, 1);
  });
  it("a fixture 5 mm through a wall fails; flush against it passes", () => {
    const inside = run([counter("a", 0, 600)]).find((f) => f.ruleId === "in-room")!;
    expect(inside.pass).toBe(true);
    const out = run([counter("a", -5, 600)]).find((f) => f.ruleId === "in-room")!;
    expect(out.pass).toBe(false);
    expect(out.measured).toBeCloseTo(5, 1);
  });
  it("a fixture taller than the ceiling fails", () => {
    const f = run([fixture("t", { x: 0, y: 0, w: 600, d: 300, h: 2410 })]).find((x) => x.ruleId === "in-room" && !x.pass)!;
    expect(f.shortfall).toBeCloseTo(10, 1);
  });
});
