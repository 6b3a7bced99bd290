/**
 * Hand-built part sets for nesting tests and the bench: base cabinets of our own design
 * (3/4 in carcass, 1/2 in drawer boxes, 1/4 in backs and bottoms, MDF tops) and random sets
 * with fixed seeds. Sizes in mm.
 */
import type { Grain, Part } from "@/lib/engine/fixtures/types";
import type { Material } from "@/lib/engine/plan/schema";
import { seededRandom } from "@/lib/engine/geometry/seeded-random";

const IN = 25.4;

export const TEST_MATERIALS: Material[] = [
  { id: "ply-18", name: "Plywood 3/4 in", form: "sheet", thicknessMm: 18, sheetLengthMm: 2438.4, sheetWidthMm: 1219.2 },
  { id: "ply-12", name: "Plywood 1/2 in", form: "sheet", thicknessMm: 12, sheetLengthMm: 2438.4, sheetWidthMm: 1219.2 },
  { id: "ply-6", name: "Plywood 1/4 in", form: "sheet", thicknessMm: 6, sheetLengthMm: 2438.4, sheetWidthMm: 1219.2 },
  { id: "mdf-19", name: "MDF 3/4 in", form: "sheet", thicknessMm: 19, sheetLengthMm: 2438.4, sheetWidthMm: 1219.2 },
  { id: "poplar-19", name: "Poplar 3/4 in", form: "board", thicknessMm: 19 },
];

function part(fixtureId: string, key: string, name: string, qty: number, lIn: number, wIn: number, materialId: string, grain: Grain, stock: "sheet" | "board" = "sheet"): Part {
  const m = TEST_MATERIALS.find((x) => x.id === materialId);
  return {
    id: `${fixtureId}:${key}`,
    fixtureId,
    name,
    qty,
    lengthMm: lIn * IN,
    widthMm: wIn * IN,
    thicknessMm: m?.thicknessMm ?? 18,
    materialId,
    stock,
    grain,
    edges: [],
    joinery: [],
  };
}

/** One base cabinet `wIn` wide with `drawers` drawers: our own proportions. */
export function cabinetParts(id: string, wIn = 24, drawers = 4): Part[] {
  const inner = wIn - 1.5;
  const dh = 28 / drawers;
  return [
    part(id, "side", "Side", 2, 30.5, 23.25, "ply-18", "length"),
    part(id, "bottom", "Bottom", 1, inner + 0.5, 23.25, "ply-18", "length"),
    part(id, "stretcher", "Stretcher", 2, inner, 4, "ply-18", "length"),
    part(id, "kick-long", "Toe-kick rail", 2, wIn - 1, 4, "ply-18", "length"),
    part(id, "kick-short", "Toe-kick cross", 2, 20, 4, "ply-18", "length"),
    part(id, "front", "Drawer front", drawers, wIn - 0.25, dh - 0.25, "ply-18", "length"),
    part(id, "back", "Back", 1, 30.5, wIn - 0.5, "ply-6", "length"),
    part(id, "dside", "Drawer side", drawers * 2, 22, dh - 1.5, "ply-12", "length"),
    part(id, "dend", "Drawer end", drawers * 2, inner - 1.5, dh - 1.5, "ply-12", "length"),
    part(id, "dbottom", "Drawer bottom", drawers, 22, inner - 1, "ply-6", "none"),
    part(id, "top", "Countertop", 1, wIn + 1, 25, "mdf-19", "none"),
    part(id, "top-buildup", "Countertop build-up", 2, wIn + 1, 4, "mdf-19", "none"),
    part(id, "ff-stile", "Face-frame stile", 2, 30.5, 1.5, "poplar-19", "length", "board"),
    part(id, "ff-rail", "Face-frame rail", drawers + 1, inner - 1.5, 1.5, "poplar-19", "length", "board"),
  ];
}

/** A run of three cabinets: 18, 24 and 30 in wide. */
export function threeCabinetRun(): Part[] {
  return [...cabinetParts("cab-a", 18, 3), ...cabinetParts("cab-b", 24, 4), ...cabinetParts("cab-c", 30, 2)];
}

/** A whole shop: cabinets, wall cabinets and shelving, about 300 sheet pieces. */
export function fullShop(): Part[] {
  const out: Part[] = [];
  const widths = [18, 24, 30, 36, 24, 18, 30, 36];
  widths.forEach((w, i) => out.push(...cabinetParts(`base-${i}`, w, i % 2 === 0 ? 4 : 3)));
  for (let i = 0; i < 4; i++) {
    const id = `wall-${i}`;
    out.push(
      part(id, "side", "Wall side", 2, 30, 12, "ply-18", "length"),
      part(id, "tb", "Wall top/bottom", 2, 28.5, 11.25, "ply-18", "length"),
      part(id, "shelf", "Wall shelf", 2, 28.25, 11, "ply-18", "length"),
      part(id, "back", "Wall back", 1, 30, 29.5, "ply-6", "length"),
      part(id, "door", "Wall door", 2, 30, 14.875, "ply-18", "length"),
    );
  }
  out.push(part("bench", "top", "Bench top layer", 2, 72, 30, "mdf-19", "none"));
  out.push(part("rack", "arm", "Rack arm", 12, 16, 6, "ply-18", "length"));
  return out;
}

/** Random sheet parts with a fixed seed: sizes 2..40 in, random grain, one or two materials. */
export function randomParts(seed: number, n: number, materials = 1): Part[] {
  const r = seededRandom(seed);
  const out: Part[] = [];
  for (let i = 0; i < n; i++) {
    const l = 2 + Math.round(r() * 76) / 2;
    const w = 2 + Math.round(r() * Math.min(l - 2, 44) * 2) / 2;
    const g: Grain = r() < 0.6 ? "length" : r() < 0.5 ? "width" : "none";
    out.push(part(`rnd-${seed}`, `p${i}`, `Piece ${i + 1}`, 1, l, w, materials > 1 && r() < 0.5 ? "ply-12" : "ply-18", g));
  }
  return out;
}

export function countPieces(parts: Part[]): number {
  return parts.filter((p) => p.stock === "sheet").reduce((s, p) => s + p.qty, 0);
}
