import { EntitySchema } from "@mikro-orm/core";
import type { BaseRow } from "./base";

/** A failed sign-in, kept in the database so the limit holds across instances. key is "acct:<email>" or "ip:<addr>". */
export interface LoginAttempt extends BaseRow {
  key: string;
}

export const LoginAttemptSchema = new EntitySchema<LoginAttempt, BaseRow>({
  name: "LoginAttempt",
  tableName: "login_attempt",
  extends: "BaseRow",
  indexes: [{ properties: ["key", "createdAt"] }],
  properties: { key: { type: "string", length: 300 } },
});
