import { EntitySchema } from "@mikro-orm/core";
import type { BaseRow } from "./base";
import type { Plan } from "./Plan";
import type { User } from "./User";

/**
 * One check-off on the shop floor (lib/engine/shop/progress.ts): a piece cut at a setup or a build
 * step done (+1), or the undo of one (-1), by a person with access to the plan. The id is chosen by
 * the phone that made it, so a check-off sent twice after a dropped connection is stored once.
 */
export interface ShopCheck extends BaseRow {
  plan: Plan;
  user: User;
  /** "cut:<setup id>:<label>" or "step:<step id>". */
  item: string;
  delta: number;
  /** When it was made on the phone (may be before it reached the server). */
  madeAt: Date;
}

export const ShopCheckSchema = new EntitySchema<ShopCheck, BaseRow>({
  name: "ShopCheck",
  tableName: "shop_check",
  extends: "BaseRow",
  indexes: [{ properties: ["plan", "item"] }],
  properties: {
    plan: { kind: "m:1", entity: "Plan", deleteRule: "cascade" },
    user: { kind: "m:1", entity: "User", deleteRule: "cascade" },
    item: { type: "string", length: 140 },
    delta: { type: "smallint" },
    madeAt: { type: "datetime", columnType: "timestamptz" },
  },
});
