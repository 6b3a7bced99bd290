import { EntitySchema, type Opt } from "@mikro-orm/core";
import type { BaseRow } from "./base";

export const ACCOUNT_ROLES = ["member", "instructor", "admin"] as const;
export type AccountRole = (typeof ACCOUNT_ROLES)[number];

export interface User extends BaseRow {
  email: string;
  name: string;
  passwordHash: string;
  role: AccountRole;
  emailVerifiedAt?: Date | null;
  /**
   * Carried in every session cookie; raising it (sign-out, password reset or change, disable) ends
   * every session issued before.
   */
  sessionVersion: Opt<number>;
  /** Set by an administrator: the account cannot sign in and its sessions are over. */
  disabledAt?: Date | null;
  updatedAt: Date;
}

export const UserSchema = new EntitySchema<User, BaseRow>({
  name: "User",
  tableName: "app_user",
  extends: "BaseRow",
  properties: {
    email: { type: "string", length: 254, unique: true },
    name: { type: "string", length: 100 },
    passwordHash: { type: "string", length: 100, lazy: true },
    role: { type: "string", length: 16, default: "member" },
    emailVerifiedAt: { type: "datetime", columnType: "timestamptz", nullable: true },
    sessionVersion: { type: "integer", default: 1 },
    disabledAt: { type: "datetime", columnType: "timestamptz", nullable: true },
    updatedAt: { type: "datetime", columnType: "timestamptz", onCreate: () => new Date(), onUpdate: () => new Date() },
  },
});
