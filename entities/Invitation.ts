import { EntitySchema } from "@mikro-orm/core";
import type { BaseRow } from "./base";
import type { Plan } from "./Plan";
import type { User } from "./User";

/** An invitation by e-mail to collaborate on a plan. Only the token's hash is stored. */
export interface Invitation extends BaseRow {
  plan: Plan;
  email: string;
  role: string;
  tokenHash: string;
  invitedBy: User;
  expiresAt: Date;
  acceptedAt?: Date | null;
  revokedAt?: Date | null;
}

export const InvitationSchema = new EntitySchema<Invitation, BaseRow>({
  name: "Invitation",
  tableName: "invitation",
  extends: "BaseRow",
  properties: {
    plan: { kind: "m:1", entity: "Plan", deleteRule: "cascade" },
    email: { type: "string", length: 254 },
    role: { type: "string", length: 16 },
    tokenHash: { type: "string", length: 64, unique: true },
    invitedBy: { kind: "m:1", entity: "User", deleteRule: "cascade" },
    expiresAt: { type: "datetime", columnType: "timestamptz" },
    acceptedAt: { type: "datetime", columnType: "timestamptz", nullable: true },
    revokedAt: { type: "datetime", columnType: "timestamptz", nullable: true },
  },
});
