import type { PlanSettings } from "../plan/schema";
import { formatLength } from "../units/format-length";

/** Length text in the plan's units: `37 1/2"`, `3' 1 1/2"` or `952 mm` (input in mm). */
export function formatLengthFor(mmValue: number, settings: Pick<PlanSettings, "units" | "precision">): string {
  return formatLength(mmValue, { units: settings.units, precision: settings.precision });
}
