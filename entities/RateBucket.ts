import { EntitySchema } from "@mikro-orm/core";

/**
 * A fixed-window request counter (lib/server/fixed-window.ts), kept in the database so a limit holds
 * across instances: one row per key (e.g. "analyze:<address>"), the start of its current window and
 * the requests counted in it.
 */
export interface RateBucket {
  key: string;
  windowStart: Date;
  count: number;
}

export const RateBucketSchema = new EntitySchema<RateBucket>({
  name: "RateBucket",
  tableName: "rate_bucket",
  indexes: [{ properties: ["windowStart"] }],
  properties: {
    key: { type: "string", length: 200, primary: true },
    windowStart: { type: "datetime", columnType: "timestamptz" },
    count: { type: "integer" },
  },
});
