import type { EntityManager } from "@mikro-orm/postgresql";
import { RulePresetSchema, type RulePreset } from "@/entities/RulePreset";
import type { User } from "@/entities/User";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { notFound } from "../errors";
import { accessPlan } from "../policy";
import { getPreset, presetVisible, type PresetView } from "./presets";
import { updatePlan, type PlanDetail } from "./plans";

const presetView = (p: RulePreset): PresetView => ({ id: p.id, name: p.name, description: p.description, numbers: p.numbers, published: p.published, ownerId: p.owner.id, ownerName: p.owner.name, updatedAt: p.updatedAt.toISOString() });

/** Who is reading a document's preset: the signed-in reader, and an author who vouches for their own presets in what they present. */
export interface PresetReader {
  viewer?: User | null;
  /** Account ids whose own presets may be shown too (a walk-through's author to its students). */
  vouchedBy?: string[];
}

/**
 * The preset a document names, as it is NOW: shown when it is published, the reader's own (or the
 * reader is an admin), or the own preset of someone vouching (see PresetReader). A preset that was
 * unpublished, or someone else's draft whose id was typed into the document, answers "hidden".
 */
export async function readDocumentPreset(em: EntityManager, doc: Pick<PlanDocument, "settings">, who: PresetReader = {}): Promise<{ preset: PresetView | null; hidden: boolean }> {
  const id = doc.settings?.presetId;
  if (!id || !/^[0-9a-f-]{36}$/i.test(id)) return { preset: null, hidden: false };
  const p = await em.findOne(RulePresetSchema, { id }, { populate: ["owner"] });
  if (!p) return { preset: null, hidden: false };
  const vouched = !!who.vouchedBy?.includes(p.owner.id);
  if (!presetVisible(p, who.viewer ?? null) && !vouched) return { preset: null, hidden: true };
  return { preset: presetView(p), hidden: false };
}

/** The document's preset when the reader may see it now (null otherwise); with no reader, published presets only. */
export async function presetOfDocument(em: EntityManager, doc: Pick<PlanDocument, "settings">, who: PresetReader = {}): Promise<PresetView | null> {
  return (await readDocumentPreset(em, doc, who)).preset;
}

/** The plan's adopted preset for someone with a role on the plan; someone else's draft answers 404. */
export async function getPlanPreset(em: EntityManager, user: User, planId: string): Promise<PresetView | null> {
  const { plan } = await accessPlan(em, planId, user, "viewer", { withDocument: true });
  const r = await readDocumentPreset(em, plan.document as unknown as PlanDocument, { viewer: user });
  if (r.hidden) throw notFound("That preset");
  return r.preset;
}

/** Adopts a preset (or none) by saving settings.presetId as a normal versioned save (editor or owner). */
export async function adoptPreset(em: EntityManager, user: User, planId: string, input: { presetId: string | null; version: number }): Promise<{ plan: PlanDetail; preset: PresetView | null }> {
  const { plan } = await accessPlan(em, planId, user, "editor", { withDocument: true });
  const preset = input.presetId ? await getPreset(em, user, input.presetId) : null;
  const doc = plan.document as unknown as PlanDocument;
  const next = { ...doc, settings: { ...doc.settings, presetId: preset ? preset.id : null } };
  return { plan: await updatePlan(em, user, planId, { document: next, version: input.version }), preset };
}
