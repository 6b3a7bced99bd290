/**
 * Sheet nesting: sheets used by our guillotine nester against maxrects-packer (free-form, not
 * guillotine, so a strong reference) with padding = kerf, and against the area lower bound.
 * Part sets are hand-built cabinets and random sets with fixed seeds.
 */
import type { BenchTable } from "../bench";
import type * as MaxRectsTypes from "maxrects-packer";
import type { Rectangle } from "maxrects-packer/dist/geom/Rectangle";
import type { Part } from "../../lib/engine/fixtures/types";
import { nestSheets } from "../../lib/engine/nesting/nest-sheets";
import { DEFAULT_TRIM_MM } from "../../lib/engine/nesting/pieces";
import { planParts } from "../../components/parts/plan-parts";
import { demoPlan } from "../../lib/engine/demo/demo-plan";
import { generatePlan } from "../../lib/engine/demo/generate-plan";
import type { Material } from "../../lib/engine/plan/schema";
import { cabinetParts, countPieces, fullShop, randomParts, TEST_MATERIALS, threeCabinetRun } from "../../tests/unit/nesting/part-sets";
import { fmt, timeIt } from "./timing";

export const title = "Sheet nesting";
export const order = 40;

const KERF = 3.175; // 1/8 in full kerf (TRADE.md: practice)
// On Node 20 the bare name resolves to a CommonJS build that fails; load the ES module build (TRADE.md).
const MAXRECTS_ESM = "maxrects-packer/dist/maxrects-packer.mjs";
type MaxRects = typeof MaxRectsTypes & { Rectangle: typeof Rectangle };

/** maxrects-packer's best of two sort logics: sheets per material, and its time. */
function maxrects(lib: MaxRects, parts: Part[], materialId: string, thicknessMm: number, L: number, W: number): { sheets: number; ms: number } {
  const rects = () => {
    const out: Rectangle[] = [];
    for (const p of parts) {
      if (p.stock !== "sheet" || p.materialId !== materialId || Math.round(p.thicknessMm * 10) / 10 !== thicknessMm) continue;
      for (let i = 0; i < p.qty; i++) {
        // Grain along the sheet's length: grained pieces are fixed, as in our nester.
        const w = p.grain === "width" ? p.widthMm : p.lengthMm;
        const h = p.grain === "width" ? p.lengthMm : p.widthMm;
        out.push(new lib.Rectangle(w, h, 0, 0, false, p.grain === "none"));
      }
    }
    return out;
  };
  let best = Infinity;
  const t = performance.now();
  for (const logic of [lib.PACKING_LOGIC.MAX_AREA, lib.PACKING_LOGIC.MAX_EDGE]) {
    const packer = new lib.MaxRectsPacker(L, W, KERF, { smart: false, pot: false, square: false, allowRotation: true, border: 0, logic });
    packer.addArray(rects());
    best = Math.min(best, packer.bins.length);
  }
  return { sheets: best, ms: performance.now() - t };
}

export async function run(): Promise<BenchTable[]> {
  const lib = (await import(MAXRECTS_ESM)) as MaxRects;
  const demo = demoPlan();
  const gen = generatePlan(40, 1);
  const sets: [string, Part[], Material[]][] = [
    ["one cabinet", cabinetParts("cab", 24, 4), TEST_MATERIALS],
    ["three-cabinet run", threeCabinetRun(), TEST_MATERIALS],
    ["full shop (by hand)", fullShop(), TEST_MATERIALS],
    ["demo plan", planParts(demo).parts, demo.materials],
    ["generated plan (40 fixtures, seed 1)", planParts(gen).parts, gen.materials],
    ["random 60 (seed 1)", randomParts(1, 60), TEST_MATERIALS],
    ["random 150 (seed 2)", randomParts(2, 150, 2), TEST_MATERIALS],
    ["random 300 (seed 3)", randomParts(3, 300), TEST_MATERIALS],
  ];
  const rows: (string | number)[][] = [];
  const timing: (string | number)[][] = [];
  for (const [name, parts, materials] of sets) {
    const t = timeIt(() => nestSheets(parts, materials, { kerfMm: KERF, seed: 1 }), { warmup: 1, runs: 5 });
    // Sheet counts from a warm run, as in the app where the worker stays loaded.
    const res = nestSheets(parts, materials, { kerfMm: KERF, seed: 1 });
    let mrMs = 0;
    for (const m of res.materials) {
      // The same usable area as ours (trim dropped where a part needs the full length).
      const u = m.sheets.find((s) => s.source === "new")?.usable ?? { lenMm: m.sheetLengthMm - 2 * DEFAULT_TRIM_MM, widMm: m.sheetWidthMm - 2 * DEFAULT_TRIM_MM };
      const mr = maxrects(lib, parts, m.materialId, m.thicknessMm, u.lenMm, u.widMm);
      mrMs += mr.ms;
      const pieces = m.sheets.reduce((s, sh) => s + sh.placements.length, 0);
      const verdict = m.sheetsUsed <= mr.sheets && m.sheetsUsed <= m.lowerBound + 1 ? "ok" : "MISS";
      rows.push([name, `${m.materialId} (${m.thicknessMm} mm)`, pieces, m.sheetsUsed, mr.sheets, m.lowerBound, m.yieldPct.toFixed(1), m.attempts, verdict]);
    }
    timing.push([name, countPieces(parts), fmt(t.median), fmt(t.p95), fmt(mrMs), t.median < 1000 ? "ok" : "MISS"]);
  }
  return [
    {
      title: "Sheet nesting: sheets used (48 x 96 in, kerf 1/8 in, trim 1/4 in)",
      note: "ours = guillotine cuts, grain fixed along the sheet; maxrects = maxrects-packer 2.7.4, padding = kerf, best of MAX_AREA/MAX_EDGE, same grain rule, cuts not guillotine. bound = the larger of part area with kerf / usable area rounded up, and the count of pieces no two of which fit one sheet. Goal: ours <= maxrects and ours <= bound + 1.",
      columns: ["set", "material", "pieces", "ours", "maxrects", "bound", "yield %", "layouts tried", "goal"],
      rows,
    },
    {
      title: "Sheet nesting: time per full nest (all materials, ms)",
      note: "Default search budget 600 ms; the search stops early when it reaches the bound. Goal: 300 pieces < 1 s.",
      columns: ["set", "pieces", "ours median", "ours p95", "maxrects (2 runs)", "goal"],
      rows: timing,
    },
  ];
}
