import { describe, it, expect } from "vitest";
import fc from "fast-check";
import type { Grain, Part } from "@/lib/engine/fixtures/types";
import { nestSheets } from "@/lib/engine/nesting/nest-sheets";
import { conflictLowerBound, sheetLowerBound } from "@/lib/engine/nesting/bounds";
import { DEFAULT_TRIM_MM } from "@/lib/engine/nesting/pieces";
import type { NestResult } from "@/lib/engine/nesting/types";
import { cabinetParts, countPieces, fullShop, randomParts, TEST_MATERIALS, threeCabinetRun } from "./part-sets";
import { isGuillotine, layoutProblems, rects } from "./verify";

// Kerf 1/8 in = 3.175 mm, full-kerf blade (TRADE.md, common practice).
const KERF = 3.175;

function sheetPart(id: string, lengthMm: number, widthMm: number, grain: Grain, qty = 1, materialId = "ply-18"): Part {
  return { id, fixtureId: "f", name: id, qty, lengthMm, widthMm, thicknessMm: TEST_MATERIALS.find((m) => m.id === materialId)?.thicknessMm ?? 18, materialId, stock: "sheet", grain, edges: [], joinery: [] };
}

/** Every invariant the brief asks for, on one result. */
function checkAll(parts: Part[], res: NestResult, kerf: number): void {
  const placed = new Map<string, number>();
  for (const m of res.materials) {
    for (const s of m.sheets) {
      expect(layoutProblems(s, kerf)).toEqual([]);
      const usable = { x: s.usable.xMm, y: s.usable.yMm, w: s.usable.lenMm, h: s.usable.widMm };
      expect(isGuillotine(usable, rects(s), kerf)).toBe(true);
      for (const p of s.placements) {
        placed.set(p.pieceKey, (placed.get(p.pieceKey) ?? 0) + 1);
        const part = parts.find((x) => x.id === p.partId) as Part;
        expect(part.materialId).toBe(m.materialId);
        expect(part.thicknessMm).toBeCloseTo(m.thicknessMm, 1);
        // Grain runs along the sheet's length (x): a "length" part lies unrotated, a "width" part rotated.
        if (part.grain === "length") expect(p.rotated).toBe(false);
        if (part.grain === "width") expect(p.rotated).toBe(true);
        expect(p.rotated ? p.widMm : p.lenMm).toBeCloseTo(part.lengthMm, 6);
      }
      // Cuts are numbered 1..n and lie inside the usable area.
      expect(s.cuts.map((c) => c.seq)).toEqual(s.cuts.map((_, i) => i + 1));
    }
    expect(m.sheetsUsed).toBeGreaterThanOrEqual(m.lowerBound);
  }
  const unplaced = new Set(res.unplaced.map((u) => u.partId));
  for (const p of parts) {
    if (p.stock !== "sheet" || unplaced.has(p.id)) continue;
    for (let i = 1; i <= p.qty; i++) expect(placed.get(`${p.id}#${i}`), `${p.id}#${i}`).toBe(1);
  }
  expect([...placed.values()].every((n) => n === 1)).toBe(true);
}

describe("sheetLowerBound", () => {
  it("counts part area with kerf over usable area with kerf, rounded up", () => {
    // Four 600 x 1200 pieces, kerf 3: padded 603 x 1203 each = 2,901,636 mm2; usable 2400 x 1200 -> 2403 x 1203 = 2,890,809.
    const pieces = Array.from({ length: 4 }, () => ({ lengthMm: 600, widthMm: 1200 }));
    expect(sheetLowerBound(pieces, 2400, 1200, 3)).toBe(2);
    // With kerf 0 they fill exactly one sheet; float noise must not add one.
    expect(sheetLowerBound(pieces, 2400, 1200, 0)).toBe(1);
    expect(sheetLowerBound(pieces, 2400, 1200, 0, 2400 * 1200)).toBe(0);
  });
});

describe("nestSheets", () => {
  it("fits pieces that exactly fill the usable sheet with kerf between them", () => {
    // Usable 2425.7 x 1206.5 after 1/4 in trim; two pieces (2425.7 - k)/2 long fill the length exactly.
    const u = 2438.4 - 2 * DEFAULT_TRIM_MM;
    const w = 1219.2 - 2 * DEFAULT_TRIM_MM;
    const parts = [sheetPart("half", (u - KERF) / 2, w, "length", 2)];
    const res = nestSheets(parts, TEST_MATERIALS, { kerfMm: KERF, maxAttempts: 20 });
    expect(res.materials[0].sheetsUsed).toBe(1);
    expect(res.materials[0].lowerBound).toBe(1);
    checkAll(parts, res, KERF);
    // One crosscut separates them; nothing else to cut.
    expect(res.materials[0].sheets[0].cuts).toHaveLength(1);
    expect(res.materials[0].sheets[0].cuts[0].kind).toBe("crosscut");
  });

  it("keeps the grain along the sheet's length", () => {
    // Grain across the part: it must lie rotated, 1100 along the sheet. 2 x 1100 + k = 2203.2 <= 2425.7 usable: one sheet.
    const parts = [sheetPart("tall", 1190, 1100, "width", 2)];
    const res = nestSheets(parts, TEST_MATERIALS, { kerfMm: KERF, maxAttempts: 30 });
    expect(res.materials[0].sheetsUsed).toBe(1);
    checkAll(parts, res, KERF);
    // 1500 x 400 with grain across must stand 1500 across a 1206.5 usable width: it cannot be placed,
    // although it would fit turned the other way.
    const across = [sheetPart("across", 1500, 400, "width"), sheetPart("free", 1500, 400, "none")];
    const r2 = nestSheets(across, TEST_MATERIALS, { kerfMm: KERF, maxAttempts: 30 });
    expect(r2.unplaced.map((u) => u.partId)).toEqual(["across"]);
    expect(r2.unplaced[0].reason).toMatch(/grain along its length/);
    checkAll(across, r2, KERF);
  });

  it("drops the end trim only when a part needs the full length", () => {
    // An 8 ft part on a 2438.4 mm sheet: the ends stay as they came, the long edges are still trimmed.
    const parts = [sheetPart("cleat", 2438.4, 100, "length", 3), sheetPart("ok", 600, 600, "none")];
    const res = nestSheets(parts, TEST_MATERIALS, { kerfMm: KERF, maxAttempts: 10 });
    expect(res.unplaced).toEqual([]);
    const s = res.materials[0].sheets[0];
    expect(s.usable.xMm).toBe(0);
    expect(s.usable.yMm).toBeCloseTo(DEFAULT_TRIM_MM, 9);
    expect(res.materials[0].notes).toHaveLength(1);
    checkAll(parts, res, KERF);
  });

  it("reports parts larger than the sheet as unplaced", () => {
    const parts = [sheetPart("big", 2450, 600, "length"), sheetPart("ok", 600, 600, "none")];
    const res = nestSheets(parts, TEST_MATERIALS, { kerfMm: KERF, maxAttempts: 10 });
    expect(res.unplaced).toHaveLength(1);
    expect(res.unplaced[0].partId).toBe("big");
    expect(res.unplaced[0].reason).toMatch(/larger than the sheet/);
    checkAll(parts, res, KERF);
  });

  it("uses the user's offcuts before new sheets and keeps materials apart", () => {
    const parts = [sheetPart("a", 500, 400, "none", 2), sheetPart("b", 500, 400, "none", 1, "ply-12")];
    const res = nestSheets(parts, TEST_MATERIALS, {
      kerfMm: KERF,
      maxAttempts: 20,
      offcuts: [{ id: "left-1", materialId: "ply-18", lengthMm: 1100, widthMm: 450, qty: 1 }],
    });
    const ply18 = res.materials.find((m) => m.materialId === "ply-18");
    expect(ply18?.sheetsUsed).toBe(0);
    expect(ply18?.offcutsUsed).toBe(1);
    const ply12 = res.materials.find((m) => m.materialId === "ply-12");
    expect(ply12?.sheetsUsed).toBe(1);
    checkAll(parts, res, KERF);
  });

  it("orders cuts rip first and marks reusable offcuts", () => {
    const parts = cabinetParts("cab", 24, 4);
    const res = nestSheets(parts, TEST_MATERIALS, { kerfMm: KERF, maxAttempts: 40 });
    checkAll(parts, res, KERF);
    const s = res.materials.find((m) => m.materialId === "mdf-19")?.sheets[0];
    expect(s).toBeDefined();
    // The top and build-ups use 18% of the sheet (bench table): a large reusable offcut remains.
    expect(s?.offcuts.some((o) => o.reusable && o.lenMm * o.widMm > 1e6)).toBe(true);
    for (const m of res.materials) for (const sh of m.sheets) if (sh.cuts.length) expect(sh.cuts[0].level).toBe(1);
  });

  it("nests the three-cabinet run on the area bound and a full shop within bound + 1", () => {
    for (const parts of [threeCabinetRun(), fullShop()]) {
      const res = nestSheets(parts, TEST_MATERIALS, { kerfMm: KERF, seed: 1, maxAttempts: 200 });
      checkAll(parts, res, KERF);
      for (const m of res.materials) expect(m.sheetsUsed).toBeLessThanOrEqual(m.lowerBound + 1);
    }
  });

  it("nests 300 pieces validly within its search budget (the time goal lives in npm run bench)", () => {
    const parts = randomParts(3, 300);
    expect(countPieces(parts)).toBe(300);
    const res = nestSheets(parts, TEST_MATERIALS, { kerfMm: KERF, timeBudgetMs: 500 });
    checkAll(parts, res, KERF);
  });

  it("stops when the progress callback says so", () => {
    const parts = fullShop();
    let calls = 0;
    const res = nestSheets(parts, TEST_MATERIALS, { kerfMm: KERF, onProgress: () => ++calls < 5 });
    expect(res.stopped).toBe(true);
    expect(calls).toBe(5);
    checkAll(parts, res, KERF);
  });

  it("does not change its input", () => {
    const parts = threeCabinetRun();
    const copy = structuredClone(parts);
    nestSheets(parts, TEST_MATERIALS, { kerfMm: KERF, maxAttempts: 5 });
    expect(parts).toEqual(copy);
  });

  it("holds every invariant on random part sets (property)", () => {
    const partArb = fc.record({
      l: fc.integer({ min: 20, max: 2400 }),
      w: fc.integer({ min: 20, max: 1200 }),
      grain: fc.constantFrom<Grain>("length", "width", "none"),
      qty: fc.integer({ min: 1, max: 4 }),
      mat: fc.constantFrom("ply-18", "ply-12"),
    });
    fc.assert(
      fc.property(fc.array(partArb, { minLength: 1, maxLength: 25 }), fc.constantFrom(0, 2.4, 3.175), fc.integer({ min: 1, max: 1000 }), (spec, kerf, seed) => {
        const parts = spec.map((s, i) => ({ ...sheetPart(`p${i}`, s.l, s.w, s.grain, s.qty, s.mat), thicknessMm: s.mat === "ply-18" ? 18 : 12 }));
        const res = nestSheets(parts, TEST_MATERIALS, { kerfMm: kerf, seed, maxAttempts: 8 });
        checkAll(parts, res, kerf);
      }),
      { numRuns: 60, seed: 42 },
    );
  });
});

describe("test verifiers", () => {
  it("reject a pinwheel (not guillotine) and pieces closer than a kerf", () => {
    // Four 2 x 1 pieces around a 1 x 1 hole in a 3 x 3 box: no edge-to-edge cut frees any of them.
    const box = { x: 0, y: 0, w: 3, h: 3 };
    const pinwheel = [
      { x: 0, y: 0, w: 2, h: 1 },
      { x: 2, y: 0, w: 1, h: 2 },
      { x: 1, y: 2, w: 2, h: 1 },
      { x: 0, y: 1, w: 1, h: 2 },
    ];
    expect(isGuillotine(box, pinwheel, 0)).toBe(false);
    expect(isGuillotine(box, [pinwheel[0], { x: 0, y: 1, w: 3, h: 2 }], 0)).toBe(true);
    const sheet = { index: 1, stockId: "s", source: "new" as const, lengthMm: 100, widthMm: 100, usable: { xMm: 0, yMm: 0, lenMm: 100, widMm: 100 }, cuts: [], offcuts: [], partAreaMm2: 0, yieldPct: 0 };
    const p = (key: string, x: number) => ({ pieceKey: key, partId: key, name: key, xMm: x, yMm: 0, lenMm: 40, widMm: 40, rotated: false, grain: "none" as const });
    expect(layoutProblems({ ...sheet, placements: [p("a", 0), p("b", 42)] }, 3)).toHaveLength(1);
    expect(layoutProblems({ ...sheet, placements: [p("a", 0), p("b", 43)] }, 3)).toHaveLength(0);
    expect(layoutProblems({ ...sheet, placements: [p("a", 61)] }, 3)).toHaveLength(1);
  });
});

describe("conflictLowerBound", () => {
  it("counts pieces no two of which fit one sheet", () => {
    // Two 48 x 24 in panels, grain along the 48 in, on an untrimmed 2440 x 1220 mm sheet with a 1/8 in kerf:
    // end to end 1219.2 + 3.175 + 1219.2 = 2441.575 > 2440, side by side 609.6 + 3.175 + 609.6 = 1222.375 > 1220.
    const panel = { len: 1219.2, wid: 609.6, mode: 0 as const };
    expect(conflictLowerBound([panel, panel], 2440, 1220, KERF)).toBe(2);
    // With no kerf they fit side by side (1219.2 <= 1220); free to turn, they stand side by side along the length.
    expect(conflictLowerBound([panel, panel], 2440, 1220, 0)).toBe(1);
    expect(conflictLowerBound([{ ...panel, mode: 2 }, { ...panel, mode: 2 }], 2440, 1220, KERF)).toBe(1);
    // The area bound alone says 1 here: 2 x 1222.375 x 612.775 = 1,498,090 < 2443.175 x 1223.175 = 2,988,390.
    expect(sheetLowerBound([{ lengthMm: 1219.2, widthMm: 609.6 }, { lengthMm: 1219.2, widthMm: 609.6 }], 2440, 1220, KERF)).toBe(1);
    // 1300 x 700 with grain along the length: end to end 2603.2 > 2425.7 usable, side by side 1403.2 > 1206.5.
    const fixed = { len: 1300, wid: 700, mode: 0 as const };
    expect(conflictLowerBound([fixed, fixed, fixed], 2425.7, 1206.5, KERF)).toBe(3);
  });
});
