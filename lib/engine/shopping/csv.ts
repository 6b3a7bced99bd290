import type { Part } from "../fixtures/types";
import type { Material } from "../plan/schema";
import { formatLength, formatMmNumber } from "../units/format-length";
import type { InchPrecision, LengthUnits } from "../units/length";
import type { ShoppingList } from "./types";

/**
 * One CSV field (RFC 4180): quoted when it holds a comma, quote, or line break, quotes doubled.
 * Text that a spreadsheet would run as a formula (= + - @ at the start) gets a leading apostrophe.
 */
export function csvField(v: string | number | null | undefined): string {
  if (v === null || v === undefined) return "";
  let s = typeof v === "number" ? String(v) : v;
  if (typeof v === "string" && /^[=+\-@\t\r]/.test(s)) s = `'${s}`;
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

/** Rows to CSV text with CRLF line ends (RFC 4180). */
export function toCsv(rows: (string | number | null | undefined)[][]): string {
  return rows.map((r) => r.map(csvField).join(",")).join("\r\n") + "\r\n";
}

/**
 * The parts list as CSV: sizes in the plan's units and in mm. With `labelOf` (part id to label, from the build
 * result) a Label column comes first, so a piece's pencilled label finds its line.
 */
export function partsCsv(parts: readonly Part[], materials: readonly Material[], opts: { units: LengthUnits; precision?: InchPrecision; labelOf?: Readonly<Record<string, string>> }): string {
  const f = (mm: number) => formatLength(mm, { units: opts.units, precision: opts.precision });
  const labels = opts.labelOf;
  const head = ["Fixture", "Part", "Qty", "Length", "Width", "Thickness", "Length (mm)", "Width (mm)", "Thickness (mm)", "Material", "Stock", "Grain", "Edges", "Joinery"];
  const rows: (string | number)[][] = [labels ? ["Label", ...head] : head];
  for (const p of parts) {
    const row = [
      p.fixtureId,
      p.name,
      p.qty,
      f(p.lengthMm),
      f(p.widthMm),
      f(p.thicknessMm),
      formatMmNumber(p.lengthMm),
      formatMmNumber(p.widthMm),
      formatMmNumber(p.thicknessMm),
      materials.find((m) => m.id === p.materialId)?.name ?? p.materialId,
      p.stock,
      p.grain,
      p.edges.join("; "),
      p.joinery.join("; "),
    ];
    rows.push(labels ? [labels[p.id] ?? "", ...row] : row);
  }
  return toCsv(rows);
}

const dollars = (cents: number | null) => (cents === null ? "" : (cents / 100).toFixed(2));

/** The shopping list as CSV, money in USD with two decimals. */
export function shoppingCsv(list: ShoppingList): string {
  const rows: (string | number)[][] = [["Category", "Item", "Need", "Need unit", "Buy", "Buy unit", "Unit price (USD)", "Total (USD)", "Example price", "Note"]];
  for (const l of list.lines) {
    rows.push([l.category, l.name, Math.round(l.needQty * 100) / 100, l.needUnit, l.buyQty, l.buyUnit, dollars(l.unitPriceCents), dollars(l.totalCents), l.examplePrice ? "yes" : "no", l.note ?? ""]);
  }
  for (const t of list.totals) rows.push(["total", t.label, "", "", "", "", "", dollars(t.totalCents), "", ""]);
  rows.push(["total", "All", "", "", "", "", "", dollars(list.totalCents), "", list.missingPrices.length ? `no price for: ${list.missingPrices.join(", ")}` : ""]);
  return toCsv(rows);
}
