export type ShoppingCategory = "sheet" | "board" | "hardware" | "consumable";

/** One line to buy. Quantities: `need` in the need's unit, `buy` in purchase units. Money in US cents. */
export interface ShoppingLine {
  id: string;
  category: ShoppingCategory;
  /** Price-list key this line was priced by (material id or hardware key). */
  key: string;
  name: string;
  /** The material the line belongs to, for sheets and boards. */
  materialId?: string;
  needQty: number;
  needUnit: string;
  buyQty: number;
  buyUnit: string;
  unitPriceCents: number | null;
  totalCents: number | null;
  /** The price is one of the app's examples, not the user's. */
  examplePrice: boolean;
  /** Waste allowance was added to the need. */
  allowanceApplied: boolean;
  note?: string;
}

export interface ShoppingTotal {
  /** Material id, or the category name for hardware and consumables. */
  group: string;
  label: string;
  totalCents: number;
}

export interface ShoppingList {
  currency: "USD";
  lines: ShoppingLine[];
  totals: ShoppingTotal[];
  totalCents: number;
  /** Keys with no price: their lines have null totals and are left out of the sums. */
  missingPrices: string[];
  wasteAllowancePct: number;
  /** Any price used is an example price. */
  usesExamplePrices: boolean;
}

export interface ShoppingOptions {
  /** Extra added to measured needs (banding, laminate, cement, finish, track, glue), percent. Sheets and boards come from the nest and board plan, which already count kerf and trim. Default 10. */
  wasteAllowancePct?: number;
  /** Finish coats on every face of every part. Default 2. */
  finishCoats?: number;
}
