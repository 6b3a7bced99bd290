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
import { cabinetParts, countPieces, fullShop, randomParts, TEST_MATERIALS, threeCabinetRun } from "../../tests/unit/nesting/part-sets";
import { fmt, timeIt } from "./timing";

export const title = "Sheet nesting";
export const order = 40;

const KERF = 3.175; // 1/8 in full kerf (TRADE.md: practice)
// On Node 20 the bare name resolves to a CommonJS build that fails; load the ES module build (TRADE.md).
const MAXRECTS_ESM = "maxrects-packer/dist/maxrects-packer.mjs";
type MaxRects = typeof MaxRectsTypes & { Rectangle: typeof Rectangle };

/** maxrects-packer's best of two sort logics: sheets per material, and its time. */
function maxrects(lib: MaxRects, parts: Part[], materialId: string): { sheets: number; ms: number } {
  const m = TEST_MATERIALS.find((x) => x.id === materialId);
  const L = (m?.sheetLengthMm ?? 2438.4) - 2 * DEFAULT_TRIM_MM;
  const W = (m?.sheetWidthMm ?? 1219.2) - 2 * DEFAULT_TRIM_MM;
  const rects = () => {
    const out: Rectangle[] = [];
    for (const p of parts) {
      if (p.stock !== "sheet" || p.materialId !== materialId) continue;
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
  const sets: [string, Part[]][] = [
    ["one cabinet", cabinetParts("cab", 24, 4)],
    ["three-cabinet run", threeCabinetRun()],
    ["full shop", fullShop()],
    ["random 60 (seed 1)", randomParts(1, 60)],
    ["random 150 (seed 2)", randomParts(2, 150, 2)],
    ["random 300 (seed 3)", randomParts(3, 300)],
  ];
  const rows: (string | number)[][] = [];
  const timing: (string | number)[][] = [];
  for (const [name, parts] of sets) {
    const res = nestSheets(parts, TEST_MATERIALS, { kerfMm: KERF, seed: 1 });
    const t = timeIt(() => nestSheets(parts, TEST_MATERIALS, { kerfMm: KERF, seed: 1 }), { warmup: 1, runs: 5 });
    let mrMs = 0;
    for (const m of res.materials) {
      const mr = maxrects(lib, parts, m.materialId);
      mrMs += mr.ms;
      const pieces = m.sheets.reduce((s, sh) => s + sh.placements.length, 0);
      const verdict = m.sheetsUsed <= mr.sheets && m.sheetsUsed <= m.lowerBound + 1 ? "ok" : "MISS";
      rows.push([name, m.materialId, pieces, m.sheetsUsed, mr.sheets, m.lowerBound, m.yieldPct.toFixed(1), m.attempts, verdict]);
    }
    timing.push([name, countPieces(parts), fmt(t.median), fmt(t.p95), fmt(mrMs), t.median < 1000 ? "ok" : "MISS"]);
  }
  return [
    {
      title: "Sheet nesting: sheets used (48 x 96 in, kerf 1/8 in, trim 1/4 in)",
      note: "ours = guillotine cuts, grain fixed along the sheet; maxrects = maxrects-packer 2.7.4, padding = kerf, best of MAX_AREA/MAX_EDGE, same grain rule, cuts not guillotine. bound = part area with kerf / usable area, rounded up. Goal: ours <= maxrects and ours <= bound + 1.",
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
