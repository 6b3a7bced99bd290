import type { PlanSettings } from "@/lib/engine/plan/schema";
import { formatArea, formatLength } from "@/lib/engine/units/format-length";

/** Length and area formatters in the plan's units. */
export function formatters(settings: Pick<PlanSettings, "units" | "precision">) {
  return {
    len: (mm: number) => formatLength(mm, { units: settings.units, precision: settings.precision }),
    area: (mm2: number) => formatArea(mm2, { units: settings.units }),
    size: (aMm: number, bMm: number) => `${formatLength(aMm, { units: settings.units, precision: settings.precision })} x ${formatLength(bMm, { units: settings.units, precision: settings.precision })}`,
  };
}

export type Formatters = ReturnType<typeof formatters>;

/** US cents as dollars: "$1,234.50". */
export const money = (cents: number | null) => (cents === null ? "no price" : (cents / 100).toLocaleString("en-US", { style: "currency", currency: "USD" }));
