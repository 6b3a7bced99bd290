import { EntitySchema } from "@mikro-orm/core";
import type { BaseRow } from "./base";
import type { User } from "./User";

/** An account's own prices: items keyed like the shopping list ({ key, name, unit, priceCents }). */
export interface PriceList extends BaseRow {
  owner: User;
  items: Record<string, unknown>[];
  currency: string;
  updatedAt: Date;
}

export const PriceListSchema = new EntitySchema<PriceList, BaseRow>({
  name: "PriceList",
  tableName: "price_list",
  extends: "BaseRow",
  properties: {
    owner: { kind: "m:1", entity: "User", deleteRule: "cascade", unique: true },
    items: { type: "json" },
    currency: { type: "string", length: 3, default: "USD" },
    updatedAt: { type: "datetime", columnType: "timestamptz", onCreate: () => new Date(), onUpdate: () => new Date() },
  },
});
