import type { EntityManager } from "@mikro-orm/postgresql";
import { RulePresetSchema } from "@/entities/RulePreset";
import type { User } from "@/entities/User";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { accessPlan } from "../policy";
import { getPreset, type PresetView } from "./presets";
import { updatePlan, type PlanDetail } from "./plans";

/**
 * The preset a document has adopted, if it still exists. Unpublishing later does not take it away
 * from plans that adopted it (the numbers are not secret; the checks must keep saying which ones apply).
 */
export async function presetOfDocument(em: EntityManager, doc: Pick<PlanDocument, "settings">): Promise<PresetView | null> {
  const id = doc.settings?.presetId;
  if (!id || !/^[0-9a-f-]{36}$/i.test(id)) return null;
  const p = await em.findOne(RulePresetSchema, { id }, { populate: ["owner"] });
  if (!p) return null;
  return { id: p.id, name: p.name, description: p.description, numbers: p.numbers, published: p.published, ownerId: p.owner.id, ownerName: p.owner.name, updatedAt: p.updatedAt.toISOString() };
}

export async function getPlanPreset(em: EntityManager, user: User, planId: string): Promise<PresetView | null> {
  const { plan } = await accessPlan(em, planId, user, "viewer", { withDocument: true });
  return presetOfDocument(em, plan.document as unknown as PlanDocument);
}

/** Adopts a preset (or none) by saving settings.presetId as a normal versioned save (editor or owner). */
export async function adoptPreset(em: EntityManager, user: User, planId: string, input: { presetId: string | null; version: number }): Promise<{ plan: PlanDetail; preset: PresetView | null }> {
  const { plan } = await accessPlan(em, planId, user, "editor", { withDocument: true });
  const preset = input.presetId ? await getPreset(em, user, input.presetId) : null;
  const doc = plan.document as unknown as PlanDocument;
  const next = { ...doc, settings: { ...doc.settings, presetId: preset ? preset.id : null } };
  return { plan: await updatePlan(em, user, planId, { document: next, version: input.version }), preset };
}
