import type { Grain, HardwareItem, Part } from "../fixtures/types";

/** One line of the plan's parts list: identical parts from every fixture counted together (mm). */
export interface PartsListLine {
  /** Stable key of the group: name, material and size. */
  key: string;
  name: string;
  qty: number;
  lengthMm: number;
  widthMm: number;
  thicknessMm: number;
  materialId: string;
  stock: "sheet" | "board";
  grain: Grain;
  edges: string[];
  joinery: string[];
  /** Fixtures the parts come from, in plan order, and how many each needs. */
  fixtures: { fixtureId: string; qty: number }[];
  /** Part ids (fixtureId:key) in the group. */
  partIds: string[];
}

/** Sizes equal to a hundredth of a millimetre count as the same part. */
const r2 = (n: number) => (Math.round(n * 100) / 100).toFixed(2);

/** The grouping key: identical name, material, stock, grain, size, edges and joinery. */
export function partGroupKey(p: Part): string {
  return [p.name, p.materialId, p.stock, p.grain, r2(p.lengthMm), r2(p.widthMm), r2(p.thicknessMm), p.edges.join("; "), p.joinery.join("; ")].join("|");
}

/**
 * Group identical parts across fixtures (mm). Sorted by material, then thickness, then length and width, largest
 * first, so a cut list reads from the biggest pieces down.
 */
export function groupParts(parts: readonly Part[]): PartsListLine[] {
  const lines = new Map<string, PartsListLine>();
  for (const p of parts) {
    const key = partGroupKey(p);
    let line = lines.get(key);
    if (!line) {
      line = { key, name: p.name, qty: 0, lengthMm: p.lengthMm, widthMm: p.widthMm, thicknessMm: p.thicknessMm, materialId: p.materialId, stock: p.stock, grain: p.grain, edges: [...p.edges], joinery: [...p.joinery], fixtures: [], partIds: [] };
      lines.set(key, line);
    }
    line.qty += p.qty;
    line.partIds.push(p.id);
    const f = line.fixtures.find((x) => x.fixtureId === p.fixtureId);
    if (f) f.qty += p.qty;
    else line.fixtures.push({ fixtureId: p.fixtureId, qty: p.qty });
  }
  return [...lines.values()].sort(
    (a, b) => a.materialId.localeCompare(b.materialId) || b.thicknessMm - a.thicknessMm || b.lengthMm - a.lengthMm || b.widthMm - a.widthMm || a.name.localeCompare(b.name),
  );
}

/** Hardware summed by key across fixtures. */
export interface HardwareTotal {
  key: string;
  name: string;
  qty: number;
  unit: HardwareItem["unit"];
  fixtureIds: string[];
}

/** Sum hardware by key (each, pair, mm, box, m2). The first item's name and unit stand for the key. */
export function hardwareTotals(items: readonly HardwareItem[]): HardwareTotal[] {
  const totals = new Map<string, HardwareTotal>();
  for (const h of items) {
    const t = totals.get(h.key);
    if (!t) totals.set(h.key, { key: h.key, name: h.name, qty: h.qty, unit: h.unit, fixtureIds: [h.fixtureId] });
    else {
      t.qty += h.qty;
      if (!t.fixtureIds.includes(h.fixtureId)) t.fixtureIds.push(h.fixtureId);
    }
  }
  return [...totals.values()].sort((a, b) => a.key.localeCompare(b.key));
}
