import { EntitySchema, type OptionalProps } from "@mikro-orm/core";
import { randomUUID } from "node:crypto";

/** Columns every table carries. */
export interface BaseRow {
  /** Properties filled by defaults or hooks, so creating a row need not give them. */
  [OptionalProps]?: "id" | "createdAt" | "updatedAt" | "version" | "role" | "units" | "openCount" | "status" | "published" | "currency" | "description";
  id: string;
  createdAt: Date;
}

export const BaseSchema = new EntitySchema<BaseRow>({
  name: "BaseRow",
  abstract: true,
  properties: {
    id: { type: "uuid", primary: true, onCreate: () => randomUUID() },
    createdAt: { type: "datetime", columnType: "timestamptz", onCreate: () => new Date() },
  },
});
