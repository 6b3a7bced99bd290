import { LockMode } from "@mikro-orm/core";
import type { EntityManager } from "@mikro-orm/postgresql";
import { PlanSchema, type Plan } from "@/entities/Plan";
import { PlanMemberSchema } from "@/entities/PlanMember";
import type { User } from "@/entities/User";
import { forbidden, notFound } from "./errors";

export type PlanRole = "owner" | "editor" | "viewer";
const RANK: Record<PlanRole, number> = { viewer: 1, editor: 2, owner: 3 };

/** The account's role on a plan, or null when it has none. */
export async function planRole(em: EntityManager, plan: Plan, user: User): Promise<PlanRole | null> {
  if (plan.owner.id === user.id) return "owner";
  const m = await em.findOne(PlanMemberSchema, { plan: plan.id, user: user.id });
  return (m?.role as PlanRole | undefined) ?? null;
}

/**
 * Loads a live plan the account may use at `need` or above. No role at all answers 404 (the plan's
 * existence is not disclosed); a role too low answers 403.
 */
export async function accessPlan(em: EntityManager, planId: string, user: User, need: PlanRole, opts: { withDocument?: boolean; lock?: boolean } = {}): Promise<{ plan: Plan; role: PlanRole }> {
  const plan = await em.findOne(
    PlanSchema,
    { id: planId, deletedAt: null },
    { populate: opts.withDocument ? ["document", "owner"] : ["owner"], ...(opts.lock ? { lockMode: LockMode.PESSIMISTIC_WRITE } : {}) },
  );
  if (!plan) throw notFound("That plan");
  const role = await planRole(em, plan, user);
  if (!role) throw notFound("That plan");
  if (RANK[role] < RANK[need]) throw forbidden(need === "owner" ? "Only the plan's owner can do this." : "You can look at this plan but not change it.");
  return { plan, role };
}
