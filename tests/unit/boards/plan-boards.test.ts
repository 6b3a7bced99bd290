import { describe, it, expect } from "vitest";
import fc from "fast-check";
import type { Part } from "@/lib/engine/fixtures/types";
import { planBoards } from "@/lib/engine/boards/plan-boards";
import { DEFAULT_BOARD_LENGTHS_MM, DEFAULT_BOARD_WIDTHS_MM, DEFAULT_END_TRIM_MM, nominalWidthName } from "@/lib/engine/boards/stock";
import type { BoardPlan } from "@/lib/engine/boards/types";
import { threeCabinetRun, TEST_MATERIALS } from "../nesting/part-sets";

// 1/8 in full kerf (TRADE.md: practice); 1 in = 25.4 mm, 1 ft = 304.8 mm exactly (NIST SP 811, App. B).
const KERF = 3.175;

function board(id: string, lengthMm: number, widthMm: number, qty: number, materialId = "poplar-19"): Part {
  return { id, fixtureId: "f", name: id, qty, lengthMm, widthMm, thicknessMm: 19, materialId, stock: "board", grain: "length", edges: [], joinery: [] };
}

function checkPlan(parts: Part[], plan: BoardPlan, kerf: number, trim = DEFAULT_END_TRIM_MM): void {
  const seen = new Map<string, number>();
  for (const g of plan.groups) {
    for (const b of g.boards) {
      let prevEnd = -Infinity;
      for (const c of b.cuts) {
        seen.set(c.pieceKey, (seen.get(c.pieceKey) ?? 0) + 1);
        expect(c.offsetMm).toBeGreaterThanOrEqual(trim - 1e-6);
        expect(c.offsetMm + c.lengthMm).toBeLessThanOrEqual(b.lengthMm - trim + 1e-6);
        expect(c.offsetMm).toBeGreaterThanOrEqual(prevEnd + kerf - 1e-6);
        expect(c.widthMm).toBeLessThanOrEqual(b.widthMm + 1e-6);
        prevEnd = c.offsetMm + c.lengthMm;
      }
    }
    expect(g.boards.length).toBeGreaterThanOrEqual(g.lowerBound);
  }
  const skipped = new Set(plan.unplaced.map((u) => u.partId));
  for (const p of parts) if (p.stock === "board" && !skipped.has(p.id)) for (let i = 1; i <= p.qty; i++) expect(seen.get(`${p.id}#${i}`)).toBe(1);
}

describe("board stock", () => {
  it("has 6 to 12 ft lengths and dressed widths", () => {
    // 6 ft = 1828.8 mm, 12 ft = 3657.6 mm exactly; 1x4 dresses to 3-1/2 in = 88.9 mm (PS 20, from memory).
    expect(DEFAULT_BOARD_LENGTHS_MM[0]).toBeCloseTo(1828.8, 9);
    expect(DEFAULT_BOARD_LENGTHS_MM[3]).toBeCloseTo(3657.6, 9);
    expect(DEFAULT_BOARD_WIDTHS_MM[2]).toBeCloseTo(88.9, 9);
    expect(nominalWidthName(88.9)).toBe("1x4");
    // 2x stock dresses to 1-1/2 in = 38.1 mm thick (PS 20, from memory).
    expect(nominalWidthName(88.9, 38.1)).toBe("2x4");
    expect(nominalWidthName(100)).toBeUndefined();
  });
});

describe("planBoards", () => {
  it("buys the least length: six 1200 mm pieces on two 12 ft boards", () => {
    // A 12 ft board holds 3 (3 x 1203.175 = 3609.5 <= 3657.6 - 25.4 + 3.175); an 8 ft holds 2.
    // Two 12 ft boards and three 8 ft boards both total 7315.2 mm: fewer boards wins.
    const parts = [board("rail", 1200, 38.1, 6)];
    const plan = planBoards(parts, TEST_MATERIALS, { kerfMm: KERF });
    const g = plan.groups[0];
    expect(g.totalLengthMm).toBeCloseTo(7315.2, 6);
    expect(g.boards).toHaveLength(2);
    expect(g.stockWidthMm).toBeCloseTo(38.1, 6); // 1x2
    checkPlan(parts, plan, KERF);
  });

  it("mixes lengths: five 905 mm pieces on 5486.4 mm of board", () => {
    // Capacity = L - 2 x 12.7 + 3.175. 12 ft holds 4 (3632.7 <= 3635.375), 10 ft 3, 8 ft 2, 6 ft 1
    // (2 x 908.175 = 1816.35 > 1806.575): best is 12 + 6 or 10 + 8 ft = 18 ft.
    const parts = [board("stile", 905, 60, 5)];
    const plan = planBoards(parts, TEST_MATERIALS, { kerfMm: KERF });
    expect(plan.groups[0].totalLengthMm).toBeCloseTo(5486.4, 6);
    expect(plan.groups[0].boards).toHaveLength(2);
    expect(plan.groups[0].stockWidthMm).toBeCloseTo(63.5, 6); // 60 mm needs a 1x3 (2-1/2 in)
    checkPlan(parts, plan, KERF);
    // At 900 mm two fit a 6 ft board (1806.35 <= 1806.575), so 10 + 6 ft = 16 ft suffices.
    const short = planBoards([board("stile", 900, 60, 5)], TEST_MATERIALS, { kerfMm: KERF });
    expect(short.groups[0].totalLengthMm).toBeCloseTo(4876.8, 6);
  });

  it("reports pieces longer or wider than any board", () => {
    const parts = [board("long", 3700, 38, 1), board("wide", 1000, 300, 2), board("ok", 500, 38, 1)];
    const plan = planBoards(parts, TEST_MATERIALS, { kerfMm: KERF });
    expect(plan.unplaced.map((u) => u.partId).sort()).toEqual(["long", "wide"]);
    expect(plan.unplaced.find((u) => u.partId === "wide")?.qty).toBe(2);
    checkPlan(parts, plan, KERF);
  });

  it("plans the face frames of a three-cabinet run", () => {
    const parts = threeCabinetRun();
    const plan = planBoards(parts, TEST_MATERIALS, { kerfMm: KERF });
    checkPlan(parts, plan, KERF);
    const g = plan.groups[0];
    // Pieces: 6 stiles of 30.5 in and 12 rails; total piece length / bought length.
    expect(g.yieldPct).toBeGreaterThan(80);
    expect(g.boards.length).toBeLessThanOrEqual(g.lowerBound + 1);
  });

  it("never overfills a board and places each piece once (property)", () => {
    fc.assert(
      fc.property(
        fc.array(fc.record({ l: fc.integer({ min: 50, max: 3600 }), w: fc.integer({ min: 10, max: 280 }), q: fc.integer({ min: 1, max: 6 }) }), { minLength: 1, maxLength: 20 }),
        fc.constantFrom(0, 2.4, 3.175),
        (spec, kerf) => {
          const parts = spec.map((s, i) => board(`b${i}`, s.l, s.w, s.q));
          const plan = planBoards(parts, TEST_MATERIALS, { kerfMm: kerf });
          checkPlan(parts, plan, kerf);
        },
      ),
      { numRuns: 80, seed: 7 },
    );
  });
});

describe("planBoards purity", () => {
  it("does not change its input", () => {
    const parts = threeCabinetRun();
    const copy = structuredClone(parts);
    planBoards(parts, TEST_MATERIALS, { kerfMm: KERF, lengthsMm: [3657.6, 1828.8] });
    expect(parts).toEqual(copy);
  });
});
