import type { Units } from "@/lib/engine/plan/schema";

/** Which of the two ordinary grid steps is in use (Shift always takes the big one). */
export type GridSize = "fine" | "normal";

/** The grid steps for dragging and nudging, mm. */
export interface GridSteps {
  fineMm: number;
  normalMm: number;
  bigMm: number;
}

const IN = 25.4; // 1 in = 25.4 mm exactly (NIST SP 811)

/**
 * Steps a tape in the plan's units reads cleanly: imperial 1/16 in (the finest mark on a common
 * tape), 1 in and 6 in; metric 1 mm, 10 mm and 100 mm. Our choice, following common shop practice.
 */
export function gridSteps(units: Units): GridSteps {
  if (units === "mm") return { fineMm: 1, normalMm: 10, bigMm: 100 };
  return { fineMm: IN / 16, normalMm: IN, bigMm: 152.4 }; // 6 in
}

/** The step in force, mm: the big one with Shift, else the chosen ordinary one. */
export function gridStepFor(units: Units, size: GridSize, big = false): number {
  const s = gridSteps(units);
  return big ? s.bigMm : size === "fine" ? s.fineMm : s.normalMm;
}
