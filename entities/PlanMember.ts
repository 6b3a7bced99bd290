import { EntitySchema } from "@mikro-orm/core";
import type { BaseRow } from "./base";
import type { Plan } from "./Plan";
import type { User } from "./User";

export const PLAN_ROLES = ["editor", "viewer"] as const;
export type PlanMemberRole = (typeof PLAN_ROLES)[number];

/** A collaborator's role on a plan (the owner is Plan.owner, not a member row). */
export interface PlanMember extends BaseRow {
  plan: Plan;
  user: User;
  role: PlanMemberRole;
}

export const PlanMemberSchema = new EntitySchema<PlanMember, BaseRow>({
  name: "PlanMember",
  tableName: "plan_member",
  extends: "BaseRow",
  uniques: [{ properties: ["plan", "user"] }],
  properties: {
    plan: { kind: "m:1", entity: "Plan", deleteRule: "cascade" },
    user: { kind: "m:1", entity: "User", deleteRule: "cascade" },
    role: { type: "string", length: 16 },
  },
});
