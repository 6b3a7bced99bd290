import { derivePlan } from "../derive";
import type { Derived } from "../derive-types";
import type { PlanDocument } from "../plan/schema";
import { planView } from "./plan-view";
import type { Drawing } from "./types";
import { wallElevation } from "./wall-elevation";

/** A plan's drawings for the views that are not the live editor: the plan view and one elevation per wall (sheet mm). */
export interface PlanDrawings {
  plan: Drawing;
  elevations: Drawing[];
}

/** The plan view and every wall's elevation, from the derived plan (derived here when not given); deterministic. */
export function planDrawings(plan: PlanDocument, derived: Derived = derivePlan(plan)): PlanDrawings {
  return {
    plan: planView(plan, derived),
    elevations: derived.room.walls.map((w) => wallElevation(plan, derived, w.id)).filter((d): d is Drawing => d !== null),
  };
}

/** The plan's drawings, or null when its room cannot be solved from the measurements (the page says so instead). */
export function planDrawingsOrNull(plan: PlanDocument): PlanDrawings | null {
  try {
    return planDrawings(plan);
  } catch {
    return null;
  }
}
