import { describe, expect, it } from "vitest";
import { evaluatePlan } from "@/lib/engine/checks/evaluate";
import type { Part } from "@/lib/engine/fixtures/types";
import { FT, IN, counter, derive, fixture, makePlan, rectRoom } from "./helpers";

const room = rectRoom(5000, 5000, 2743);

describe("counter height vs elbow height (Grandjean: light work 10-15 cm below the elbow, heavy 15-40 cm)", () => {
  const run = (topMm: number, elbow = 1090) => {
    const plan = makePlan(5000, 5000, { settings: { elbowHeightMm: elbow } });
    return evaluatePlan(plan, derive(plan, room, [fixture("bench", { kind: "workbench", x: 0, y: 0, w: 1500, d: 700, h: topMm, work: topMm })])).find((f) => f.ruleId === "counter-height")!;
  };
  it("10 cm below the elbow is light work; 9.9 cm is too high", () => {
    expect(run(990).pass).toBe(true);
    expect(run(990).message).toMatch(/light work/);
    const f = run(990.6);
    expect(f.pass).toBe(false);
    expect(f.required).toBe(100);
  });
  it("40 cm below is the heavy-work limit; 40.1 cm is too low", () => {
    expect(run(690).pass).toBe(true);
    expect(run(690).message).toMatch(/heavy work/);
    const f = run(689.4);
    expect(f.pass).toBe(false);
    expect(f.required).toBe(400);
    expect(f.shortfall).toBeCloseTo(0.6, 1);
  });
  it("a 36 in counter for a 1090 mm elbow (Pheasant, 50th percentile man; memory) is 175.6 mm below: heavy work", () => {
    const f = run(36 * IN);
    expect(f.measured).toBeCloseTo(1090 - 914.4, 1);
    expect(f.message).toMatch(/heavy work/);
  });
  it("without an elbow height, estimates 0.62 x stature (1755 mm -> 1088 mm)", () => {
    const plan = makePlan(5000, 5000);
    const f = evaluatePlan(plan, derive(plan, room, [counter("c", 0, 600)])).find((x) => x.ruleId === "counter-height")!;
    expect(f.measured).toBeCloseTo(1088 - 914.4, 1);
  });
});

describe("wall cabinets: 18 in above counters (practice), clear of the saw head", () => {
  const run = (bottom: number, extra: ReturnType<typeof fixture>[] = []) => {
    const plan = makePlan(5000, 5000);
    const wc = fixture("wc", { kind: "wall-cabinet", label: "Wall cabinet", x: 0, y: 0, z: bottom, w: 600, d: 305, h: 760 });
    return evaluatePlan(plan, derive(plan, room, [counter("c", 0, 1200), wc, ...extra])).filter((f) => f.ruleId === "wall-cabinet-clearance");
  };
  it("18 in above the counter passes; 1 mm less fails", () => {
    expect(run(36 * IN + 18 * IN)[0].pass).toBe(true);
    const f = run(36 * IN + 18 * IN - 1)[0];
    expect(f.pass).toBe(false);
    expect(f.measured).toBeCloseTo(18 * IN - 1, 1);
  });
  it("a wall cabinet in the miter saw's raised-head zone is a conflict", () => {
    const saw = fixture("saw", { kind: "tool-shelf", x: 1200, y: 0, w: 600, d: 610, h: 700, work: 36 * IN, zones: [{ purpose: "miter-head", x: 0, y: 0, z: 36 * IN, w: 600, d: 610, h: 600 }] });
    const wc = fixture("wc2", { kind: "wall-cabinet", x: 1300, y: 0, z: 36 * IN + 500, w: 400, d: 305, h: 700 });
    const plan = makePlan(5000, 5000);
    const f = evaluatePlan(plan, derive(plan, room, [saw, wc])).find((x) => x.ruleId === "wall-cabinet-clearance" && x.subjectId === "wc2")!;
    expect(f.pass).toBe(false);
    expect(f.severity).toBe("conflict");
    expect(f.measured).toBeCloseTo(100, 1);
  });
});

describe("reach to top shelves (ADA 2010 308.2, a conservative reference)", () => {
  const run = (top: number, overCounter: boolean) => {
    const plan = makePlan(5000, 5000);
    const shelfRun = fixture("sr", { kind: "shelf-run", label: "Shelves", x: 0, y: 0, z: overCounter ? 36 * IN + 18 * IN : 0, w: 900, d: 300, h: 100, boxes: [] });
    shelfRun.body = { ...shelfRun.body, zMax: top as never };
    const fx = overCounter ? [counter("c", 0, 900), shelfRun] : [shelfRun];
    return evaluatePlan(plan, derive(plan, room, fx)).find((f) => f.ruleId === "reach")!;
  };
  it("48 in unobstructed passes, 1 mm more is advice", () => {
    expect(run(48 * IN, false).pass).toBe(true);
    const f = run(48 * IN + 1, false);
    expect(f.pass).toBe(false);
    expect(f.severity).toBe("advice");
    expect(f.message).toMatch(/conservative reference/);
  });
  it("over a 24 in counter the limit is 44 in", () => {
    const f = run(60 * IN, true);
    expect(f.required).toBeCloseTo(44 * IN, 1);
  });
});

describe("drawers open fully (pull-out zones)", () => {
  const run = (gap: number) => {
    const plan = makePlan(5000, 5000);
    const cab = counter("cab", 1000, 600, { zones: [{ purpose: "drawer-pull", x: 20, y: 24 * IN, z: 100, w: 560, d: 508, h: 700 }] });
    const post = fixture("post", { kind: "workbench", label: "Bench", x: 900, y: 24 * IN + gap, w: 800, d: 600, h: 900 });
    return evaluatePlan(plan, derive(plan, room, [cab, post])).find((f) => f.ruleId === "pull-out")!;
  };
  it("a bench 20 in (the slide length) in front passes; 1 mm closer fails", () => {
    expect(run(508).pass).toBe(true);
    const f = run(507);
    expect(f.pass).toBe(false);
    expect(f.measured).toBeCloseTo(507, 1);
    expect(f.message).toMatch(/Bench/);
  });
});

// Worked example (TRADE.md, derived from AWC Design Aid No. 6 and Wood Handbook Table 5-3b): 3/4 x 11-1/4 in
// shelf, 36 in span, 20 lb/ft: red oak 0.0506 in (within 0.02 in/ft x 3 ft = 0.06 in), eastern white pine 0.0743 in (over).
describe("shelf sag against 0.02 in per foot (practice)", () => {
  const shelf = (materialId: string): Part => ({
    id: "sr:shelf-1",
    fixtureId: "sr",
    name: "Shelf",
    qty: 1,
    lengthMm: 36 * IN,
    widthMm: 11.25 * IN,
    thicknessMm: 0.75 * IN,
    materialId,
    stock: "board",
    grain: "length",
    edges: [],
    joinery: [],
  });
  const run = (materialId: string, preset?: Record<string, number>) => {
    const plan = makePlan(5000, 5000);
    const sr = fixture("sr", { kind: "shelf-run", x: 0, y: 0, w: 36 * IN, d: 300, h: 1800 });
    return evaluatePlan(plan, derive(plan, room, [sr], [], [shelf(materialId)]), { preset }).find((f) => f.ruleId === "shelf-sag")!;
  };
  it("red oak passes with 0.0506 in", () => {
    const f = run("red-oak-19");
    expect(f.pass).toBe(true);
    expect(f.measured! / 25.4).toBeCloseTo(0.0506, 3);
    expect(f.required! / 25.4).toBeCloseTo(0.06, 3);
  });
  it("eastern white pine fails with 0.0743 in", () => {
    const f = run("pine-19");
    expect(f.pass).toBe(false);
    expect(f.measured! / 25.4).toBeCloseTo(0.0743, 3);
  });
  it("a shelf run's own load: 60 lb at the centre of the red oak shelf gives 0.0810 in, over 0.06 in", () => {
    const plan = makePlan(5000, 5000, {
      fixtures: [{ id: "sr", kind: "shelf-run", placement: { mode: "free", xMm: 0, yMm: 0 }, params: { loadLbPerFt: 0, centreLoadLb: 60, longTerm: false, stiffnessKey: "northern-red-oak" } }],
    });
    const sr = fixture("sr", { kind: "shelf-run", x: 0, y: 0, w: 36 * IN, d: 300, h: 1800 });
    const f = evaluatePlan(plan, derive(plan, room, [sr], [], [shelf("ply-18")])).find((x) => x.ruleId === "shelf-sag")!;
    expect(f.measured! / 25.4).toBeCloseTo(0.081, 3);
    expect(f.pass).toBe(false);
  });
  it("a preset limit of 0.016 in/ft fails the oak shelf and says so", () => {
    const f = run("red-oak-19", { sagLimitMmPerM: (0.016 * 25.4) / 0.3048 });
    expect(f.pass).toBe(false);
    expect(f.message).toContain("(class preset)");
  });
});

// Reach from H2's stop table: min = start from blade; max = start + length - stop width (geometry).
describe("stop settings within the track's reach (geometry)", () => {
  const run = (cuts: number[]) => {
    const track = fixture("track", { kind: "stop-track", x: 1400, y: 0, z: 36 * IN, w: 1200, d: 38, h: 76 });
    const params = { lengthMm: 1200, startFromBladeMm: 50, stopWidthMm: 50, kerfSide: "away", cutLengthsMm: cuts };
    const plan = makePlan(5000, 5000, { fixtures: [{ id: "track", kind: "stop-track", placement: { mode: "free", xMm: 1400, yMm: 0 }, params }] });
    return evaluatePlan(plan, derive(plan, room, [counter("c", 1300, 2000), track])).filter((f) => f.ruleId === "stop-reach");
  };
  it("a cut at the far end of the reach (50 + 1200 - 50 = 1200 mm) passes; 1 mm more fails", () => {
    const fs = run([1200, 1201]);
    const a = fs.find((f) => f.measured === 1200)!;
    const b = fs.find((f) => f.measured === 1201)!;
    expect(a.pass).toBe(true);
    expect(b.pass).toBe(false);
    expect(b.shortfall).toBeCloseTo(1, 1);
  });
  it("a cut shorter than the track's start from the blade fails", () => {
    expect(run([49])[0].pass).toBe(false);
    expect(run([50])[0].pass).toBe(true);
  });
});

describe("cautions (advice, deferring to local codes)", () => {
  it("saws bring guarding (OSHA 1910.213(b)(3)) and dust (NIOSH REL 1 mg/m3); tall units bring anchoring (ASTM F2057 scope)", () => {
    const plan = makePlan(5000, 5000, { room: { obstacles: [{ id: "p", kind: "panel", placement: { mode: "wall", wallId: "w2", offsetMm: 1000, elevationMm: 1200 } }] } });
    const fx = [fixture("saw", { kind: "tool-shelf", x: 1000, y: 0, w: 600, d: 610, h: 700, work: 36 * IN }), fixture("tall", { kind: "shelf-run", x: 2000, y: 0, w: 900, d: 300, h: 27 * IN })];
    const fs = evaluatePlan(plan, derive(plan, room, fx));
    const ids = new Set(fs.filter((f) => f.severity === "advice").map((f) => f.ruleId));
    for (const id of ["saw-guarding", "wood-dust", "anchor-fixtures", "electrical-work"]) expect(ids.has(id)).toBe(true);
    expect(fs.find((f) => f.ruleId === "saw-guarding")!.message).toMatch(/Local codes and licensed practice come first/);
    expect(fs.some((f) => f.ruleId === "anchor-fixtures" && f.subjectId === "tall")).toBe(true);
  });
  it("a unit just under 27 in on the floor gets no anchoring advice", () => {
    const plan = makePlan(5000, 5000);
    const fs = evaluatePlan(plan, derive(plan, room, [fixture("low", { x: 0, y: 0, w: 600, d: 300, h: 27 * IN - 1 })]));
    expect(fs.some((f) => f.ruleId === "anchor-fixtures")).toBe(false);
  });
  it("feet helper: 3 ft = 914.4 mm (NIST SP 811)", () => expect(3 * FT).toBeCloseTo(914.4, 9));
});

// Table saw on a mobile base: infeed and outfeed the longest stock (8 ft, plan default); outfeed support about
// 4 ft past the blade (occupational safety guidance, secondary copy; TRADE.md).
describe("table saw infeed, outfeed and outfeed support", () => {
  const L = 8 * FT;
  const run = (wallGap: number, outfeedTable = 0) => {
    // Saw 800 x 700 free in the room, blade 100 mm in from the front; infeed runs toward +y, outfeed toward -y.
    const y0 = 3000;
    const saw = fixture("ts", {
      kind: "mobile-base",
      label: "Table saw",
      x: 2000,
      y: y0,
      w: 800,
      d: 700,
      h: 900,
      work: 900,
      zones: [
        { purpose: "infeed", x: 350, y: 600, z: 900, w: 100, d: L, h: 150 },
        { purpose: "outfeed", x: 350, y: 600 - L, z: 900, w: 100, d: L, h: 150 },
        { purpose: "outfeed-support", x: 350, y: 600 - 4 * FT, z: 899, w: 100, d: 4 * FT - 600, h: 1 },
      ],
    });
    const D = y0 + 600 + L + wallGap;
    const plan = makePlan(6000, D);
    const fx = [saw];
    if (outfeedTable) fx.push(fixture("ot", { kind: "workbench", x: 2000, y: y0 - outfeedTable, w: 800, d: outfeedTable, h: 900, work: 900 }));
    return evaluatePlan(plan, derive(plan, rectRoom(6000, D), fx)).filter((f) => f.ruleId === "saw-infeed-outfeed");
  };
  it("infeed passes with the wall exactly 8 ft from the blade, fails 1 mm closer", () => {
    expect(run(0).find((f) => f.message.includes("infeed"))!.pass).toBe(true);
    const f = run(-1).find((x) => x.message.includes("infeed"))!;
    expect(f.pass).toBe(false);
    expect(f.measured).toBeCloseTo(L - 1, 1);
  });
  it("outfeed support: a table reaching 4 ft past the blade passes, a shorter one fails", () => {
    expect(run(10, 4 * FT - 600).find((f) => f.message.includes("outfeed supported"))!.pass).toBe(true);
    const f = run(10, 4 * FT - 610).find((x) => x.message.includes("outfeed supported"))!;
    expect(f.pass).toBe(false);
    expect(f.shortfall).toBeCloseTo(10, 1);
  });
});

describe("advice rules apply only when their hazard is in the plan", () => {
  const part = (name: string): Part => ({ id: `c:${name}`, fixtureId: "c", name, qty: 1, lengthMm: 600, widthMm: 600, thicknessMm: 1, materialId: "hpl", stock: "sheet", grain: "none", edges: [], joinery: [] });
  const run = (parts: Part[], fx = [counter("c", 0, 600)]) => {
    const plan = makePlan(5000, 5000);
    return evaluatePlan(plan, derive(plan, room, fx, [], parts));
  };
  it("contact cement fumes (Ontario MOL hazard alert; CPSC 16 CFR 1302) with a laminate part, not without", () => {
    expect(run([part("Countertop laminate")]).some((f) => f.ruleId === "solvent-fumes" && f.fixtureIds.includes("c"))).toBe(true);
    expect(run([part("Countertop core")]).some((f) => f.ruleId === "solvent-fumes")).toBe(false);
  });
  it("no saw, no guarding or dust advice (OSHA 1910.213(b)(3); NIOSH REL 1 mg/m3); no panel, no electrical advice", () => {
    const ids = new Set(run([]).map((f) => f.ruleId));
    for (const id of ["saw-guarding", "wood-dust", "electrical-work"]) expect(ids.has(id)).toBe(false);
  });
  it("a wall cabinet clear of the raised saw head passes (geometry of the fixture's zone)", () => {
    const saw = fixture("saw", { kind: "tool-shelf", x: 1200, y: 0, w: 600, d: 610, h: 700, work: 36 * IN, zones: [{ purpose: "miter-head", x: 0, y: 0, z: 36 * IN, w: 600, d: 610, h: 600 }] });
    const wc = fixture("wc2", { kind: "wall-cabinet", x: 1300, y: 0, z: 36 * IN + 600, w: 400, d: 305, h: 700 });
    const plan = makePlan(5000, 5000);
    const f = evaluatePlan(plan, derive(plan, room, [saw, wc])).find((x) => x.ruleId === "wall-cabinet-clearance" && x.subjectId === "wc2")!;
    expect(f.pass).toBe(true);
  });
});
