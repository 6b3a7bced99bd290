import { EntitySchema } from "@mikro-orm/core";
import type { BaseRow } from "./base";
import type { User } from "./User";

/** An instructor's tightened rule numbers that a plan can adopt. */
export interface RulePreset extends BaseRow {
  owner: User;
  name: string;
  description: string;
  numbers: Record<string, number>;
  published: boolean;
  updatedAt: Date;
}

export const RulePresetSchema = new EntitySchema<RulePreset, BaseRow>({
  name: "RulePreset",
  tableName: "rule_preset",
  extends: "BaseRow",
  properties: {
    owner: { kind: "m:1", entity: "User", deleteRule: "cascade" },
    name: { type: "string", length: 120 },
    description: { type: "text", default: "" },
    numbers: { type: "json" },
    published: { type: "boolean", default: false },
    updatedAt: { type: "datetime", columnType: "timestamptz", onCreate: () => new Date(), onUpdate: () => new Date() },
  },
});
