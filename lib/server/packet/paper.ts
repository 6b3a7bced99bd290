import type { PlanSettings } from "@/lib/engine/plan/schema";
import type { PaperSize } from "./types";

/**
 * The packet's paper: the plan's paper setting when it has one, else Letter for plans in inches
 * and A4 for plans in millimetres (what a printer in each unit system is loaded with).
 */
export function paperFor(settings: Pick<PlanSettings, "units"> & { paperSize?: unknown }): PaperSize {
  const set = typeof settings.paperSize === "string" ? settings.paperSize.toLowerCase() : "";
  if (set === "letter") return "LETTER";
  if (set === "a4") return "A4";
  return settings.units === "mm" ? "A4" : "LETTER";
}

/** Page size in points (1/72 in). */
export const PAPER_PT: Record<PaperSize, { width: number; height: number }> = {
  LETTER: { width: 612, height: 792 },
  A4: { width: 595.28, height: 841.89 },
};
