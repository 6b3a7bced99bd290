import type { EntityManager } from "@mikro-orm/postgresql";
import { InvitationSchema, type Invitation } from "@/entities/Invitation";
import { PlanMemberSchema, type PlanMemberRole } from "@/entities/PlanMember";
import type { User } from "@/entities/User";
import { AppError, forbidden, invalid, notFound, tooMany } from "../errors";
import { invitationMessage } from "../mail/templates";
import { accessPlan } from "../policy";
import { appLink, sendMail } from "./mail";
import { hashToken, newToken, tokenShape } from "./tokens";

export const INVITE_DAYS = 14;
/** Invitations one plan may send per day (stops the app being used to spray e-mail). */
const MAX_PER_DAY = 30;

export interface InvitationView {
  id: string;
  email: string;
  role: PlanMemberRole;
  createdAt: string;
  expiresAt: string;
  acceptedAt: string | null;
  revokedAt: string | null;
  state: "pending" | "accepted" | "revoked" | "expired";
}

function view(i: Invitation): InvitationView {
  const state = i.acceptedAt ? "accepted" : i.revokedAt ? "revoked" : i.expiresAt <= new Date() ? "expired" : "pending";
  const iso = (d?: Date | null) => (d ? d.toISOString() : null);
  return { id: i.id, email: i.email, role: i.role as PlanMemberRole, createdAt: i.createdAt.toISOString(), expiresAt: i.expiresAt.toISOString(), acceptedAt: iso(i.acceptedAt), revokedAt: iso(i.revokedAt), state };
}

export async function listInvitations(em: EntityManager, user: User, planId: string): Promise<InvitationView[]> {
  const { plan } = await accessPlan(em, planId, user, "owner");
  const rows = await em.find(InvitationSchema, { plan: plan.id }, { orderBy: { createdAt: "desc" }, limit: 200 });
  return rows.map(view);
}

/** Invites an address with a role and e-mails the link (owner only). The token is never stored. */
export async function invite(em: EntityManager, user: User, planId: string, input: { email: string; role: PlanMemberRole }): Promise<{ invitation: InvitationView; url: string }> {
  const { plan } = await accessPlan(em, planId, user, "owner");
  const email = input.email.trim().toLowerCase();
  if (email === user.email.toLowerCase()) throw invalid("You already own this plan.", { email: "That is your own address." });
  const since = new Date(Date.now() - 86_400_000);
  if ((await em.count(InvitationSchema, { plan: plan.id, createdAt: { $gte: since } })) >= MAX_PER_DAY) throw tooMany(`A plan can send ${MAX_PER_DAY} invitations a day. Try again tomorrow.`);
  const { token, hash } = newToken();
  const inv = em.create(InvitationSchema, { plan, email, role: input.role, tokenHash: hash, invitedBy: user, expiresAt: new Date(Date.now() + INVITE_DAYS * 86_400_000) });
  const url = appLink(`/invite/${token}`);
  await sendMail(email, invitationMessage({ inviterName: user.name, planName: plan.name, role: input.role, url, expiresDays: INVITE_DAYS }));
  await em.flush();
  return { invitation: view(inv), url };
}

export async function revokeInvitation(em: EntityManager, user: User, planId: string, invitationId: string): Promise<InvitationView> {
  const { plan } = await accessPlan(em, planId, user, "owner");
  const inv = await em.findOne(InvitationSchema, { id: invitationId, plan: plan.id });
  if (!inv) throw notFound("That invitation");
  if (!inv.acceptedAt) inv.revokedAt ??= new Date();
  await em.flush();
  return view(inv);
}

export interface InvitationPreview {
  planName: string;
  inviterName: string;
  email: string;
  role: PlanMemberRole;
  expiresAt: string;
  planId: string;
}

async function pending(em: EntityManager, token: string): Promise<Invitation> {
  if (!tokenShape.test(token)) throw notFound("That invitation");
  const inv = await em.findOne(InvitationSchema, { tokenHash: hashToken(token) }, { populate: ["plan", "invitedBy"] });
  if (!inv || inv.revokedAt || inv.acceptedAt || inv.expiresAt <= new Date() || inv.plan.deletedAt) throw notFound("That invitation");
  return inv;
}

/** What the invitation page shows before accepting (anyone holding the link may read it). */
export async function previewInvitation(em: EntityManager, token: string): Promise<InvitationPreview> {
  const inv = await pending(em, token);
  return { planName: inv.plan.name, inviterName: inv.invitedBy.name, email: inv.email, role: inv.role as PlanMemberRole, expiresAt: inv.expiresAt.toISOString(), planId: inv.plan.id };
}

/**
 * Accepts: the signed-in account must have the invited address (a forwarded link does not grant
 * access to someone else). An existing role is replaced by the invited one.
 */
export async function acceptInvitation(em: EntityManager, user: User, token: string): Promise<{ planId: string; role: PlanMemberRole }> {
  const inv = await pending(em, token);
  if (inv.email !== user.email.toLowerCase()) throw forbidden(`This invitation was sent to ${inv.email}. Sign in with that address to accept it.`);
  if (inv.plan.owner.id === user.id) throw new AppError(409, "already_owner", "You own this plan already.");
  const role = inv.role as PlanMemberRole;
  const existing = await em.findOne(PlanMemberSchema, { plan: inv.plan.id, user: user.id });
  if (existing) existing.role = role;
  else em.create(PlanMemberSchema, { plan: inv.plan, user, role });
  inv.acceptedAt = new Date();
  await em.flush();
  return { planId: inv.plan.id, role };
}
