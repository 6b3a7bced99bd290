import type { EntityManager } from "@mikro-orm/postgresql";
import { PlanSchema, type Plan } from "@/entities/Plan";
import { PlanMemberSchema } from "@/entities/PlanMember";
import { PlanRevisionSchema } from "@/entities/PlanRevision";
import type { User } from "@/entities/User";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { conflict, forbidden, notFound } from "../errors";
import { accessPlan, type PlanRole } from "../policy";
import { blankDocument, validateDocument } from "./plan-document";
import { saveDocument } from "./plan-save";

/** Soft-deleted plans stay restorable this long. */
export const RESTORE_DAYS = 30;

export interface PlanSummary {
  id: string;
  name: string;
  units: string;
  version: number;
  role: PlanRole;
  ownerName: string;
  createdAt: string;
  updatedAt: string;
  deletedAt: string | null;
  copiedFrom: string | null;
}

export interface PlanDetail extends PlanSummary {
  document: PlanDocument;
}

function summary(p: Plan, role: PlanRole): PlanSummary {
  return {
    id: p.id,
    name: p.name,
    units: p.units,
    version: p.version,
    role,
    ownerName: p.owner.name,
    createdAt: p.createdAt.toISOString(),
    updatedAt: p.updatedAt.toISOString(),
    deletedAt: p.deletedAt ? p.deletedAt.toISOString() : null,
    copiedFrom: p.copiedFrom ?? null,
  };
}

const detail = (p: Plan, role: PlanRole): PlanDetail => ({ ...summary(p, role), document: p.document as unknown as PlanDocument });

/** My plans and the plans shared with me, newest change first; `deleted` lists my restorable ones instead. */
export async function listPlans(em: EntityManager, user: User, opts: { deleted?: boolean } = {}): Promise<PlanSummary[]> {
  if (opts.deleted) {
    const since = new Date(Date.now() - RESTORE_DAYS * 86_400_000);
    const rows = await em.find(PlanSchema, { owner: user.id, deletedAt: { $gte: since } }, { orderBy: { deletedAt: "desc" }, populate: ["owner"] });
    return rows.map((p) => summary(p, "owner"));
  }
  const own = await em.find(PlanSchema, { owner: user.id, deletedAt: null }, { populate: ["owner"] });
  const memberships = await em.find(PlanMemberSchema, { user: user.id, plan: { deletedAt: null } }, { populate: ["plan", "plan.owner"] });
  const all = [...own.map((p) => summary(p, "owner")), ...memberships.map((m) => summary(m.plan, m.role as PlanRole))];
  return all.sort((a, b) => b.updatedAt.localeCompare(a.updatedAt));
}

export async function createPlan(em: EntityManager, user: User, input: { name: string; document?: unknown; copiedFrom?: string }): Promise<PlanDetail> {
  const document = input.document === undefined ? blankDocument() : validateDocument(input.document);
  const plan = em.create(PlanSchema, {
    owner: user,
    name: input.name,
    units: document.settings.units,
    document: document as unknown as Record<string, unknown>,
    version: 1,
    copiedFrom: input.copiedFrom ?? null,
  });
  await em.flush();
  return detail(plan, "owner");
}

export async function getPlan(em: EntityManager, user: User, id: string): Promise<PlanDetail> {
  const { plan, role } = await accessPlan(em, id, user, "viewer", { withDocument: true });
  return detail(plan, role);
}

/**
 * Saves a new document if `version` is the stored one (optimistic locking; concurrent saves queue
 * on the row lock and all but the first at a version answer 409). The replaced document is kept as
 * a revision. Stale: 409, nothing written. One statement, one round trip (see plan-save.ts).
 */
export async function updatePlan(em: EntityManager, user: User, id: string, input: { document: unknown; version: number; name?: string }): Promise<PlanDetail> {
  const document = validateDocument(input.document);
  const saved = await saveDocument(em, { planId: id, userId: user.id, version: input.version, documentJson: JSON.stringify(document), units: document.settings.units, name: input.name || undefined });
  if (saved.kind === "missing") throw notFound("That plan");
  if (saved.kind === "read-only") throw forbidden("You can look at this plan but not change it.");
  if (saved.kind === "stale") {
    throw conflict(`This plan was changed elsewhere (now version ${saved.currentVersion}, yours is ${input.version}). Nothing was overwritten.`, { currentVersion: saved.currentVersion });
  }
  return {
    id,
    name: saved.name,
    units: saved.units,
    version: saved.version,
    role: saved.role,
    ownerName: saved.ownerName,
    createdAt: saved.createdAt.toISOString(),
    updatedAt: saved.updatedAt.toISOString(),
    deletedAt: null,
    copiedFrom: saved.copiedFrom,
    document,
  };
}

export async function renamePlan(em: EntityManager, user: User, id: string, name: string): Promise<PlanSummary> {
  const { plan, role } = await accessPlan(em, id, user, "editor");
  plan.name = name;
  plan.updatedAt = new Date();
  await em.flush();
  return summary(plan, role);
}

export async function deletePlan(em: EntityManager, user: User, id: string): Promise<PlanSummary> {
  const { plan } = await accessPlan(em, id, user, "owner");
  plan.deletedAt = new Date();
  await em.flush();
  return summary(plan, "owner");
}

/** Brings back a plan deleted within the last 30 days. */
export async function restorePlan(em: EntityManager, user: User, id: string): Promise<PlanSummary> {
  const since = new Date(Date.now() - RESTORE_DAYS * 86_400_000);
  const plan = await em.findOne(PlanSchema, { id, owner: user.id, deletedAt: { $gte: since } }, { populate: ["owner"] });
  if (!plan) throw notFound("That deleted plan");
  plan.deletedAt = null;
  plan.updatedAt = new Date();
  await em.flush();
  return summary(plan, "owner");
}

export async function duplicatePlan(em: EntityManager, user: User, id: string): Promise<PlanDetail> {
  const { plan } = await accessPlan(em, id, user, "viewer", { withDocument: true });
  return createPlan(em, user, { name: `${plan.name} (copy)`.slice(0, 120), document: plan.document, copiedFrom: plan.owner.id === user.id ? undefined : `a copy of "${plan.name}" by ${plan.owner.name}` });
}

export interface RevisionSummary {
  id: string;
  version: number;
  name: string;
  authorName: string;
  createdAt: string;
}

export async function listRevisions(em: EntityManager, user: User, id: string): Promise<RevisionSummary[]> {
  const { plan } = await accessPlan(em, id, user, "viewer");
  const rows = await em.find(PlanRevisionSchema, { plan: plan.id }, { orderBy: { version: "desc" }, populate: ["author"], limit: 200 });
  return rows.map((r) => ({ id: r.id, version: r.version, name: r.name, authorName: r.author.name, createdAt: r.createdAt.toISOString() }));
}

export async function getRevision(em: EntityManager, user: User, id: string, revisionId: string): Promise<RevisionSummary & { document: PlanDocument }> {
  const { plan } = await accessPlan(em, id, user, "viewer");
  const r = await em.findOne(PlanRevisionSchema, { id: revisionId, plan: plan.id }, { populate: ["author", "document"] });
  if (!r) throw notFound("That revision");
  return { id: r.id, version: r.version, name: r.name, authorName: r.author.name, createdAt: r.createdAt.toISOString(), document: r.document as unknown as PlanDocument };
}

/** Makes an old revision the current document, as a new save (so the restore itself can be undone). */
export async function restoreRevision(em: EntityManager, user: User, id: string, revisionId: string, version: number): Promise<PlanDetail> {
  const rev = await getRevision(em, user, id, revisionId);
  return updatePlan(em, user, id, { document: rev.document, version });
}
