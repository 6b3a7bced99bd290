import { EntitySchema } from "@mikro-orm/core";
import type { BaseRow } from "./base";
import type { User } from "./User";

export interface Plan extends BaseRow {
  owner: User;
  name: string;
  units: string;
  /** The plan document (lib/engine/plan/schema.ts), stored as jsonb. */
  document: Record<string, unknown>;
  /** Optimistic lock: every accepted save increments it. */
  version: number;
  updatedAt: Date;
  /** Soft delete: restorable for 30 days. */
  deletedAt?: Date | null;
  /** Where a copied plan came from (a note for the copier). */
  copiedFrom?: string | null;
}

export const PlanSchema = new EntitySchema<Plan, BaseRow>({
  name: "Plan",
  tableName: "plan",
  extends: "BaseRow",
  indexes: [{ properties: ["owner", "updatedAt"] }],
  properties: {
    owner: { kind: "m:1", entity: "User", deleteRule: "cascade" },
    name: { type: "string", length: 120 },
    units: { type: "string", length: 8, default: "in" },
    document: { type: "json", lazy: true },
    version: { type: "integer", default: 1 },
    updatedAt: { type: "datetime", columnType: "timestamptz", onCreate: () => new Date() },
    deletedAt: { type: "datetime", columnType: "timestamptz", nullable: true },
    copiedFrom: { type: "string", length: 300, nullable: true },
  },
});
