import type { BoardPlan } from "../boards/types";
import { nominalWidthName } from "../boards/stock";
import type { HardwareItem, Part } from "../fixtures/types";
import type { MaterialNest } from "../nesting/types";
import type { Material } from "../plan/schema";
import { MM_PER_INCH } from "../units/length";
import { bandedLengthMm } from "./edges";
import { findPrice } from "./price-schema";
import type { PriceItem } from "./price-schema";
import type { ShoppingLine, ShoppingList, ShoppingOptions, ShoppingTotal } from "./types";

export interface ShoppingInput {
  parts: readonly Part[];
  hardware: readonly HardwareItem[];
  /** Sheet nests, one per material and thickness. */
  sheets: readonly MaterialNest[];
  boards: BoardPlan;
  materials: readonly Material[];
}

/** Board feet of a board from its dressed size: thickness x width in inches x length in feet / 12 (1 board foot = 144 in3). */
export function boardFeet(thicknessMm: number, widthMm: number, lengthMm: number): number {
  return ((thicknessMm / MM_PER_INCH) * (widthMm / MM_PER_INCH) * (lengthMm / MM_PER_INCH)) / 144;
}

const MEASURED = new Set(["mm", "m2"]);

/**
 * The shopping list: sheets from the nest, boards from the board plan, hardware summed by key,
 * edge banding, glue and finish; each priced from the list. Money in US cents, lengths mm, areas m2.
 */
export function buildShoppingList(input: ShoppingInput, prices: readonly PriceItem[], opts: ShoppingOptions = {}): ShoppingList {
  const allowance = opts.wasteAllowancePct ?? 10;
  const lines: ShoppingLine[] = [];
  const missing = new Set<string>();
  const matName = (id: string) => input.materials.find((m) => m.id === id)?.name ?? id;

  const priced = (base: Omit<ShoppingLine, "buyQty" | "buyUnit" | "unitPriceCents" | "totalCents" | "examplePrice" | "allowanceApplied">, amount = 1): void => {
    const p = findPrice(prices, base.key);
    const applies = MEASURED.has(base.needUnit) || base.category === "consumable";
    const need = applies ? base.needQty * (1 + allowance / 100) : base.needQty;
    if (!p) {
      missing.add(base.key);
      lines.push({ ...base, buyQty: Math.ceil(need - 1e-9), buyUnit: base.needUnit, unitPriceCents: null, totalCents: null, examplePrice: false, allowanceApplied: applies });
      return;
    }
    const buyQty = Math.ceil(need / p.packSize - 1e-9);
    // `amount` scales the price for per-measure prices (board feet per board).
    const unitPriceCents = Math.round(p.priceCents * amount);
    lines.push({ ...base, buyQty, buyUnit: p.unit, unitPriceCents, totalCents: buyQty * unitPriceCents, examplePrice: p.example, allowanceApplied: applies });
  };

  for (const n of input.sheets) {
    if (n.sheetsUsed === 0) continue;
    priced({ id: `sheet:${n.materialId}:${n.thicknessMm}`, category: "sheet", key: n.materialId, materialId: n.materialId, name: n.materialName, needQty: n.sheetsUsed, needUnit: "sheet", note: n.offcutsUsed ? `plus ${n.offcutsUsed} offcut(s) on hand` : undefined });
  }

  for (const g of input.boards.groups) {
    const byLength = new Map<number, number>();
    for (const b of g.boards) byLength.set(b.lengthMm, (byLength.get(b.lengthMm) ?? 0) + 1);
    for (const [len, count] of [...byLength].sort((a, b) => a[0] - b[0])) {
      const feet = Math.round((len / MM_PER_INCH / 12) * 10) / 10;
      const widthName = nominalWidthName(g.stockWidthMm, g.thicknessMm) ?? `${(g.stockWidthMm / MM_PER_INCH).toFixed(2)} in wide`;
      const bf = boardFeet(g.thicknessMm, g.stockWidthMm, len);
      const p = findPrice(prices, g.materialId);
      // Board prices per board foot become a price per board; a price per board is used as is.
      const amount = p && p.unit === "board-ft" ? bf : 1;
      priced(
        { id: `board:${g.materialId}:${g.thicknessMm}:${g.stockWidthMm}:${len}`, category: "board", key: g.materialId, materialId: g.materialId, name: `${g.materialName}, ${widthName} x ${feet} ft`, needQty: count, needUnit: "board", note: `${bf.toFixed(2)} board ft each` },
        amount,
      );
      const last = lines[lines.length - 1];
      if (p && p.unit === "board-ft") last.buyUnit = "board";
    }
  }

  const hw = new Map<string, { name: string; qty: number; unit: string }>();
  for (const h of input.hardware) {
    const cur = hw.get(h.key);
    if (cur) cur.qty += h.qty;
    else hw.set(h.key, { name: h.name, qty: h.qty, unit: h.unit });
  }
  for (const [key, h] of [...hw].sort((a, b) => a[0].localeCompare(b[0]))) {
    priced({ id: `hw:${key}`, category: "hardware", key, name: h.name, needQty: h.qty, needUnit: h.unit });
  }

  const banding = input.parts.reduce((s, p) => s + p.qty * bandedLengthMm(p), 0);
  if (banding > 0) priced({ id: "consumable:edge-banding", category: "consumable", key: "edge-banding", name: "Edge banding", needQty: banding, needUnit: "mm" });
  const pieceCount = input.parts.reduce((s, p) => s + p.qty, 0);
  if (pieceCount > 0) {
    priced({ id: "consumable:wood-glue", category: "consumable", key: "wood-glue", name: "Wood glue", needQty: pieceCount, needUnit: "parts", note: "rough estimate from the part count" });
    const coats = opts.finishCoats ?? 2;
    const faces = input.parts.reduce((s, p) => s + (2 * p.qty * p.lengthMm * p.widthMm) / 1e6, 0);
    priced({ id: "consumable:finish", category: "consumable", key: "finish", name: `Finish, ${coats} coats`, needQty: faces * coats, needUnit: "m2", note: "both faces of every part" });
  }

  const totals = new Map<string, ShoppingTotal>();
  const addTotal = (group: string, label: string, cents: number) => {
    const t = totals.get(group);
    if (t) t.totalCents += cents;
    else totals.set(group, { group, label, totalCents: cents });
  };
  for (const l of lines) {
    const cents = l.totalCents ?? 0;
    if (l.materialId) addTotal(l.materialId, matName(l.materialId), cents);
    else addTotal(l.category, l.category === "hardware" ? "Hardware" : "Consumables", cents);
  }
  const totalCents = lines.reduce((s, l) => s + (l.totalCents ?? 0), 0);
  return {
    currency: "USD",
    lines,
    totals: [...totals.values()],
    totalCents,
    missingPrices: [...missing].sort(),
    wasteAllowancePct: allowance,
    usesExamplePrices: lines.some((l) => l.examplePrice),
  };
}
