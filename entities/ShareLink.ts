import { EntitySchema } from "@mikro-orm/core";
import type { BaseRow } from "./base";
import type { Plan } from "./Plan";
import type { User } from "./User";

/** A read-only link to a plan. Only the SHA-256 of the token is stored. */
export interface ShareLink extends BaseRow {
  plan: Plan;
  createdBy: User;
  tokenHash: string;
  label?: string | null;
  expiresAt?: Date | null;
  revokedAt?: Date | null;
  lastOpenedAt?: Date | null;
  openCount: number;
}

export const ShareLinkSchema = new EntitySchema<ShareLink, BaseRow>({
  name: "ShareLink",
  tableName: "share_link",
  extends: "BaseRow",
  properties: {
    plan: { kind: "m:1", entity: "Plan", deleteRule: "cascade" },
    createdBy: { kind: "m:1", entity: "User", deleteRule: "cascade" },
    tokenHash: { type: "string", length: 64, unique: true },
    label: { type: "string", length: 80, nullable: true },
    expiresAt: { type: "datetime", columnType: "timestamptz", nullable: true },
    revokedAt: { type: "datetime", columnType: "timestamptz", nullable: true },
    lastOpenedAt: { type: "datetime", columnType: "timestamptz", nullable: true },
    openCount: { type: "integer", default: 0 },
  },
});
