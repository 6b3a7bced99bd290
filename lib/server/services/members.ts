import type { EntityManager } from "@mikro-orm/postgresql";
import { PlanMemberSchema, type PlanMemberRole } from "@/entities/PlanMember";
import type { User } from "@/entities/User";
import { notFound } from "../errors";
import { accessPlan, type PlanRole } from "../policy";

export interface MemberView {
  userId: string;
  name: string;
  email: string;
  role: PlanRole;
  since: string;
}

/** Who works on the plan: the owner first, then collaborators. Any role on the plan may look. */
export async function listMembers(em: EntityManager, user: User, planId: string): Promise<MemberView[]> {
  const { plan } = await accessPlan(em, planId, user, "viewer");
  const rows = await em.find(PlanMemberSchema, { plan: plan.id }, { populate: ["user"], orderBy: { createdAt: "asc" } });
  const owner: MemberView = { userId: plan.owner.id, name: plan.owner.name, email: plan.owner.email, role: "owner", since: plan.createdAt.toISOString() };
  return [owner, ...rows.map((m) => ({ userId: m.user.id, name: m.user.name, email: m.user.email, role: m.role as PlanRole, since: m.createdAt.toISOString() }))];
}

/** Changes a collaborator's role (owner only). */
export async function changeMemberRole(em: EntityManager, user: User, planId: string, memberUserId: string, role: PlanMemberRole): Promise<MemberView> {
  const { plan } = await accessPlan(em, planId, user, "owner");
  const m = await em.findOne(PlanMemberSchema, { plan: plan.id, user: memberUserId }, { populate: ["user"] });
  if (!m) throw notFound("That collaborator");
  m.role = role;
  await em.flush();
  return { userId: m.user.id, name: m.user.name, email: m.user.email, role, since: m.createdAt.toISOString() };
}

/** Removes a collaborator: the owner may remove anyone, a collaborator only themselves (leaving the plan). */
export async function removeMember(em: EntityManager, user: User, planId: string, memberUserId: string): Promise<void> {
  const self = memberUserId === user.id;
  const { plan, role } = await accessPlan(em, planId, user, self ? "viewer" : "owner");
  if (self && role === "owner") throw notFound("That collaborator");
  const m = await em.findOne(PlanMemberSchema, { plan: plan.id, user: memberUserId });
  if (!m) throw notFound("That collaborator");
  em.remove(m);
  await em.flush();
}
