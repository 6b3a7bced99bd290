import { json, parseBody, parseParams, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { idParam } from "@/lib/server/schemas";
import { requireUser } from "@/lib/server/session";
import { listPhotos, requestUpload, requestUploadBody } from "@/lib/server/services/uploads";

type Ctx = { params: Promise<{ id: string }> };

/** The plan's cleaned wall photos, each with a short-lived link and its scale. */
export const GET = route<Ctx>(async (_req, ctx) => {
  const { id } = parseParams(await ctx.params, idParam);
  const em = await requestEm();
  const user = await requireUser(em);
  return json({ photos: await listPhotos(em, user, id) });
});

/** Start an upload: { wallId, contentType, bytes } answers a presigned PUT; then POST .../confirm. */
export const POST = route<Ctx>(async (req, ctx) => {
  const { id } = parseParams(await ctx.params, idParam);
  const em = await requestEm();
  const user = await requireUser(em);
  const body = await parseBody(req, requestUploadBody, 10_000);
  return json(await requestUpload(em, user, id, body), 201);
});
