import { EntitySchema } from "@mikro-orm/core";
import type { BaseRow } from "./base";
import type { User } from "./User";

/** A one-time token sent by e-mail: address verification or password reset. Only its hash is stored. */
export interface EmailToken extends BaseRow {
  user: User;
  purpose: "verify" | "reset";
  tokenHash: string;
  expiresAt: Date;
  usedAt?: Date | null;
}

export const EmailTokenSchema = new EntitySchema<EmailToken, BaseRow>({
  name: "EmailToken",
  tableName: "email_token",
  extends: "BaseRow",
  properties: {
    user: { kind: "m:1", entity: "User", deleteRule: "cascade" },
    purpose: { type: "string", length: 16 },
    tokenHash: { type: "string", length: 64, unique: true },
    expiresAt: { type: "datetime", columnType: "timestamptz" },
    usedAt: { type: "datetime", columnType: "timestamptz", nullable: true },
  },
});
