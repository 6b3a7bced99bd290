import type { Derived } from "../derive-types";
import type { HardwareTotal, PartsListLine } from "./parts-list";
import { groupParts, hardwareTotals } from "./parts-list";

/** The plan-level parts list and hardware totals from derived results. */
export function planPartsList(derived: Pick<Derived, "parts" | "hardware">): { lines: PartsListLine[]; hardware: HardwareTotal[]; partCount: number } {
  const lines = groupParts(derived.parts);
  return { lines, hardware: hardwareTotals(derived.hardware), partCount: lines.reduce((s, l) => s + l.qty, 0) };
}
