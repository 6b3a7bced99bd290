import "server-only";
import type { EntityManager } from "@mikro-orm/postgresql";
import { WallPhotoSchema } from "@/entities/WallPhoto";
import { env } from "../env";
import { deleteObject, listObjects } from "../storage";

/** Where raw uploads wait for their confirmation (see requestUpload). */
export const INCOMING_PREFIX = "incoming/";

/** How old an unconfirmed upload may get, in milliseconds (UPLOAD_EXPIRY_HOURS, default 24). */
export const uploadMaxAgeMs = (): number => env().UPLOAD_EXPIRY_HOURS * 3_600_000;

/** True when an upload started at `createdAt` is past the limit. */
export const uploadExpired = (createdAt: Date, now = new Date()) => now.getTime() - createdAt.getTime() > uploadMaxAgeMs();

const BATCH = 200;

/**
 * The scheduled clean-up: every upload never confirmed (or refused) and older than the limit loses
 * its raw object and its row; then any object left in the incoming area past the limit (its row gone
 * some other way) is deleted too. An object is deleted before its row, so a storage failure leaves
 * the row for the next run rather than an object nobody tracks.
 */
export async function expireUploads(em: EntityManager, now = new Date()): Promise<{ rows: number; objects: number }> {
  const cutoff = new Date(now.getTime() - uploadMaxAgeMs());
  let rows = 0;
  let objects = 0;
  for (;;) {
    const batch = await em.find(WallPhotoSchema, { status: { $in: ["pending", "rejected"] }, createdAt: { $lt: cutoff } }, { limit: BATCH, orderBy: { createdAt: "asc" } });
    for (const p of batch) {
      await deleteObject(p.uploadKey);
      objects += 1;
    }
    em.remove(batch);
    await em.flush();
    rows += batch.length;
    if (batch.length < BATCH) break;
  }
  for await (const o of listObjects(INCOMING_PREFIX)) {
    // An object is written after its row, so one older than the limit belongs to an expired upload.
    if (o.modifiedAt < cutoff) {
      await deleteObject(o.key);
      objects += 1;
    }
  }
  return { rows, objects };
}
