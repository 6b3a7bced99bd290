import { getFixtureKind } from "@/lib/engine/fixtures/registry";
import type { FixtureContext, HardwareItem, Part } from "@/lib/engine/fixtures/types";
import type { PlanDocument } from "@/lib/engine/plan/schema";

/**
 * Parts and hardware of every fixture in the plan, straight from each kind's definition.
 * Fixtures whose parameters do not validate are skipped (the editor shows those errors).
 */
export function planParts(plan: PlanDocument): { parts: Part[]; hardware: HardwareItem[] } {
  const ctx: FixtureContext = { settings: plan.settings, materials: plan.materials };
  const parts: Part[] = [];
  const hardware: HardwareItem[] = [];
  for (const f of plan.fixtures) {
    const kind = getFixtureKind(f.kind);
    if (!kind) continue;
    const parsed = kind.paramsSchema.safeParse(f.params);
    if (!parsed.success) continue;
    try {
      parts.push(...kind.parts(f.id, parsed.data, ctx));
      hardware.push(...kind.hardware(f.id, parsed.data, ctx));
    } catch {
      // A kind that cannot build parts for these parameters contributes none; checks report why.
    }
  }
  return { parts, hardware };
}
