import { EntitySchema } from "@mikro-orm/core";
import type { BaseRow } from "./base";
import type { Plan } from "./Plan";
import type { User } from "./User";

/** The document as it was before an accepted save replaced it. */
export interface PlanRevision extends BaseRow {
  plan: Plan;
  /** The plan version this document had. */
  version: number;
  name: string;
  document: Record<string, unknown>;
  author: User;
  note?: string | null;
}

export const PlanRevisionSchema = new EntitySchema<PlanRevision, BaseRow>({
  name: "PlanRevision",
  tableName: "plan_revision",
  extends: "BaseRow",
  indexes: [{ properties: ["plan", "version"] }],
  properties: {
    plan: { kind: "m:1", entity: "Plan", deleteRule: "cascade" },
    version: { type: "integer" },
    name: { type: "string", length: 120 },
    document: { type: "json", lazy: true },
    author: { kind: "m:1", entity: "User", deleteRule: "cascade" },
    note: { type: "string", length: 200, nullable: true },
  },
});
