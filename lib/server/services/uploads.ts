import type { EntityManager } from "@mikro-orm/postgresql";
import { randomUUID } from "node:crypto";
import { z } from "zod";
import type { User } from "@/entities/User";
import { WallPhotoSchema, type WallPhoto } from "@/entities/WallPhoto";
import type { PlanDocument } from "@/lib/engine/plan/schema";
import type { AppError} from "../errors";
import { invalid, notFound } from "../errors";
import { accessPlan } from "../policy";
import { deleteObject, objectSize, presignGet, presignPut, readObject, writeObject } from "../storage";
import { mmPerPx } from "./photo-scale";
import { INCOMING_PREFIX, uploadExpired } from "./upload-expiry";
import { ACCEPTED_TYPES, MAX_UPLOAD_BYTES, reencode, sniffImageType } from "./image-check";

/** Photos a plan may hold (each wall a few). */
const MAX_PHOTOS = 60;

export const requestUploadBody = z.object({
  wallId: z.string().min(1).max(64),
  contentType: z.enum(ACCEPTED_TYPES, { error: "Upload a JPEG, PNG or WebP image." }),
  bytes: z.number().int().min(1).max(MAX_UPLOAD_BYTES, `Photos can be at most ${MAX_UPLOAD_BYTES / 1024 / 1024} MB.`),
});

/** Two points marked on the photo (pixels of the clean copy) and the known distance between them. */
export const scaleBody = z.object({
  scale: z
    .object({ ax: z.number().finite().min(0), ay: z.number().finite().min(0), bx: z.number().finite().min(0), by: z.number().finite().min(0), distanceMm: z.number().finite().positive().max(100_000) })
    .refine((s) => Math.hypot(s.bx - s.ax, s.by - s.ay) >= 10, { message: "Mark two points at least 10 pixels apart." })
    .nullable(),
});

export interface PhotoView {
  id: string;
  wallId: string;
  status: WallPhoto["status"];
  widthPx: number | null;
  heightPx: number | null;
  bytes: number | null;
  scale: { ax: number; ay: number; bx: number; by: number; distanceMm: number } | null;
  /** Millimetres per pixel from the two marked points, when set. */
  mmPerPx: number | null;
  /** A short-lived link to the cleaned copy (ready photos only). */
  url: string | null;
  createdAt: string;
}

async function view(p: WallPhoto): Promise<PhotoView> {
  const scale = (p.scale as PhotoView["scale"]) ?? null;
  return {
    id: p.id,
    wallId: p.wallId,
    status: p.status,
    widthPx: p.widthPx ?? null,
    heightPx: p.heightPx ?? null,
    bytes: p.bytes ?? null,
    scale,
    mmPerPx: scale ? mmPerPx(scale) : null,
    url: p.status === "ready" && p.cleanKey ? await presignGet(p.cleanKey) : null,
    createdAt: p.createdAt.toISOString(),
  };
}

export async function listPhotos(em: EntityManager, user: User, planId: string): Promise<PhotoView[]> {
  const { plan } = await accessPlan(em, planId, user, "viewer");
  const rows = await em.find(WallPhotoSchema, { plan: plan.id, status: "ready" }, { orderBy: { createdAt: "asc" } });
  return Promise.all(rows.map(view));
}

export async function getPhoto(em: EntityManager, user: User, planId: string, photoId: string): Promise<PhotoView> {
  const { plan } = await accessPlan(em, planId, user, "viewer");
  const p = await em.findOne(WallPhotoSchema, { id: photoId, plan: plan.id });
  if (!p) throw notFound("That photo");
  return view(p);
}

/** Step 1: a pending photo and a presigned PUT for the raw upload (editor or owner). */
export async function requestUpload(em: EntityManager, user: User, planId: string, input: z.infer<typeof requestUploadBody>): Promise<{ photo: PhotoView; upload: { url: string; method: "PUT"; headers: Record<string, string>; maxBytes: number } }> {
  const { plan } = await accessPlan(em, planId, user, "editor", { withDocument: true });
  const walls = (plan.document as unknown as PlanDocument).room?.walls ?? [];
  if (!walls.some((w) => w.id === input.wallId)) throw invalid("That wall is not in the plan.", { wallId: "Pick one of the plan's walls." });
  if ((await em.count(WallPhotoSchema, { plan: plan.id })) >= MAX_PHOTOS) throw invalid(`A plan can hold ${MAX_PHOTOS} photos; delete some first.`);
  const uploadKey = `${INCOMING_PREFIX}${plan.id}/${randomUUID()}`;
  const photo = em.create(WallPhotoSchema, { plan, wallId: input.wallId, uploadedBy: user, uploadKey, status: "pending", bytes: input.bytes });
  await em.flush();
  const url = await presignPut(uploadKey, input.contentType);
  return { photo: await view(photo), upload: { url, method: "PUT", headers: { "content-type": input.contentType }, maxBytes: MAX_UPLOAD_BYTES } };
}

function refuse(p: WallPhoto, message: string, field = "file"): AppError {
  p.status = "rejected";
  return invalid(message, { [field]: message });
}

/**
 * Step 2: the server fetches the raw upload, checks its size and its type by content, re-encodes it
 * without any metadata, stores the clean copy and deletes the raw one. Only then can others see it.
 */
export async function confirmUpload(em: EntityManager, user: User, planId: string, photoId: string): Promise<PhotoView> {
  const { plan } = await accessPlan(em, planId, user, "editor");
  const p = await em.findOne(WallPhotoSchema, { id: photoId, plan: plan.id });
  if (!p) throw notFound("That photo");
  if (p.status === "ready") return view(p);
  if (p.status === "rejected") throw invalid("This upload was refused; start a new one.");
  if (uploadExpired(p.createdAt)) {
    // Past the limit the scheduled clean-up would remove it anyway: do it now and say so.
    await deleteObject(p.uploadKey).catch(() => undefined);
    em.remove(p);
    await em.flush();
    throw invalid("This upload waited too long for its confirmation and was removed; start a new one.");
  }
  let error: AppError | null = null;
  const size = await objectSize(p.uploadKey);
  if (size === null) throw invalid("Nothing was uploaded yet: PUT the file to the upload address first.", { file: "No file received." });
  if (size > MAX_UPLOAD_BYTES) error = refuse(p, `The file is ${(size / 1048576).toFixed(1)} MB; photos can be at most ${MAX_UPLOAD_BYTES / 1048576} MB.`);
  const raw = error ? null : await readObject(p.uploadKey, MAX_UPLOAD_BYTES);
  if (!error && !raw) error = refuse(p, `Photos can be at most ${MAX_UPLOAD_BYTES / 1048576} MB.`);
  if (!error && raw && !sniffImageType(raw)) error = refuse(p, "That file is not a JPEG, PNG or WebP image (checked by its content, not its name).");
  if (!error && raw) {
    try {
      const clean = await reencode(raw);
      const cleanKey = `photos/${plan.id}/${p.id}.jpg`;
      await writeObject(cleanKey, clean.data, clean.contentType);
      Object.assign(p, { cleanKey, status: "ready", contentType: clean.contentType, bytes: clean.data.length, widthPx: clean.widthPx, heightPx: clean.heightPx });
    } catch {
      error = refuse(p, "The image could not be read (damaged, or larger than 50 megapixels).");
    }
  }
  await deleteObject(p.uploadKey).catch(() => undefined);
  await em.flush();
  if (error) throw error;
  return view(p);
}

/** Sets or clears the two-point scale (editor or owner). */
export async function setScale(em: EntityManager, user: User, planId: string, photoId: string, scale: z.infer<typeof scaleBody>["scale"]): Promise<PhotoView> {
  const { plan } = await accessPlan(em, planId, user, "editor");
  const p = await em.findOne(WallPhotoSchema, { id: photoId, plan: plan.id, status: "ready" });
  if (!p) throw notFound("That photo");
  if (scale && p.widthPx && p.heightPx && [scale.ax, scale.bx].some((x) => x > p.widthPx!) ) throw invalid("A point is outside the photo.", { scale: "Mark points inside the photo." });
  if (scale && p.heightPx && [scale.ay, scale.by].some((y) => y > p.heightPx!)) throw invalid("A point is outside the photo.", { scale: "Mark points inside the photo." });
  p.scale = scale;
  await em.flush();
  return view(p);
}

export async function deletePhoto(em: EntityManager, user: User, planId: string, photoId: string): Promise<void> {
  const { plan } = await accessPlan(em, planId, user, "editor");
  const p = await em.findOne(WallPhotoSchema, { id: photoId, plan: plan.id });
  if (!p) throw notFound("That photo");
  await Promise.all([p.cleanKey ? deleteObject(p.cleanKey) : null, deleteObject(p.uploadKey)].map((x) => x?.catch(() => undefined)));
  em.remove(p);
  await em.flush();
}
