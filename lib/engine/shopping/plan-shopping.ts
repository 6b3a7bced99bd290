import { planBoards } from "../boards/plan-boards";
import type { BoardOptions, BoardPlan } from "../boards/types";
import type { HardwareItem, Part } from "../fixtures/types";
import { nestSheets } from "../nesting/nest-sheets";
import type { NestOptions, NestResult } from "../nesting/types";
import type { Material } from "../plan/schema";
import type { PriceItem } from "./price-schema";
import { buildShoppingList } from "./shopping-list";
import type { ShoppingList, ShoppingOptions } from "./types";

export interface MaterialsReport {
  nest: NestResult;
  boards: BoardPlan;
  shopping: ShoppingList;
}

/** Nest the sheets, plan the boards and price the list in one go (server exports use it). Lengths mm, kerf mm, money cents. */
export function materialsReport(
  parts: readonly Part[],
  hardware: readonly HardwareItem[],
  materials: readonly Material[],
  prices: readonly PriceItem[],
  opts: { kerfMm: number; nest?: Partial<NestOptions>; boards?: Partial<BoardOptions>; shopping?: ShoppingOptions },
): MaterialsReport {
  const nest = nestSheets(parts, materials, { timeBudgetMs: 300, ...opts.nest, kerfMm: opts.kerfMm });
  const boards = planBoards(parts, materials, { ...opts.boards, kerfMm: opts.kerfMm });
  const shopping = buildShoppingList({ parts, hardware, sheets: nest.materials, boards, materials }, prices, opts.shopping);
  return { nest, boards, shopping };
}
