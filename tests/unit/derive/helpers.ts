import { newPlanDocument } from "@/lib/engine/plan/defaults";
import type { FixtureDoc, PlanDocument } from "@/lib/engine/plan/schema";
import { fixtureSchema } from "@/lib/engine/plan/schema";

export const IN = 25.4;

/** The default 6100 x 6700 mm garage with these fixtures (ids and placements as given). */
export function planWith(fixtures: unknown[], extra: Partial<PlanDocument> = {}): PlanDocument {
  const base = newPlanDocument();
  return { ...base, ...extra, fixtures: fixtures.map((f) => fixtureSchema.parse(f) as FixtureDoc) };
}

export const onWall = (wallId: string, offsetMm: number, elevationMm = 0) => ({ mode: "wall" as const, wallId, offsetMm, elevationMm });
