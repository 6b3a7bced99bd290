import type { Material } from "../plan/schema";
import type { HardwareTotal, PartsListLine } from "./parts-list";

export type Cell = string | number;

/** How a length is written in a row: mm numbers by default; pass a formatter for inches and fractions. */
export type LengthWriter = (mm: number) => Cell;

const mm2 = (mm: number) => Math.round(mm * 10) / 10;

/** CSV-ready rows of the grouped parts list, header first (sizes through `len`, mm to 0.1 by default). */
export function partsListRows(lines: readonly PartsListLine[], materials: readonly Material[] = [], len: LengthWriter = mm2): Cell[][] {
  const header: Cell[] = ["Part", "Qty", "Length", "Width", "Thickness", "Material", "Stock", "Grain", "Edges", "Joinery", "Fixtures"];
  const name = (id: string) => materials.find((m) => m.id === id)?.name ?? id;
  return [
    header,
    ...lines.map((l): Cell[] => [l.name, l.qty, len(l.lengthMm), len(l.widthMm), len(l.thicknessMm), name(l.materialId), l.stock, l.grain, l.edges.join("; "), l.joinery.join("; "), l.fixtures.map((f) => (f.qty > 1 ? `${f.fixtureId} x${f.qty}` : f.fixtureId)).join("; ")]),
  ];
}

/** CSV-ready rows of the hardware totals, header first; lengths in mm stay numbers (round up to whole mm). */
export function hardwareRows(totals: readonly HardwareTotal[]): Cell[][] {
  const q = (t: HardwareTotal) => (t.unit === "mm" ? Math.ceil(t.qty) : t.unit === "m2" ? Math.round(t.qty * 100) / 100 : t.qty);
  return [["Item", "Key", "Qty", "Unit", "Fixtures"], ...totals.map((t): Cell[] => [t.name, t.key, q(t), t.unit, t.fixtureIds.join("; ")])];
}
