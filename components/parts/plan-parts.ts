import { derivePlan } from "@/lib/engine/derive";
import { getFixtureKind } from "@/lib/engine/fixtures/registry";
import type { FixtureContext, HardwareItem, Part, PlacedFixture } from "@/lib/engine/fixtures/types";
import type { PlanDocument } from "@/lib/engine/plan/schema";

/**
 * Parts and hardware of every fixture in the plan, from the engine's derivation (which knows
 * neighbouring counters). If the room cannot be solved, each kind's own definition is used.
 */
export function planParts(plan: PlanDocument): { parts: Part[]; hardware: HardwareItem[]; fixtures?: PlacedFixture[] } {
  try {
    const d = derivePlan(plan);
    return { parts: d.parts, hardware: d.hardware, fixtures: d.fixtures };
  } catch {
    return partsByKind(plan);
  }
}

/** Fixtures whose parameters do not validate are skipped (the editor shows those errors). */
function partsByKind(plan: PlanDocument): { parts: Part[]; hardware: HardwareItem[] } {
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
