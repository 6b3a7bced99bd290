import { EntitySchema } from "@mikro-orm/core";
import type { BaseRow } from "./base";
import type { Plan } from "./Plan";
import type { User } from "./User";

/** A reference photo of a wall, stored in object storage after re-encoding without metadata. */
export interface WallPhoto extends BaseRow {
  plan: Plan;
  wallId: string;
  uploadedBy: User;
  /** Key of the upload as received (private) and of the cleaned copy others may see. */
  uploadKey: string;
  cleanKey?: string | null;
  status: "pending" | "ready" | "rejected";
  contentType?: string | null;
  bytes?: number | null;
  widthPx?: number | null;
  heightPx?: number | null;
  /** Two marked points and the known distance between them: { ax, ay, bx, by, distanceMm }. */
  scale?: Record<string, number> | null;
}

export const WallPhotoSchema = new EntitySchema<WallPhoto, BaseRow>({
  name: "WallPhoto",
  tableName: "wall_photo",
  extends: "BaseRow",
  properties: {
    plan: { kind: "m:1", entity: "Plan", deleteRule: "cascade" },
    wallId: { type: "string", length: 64 },
    uploadedBy: { kind: "m:1", entity: "User", deleteRule: "cascade" },
    uploadKey: { type: "string", length: 200 },
    cleanKey: { type: "string", length: 200, nullable: true },
    status: { type: "string", length: 16, default: "pending" },
    contentType: { type: "string", length: 40, nullable: true },
    bytes: { type: "integer", nullable: true },
    widthPx: { type: "integer", nullable: true },
    heightPx: { type: "integer", nullable: true },
    scale: { type: "json", nullable: true },
  },
});
