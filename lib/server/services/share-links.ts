import type { EntityManager } from "@mikro-orm/postgresql";
import { PlanSchema } from "@/entities/Plan";
import { ShareLinkSchema, type ShareLink } from "@/entities/ShareLink";
import type { User } from "@/entities/User";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import { invalid, notFound } from "../errors";
import { accessPlan } from "../policy";
import { appLink } from "./mail";
import { createPlan, type PlanDetail } from "./plans";
import { hashToken, newToken, tokenShape } from "./tokens";

/** A plan keeps at most this many live links (enough for a class; stops runaway scripts). */
const MAX_LIVE_LINKS = 50;

export interface ShareLinkView {
  id: string;
  label: string | null;
  createdAt: string;
  expiresAt: string | null;
  revokedAt: string | null;
  lastOpenedAt: string | null;
  openCount: number;
  state: "live" | "expired" | "revoked";
}

const iso = (d?: Date | null) => (d ? d.toISOString() : null);

function view(l: ShareLink, now = new Date()): ShareLinkView {
  const state = l.revokedAt ? "revoked" : l.expiresAt && l.expiresAt <= now ? "expired" : "live";
  return { id: l.id, label: l.label ?? null, createdAt: l.createdAt.toISOString(), expiresAt: iso(l.expiresAt), revokedAt: iso(l.revokedAt), lastOpenedAt: iso(l.lastOpenedAt), openCount: l.openCount, state };
}

/** The plan's links, newest first (owner only). */
export async function listLinks(em: EntityManager, user: User, planId: string): Promise<ShareLinkView[]> {
  const { plan } = await accessPlan(em, planId, user, "owner");
  const rows = await em.find(ShareLinkSchema, { plan: plan.id }, { orderBy: { createdAt: "desc" }, limit: 200 });
  return rows.map((l) => view(l));
}

/** A new read-only link; the token is returned once and only its hash is kept. */
export async function createLink(em: EntityManager, user: User, planId: string, input: { label?: string; expiresAt?: Date | null }): Promise<{ link: ShareLinkView; token: string; url: string }> {
  const { plan } = await accessPlan(em, planId, user, "owner");
  if (input.expiresAt && input.expiresAt.getTime() <= Date.now()) throw invalid("The expiry must be in the future.", { expiresAt: "Pick a date after today." });
  const live = await em.count(ShareLinkSchema, { plan: plan.id, revokedAt: null, $or: [{ expiresAt: null }, { expiresAt: { $gt: new Date() } }] });
  if (live >= MAX_LIVE_LINKS) throw invalid(`A plan can have ${MAX_LIVE_LINKS} live links; revoke some first.`);
  const { token, hash } = newToken();
  const link = em.create(ShareLinkSchema, { plan, createdBy: user, tokenHash: hash, label: input.label || null, expiresAt: input.expiresAt ?? null, openCount: 0 });
  await em.flush();
  return { link: view(link), token, url: appLink(`/s/${token}`) };
}

/** Revokes a link for good (owner only); revoking twice is harmless. */
export async function revokeLink(em: EntityManager, user: User, planId: string, linkId: string): Promise<ShareLinkView> {
  const { plan } = await accessPlan(em, planId, user, "owner");
  const link = await em.findOne(ShareLinkSchema, { id: linkId, plan: plan.id });
  if (!link) throw notFound("That link");
  link.revokedAt ??= new Date();
  await em.flush();
  return view(link);
}

export interface SharedPlan {
  name: string;
  /** The plan's saved version (the revision a printed packet names). */
  version: number;
  ownerName: string;
  updatedAt: string;
  document: PlanDocument;
  copiedFrom: string | null;
}

/** Finds the live link for a token; revoked, expired, unknown or a deleted plan all answer 404. */
async function liveLink(em: EntityManager, token: string): Promise<ShareLink> {
  if (!tokenShape.test(token)) throw notFound("That shared plan");
  const link = await em.findOne(ShareLinkSchema, { tokenHash: hashToken(token), revokedAt: null }, { populate: ["plan", "plan.owner", "plan.document"] });
  if (!link || (link.expiresAt && link.expiresAt <= new Date()) || link.plan.deletedAt) throw notFound("That shared plan");
  return link;
}

/** Opens a shared plan read-only, without an account; records when the link was last opened. */
export async function openShared(em: EntityManager, token: string, opts: { record?: boolean } = {}): Promise<SharedPlan> {
  const link = await liveLink(em, token);
  if (opts.record !== false) {
    // An atomic increment: concurrent opens must not lose counts.
    await em.getConnection().execute(`update "share_link" set "open_count" = "open_count" + 1, "last_opened_at" = now() where "id" = ?`, [link.id]);
  }
  const p = link.plan;
  return { name: p.name, version: p.version, ownerName: p.owner.name, updatedAt: p.updatedAt.toISOString(), document: p.document as unknown as PlanDocument, copiedFrom: p.copiedFrom ?? null };
}

/** Copies a shared plan into the signed-in account, noting where it came from. */
export async function copyShared(em: EntityManager, user: User, token: string, name?: string): Promise<PlanDetail> {
  const link = await liveLink(em, token);
  const p = await em.findOneOrFail(PlanSchema, { id: link.plan.id }, { populate: ["document", "owner"] });
  const when = new Date().toISOString().slice(0, 10);
  return createPlan(em, user, { name: (name ?? `${p.name} (copy)`).slice(0, 120), document: p.document, copiedFrom: `Copied from "${p.name}" shared by ${p.owner.name} on ${when}`.slice(0, 300) });
}
