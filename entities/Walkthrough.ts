import { EntitySchema } from "@mikro-orm/core";
import type { BaseRow } from "./base";
import type { Plan } from "./Plan";
import type { User } from "./User";

/** An instructor's ordered steps over a plan: camera view, highlights, the rule shown, a note. */
export interface Walkthrough extends BaseRow {
  plan: Plan;
  owner: User;
  title: string;
  steps: Record<string, unknown>[];
  published: boolean;
  /** Hash of the token that lets students open it without editing rights. */
  viewTokenHash?: string | null;
  updatedAt: Date;
}

export const WalkthroughSchema = new EntitySchema<Walkthrough, BaseRow>({
  name: "Walkthrough",
  tableName: "walkthrough",
  extends: "BaseRow",
  properties: {
    plan: { kind: "m:1", entity: "Plan", deleteRule: "cascade" },
    owner: { kind: "m:1", entity: "User", deleteRule: "cascade" },
    title: { type: "string", length: 120 },
    steps: { type: "json" },
    published: { type: "boolean", default: false },
    viewTokenHash: { type: "string", length: 64, nullable: true, unique: true },
    updatedAt: { type: "datetime", columnType: "timestamptz", onCreate: () => new Date(), onUpdate: () => new Date() },
  },
});
