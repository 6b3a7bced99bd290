import { json, parseBody, parseParams, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { requireUser } from "@/lib/server/session";
import { planChild } from "@/lib/server/services/route-params";
import { deletePhoto, getPhoto, scaleBody, setScale } from "@/lib/server/services/uploads";

type Ctx = { params: Promise<{ id: string; photoId: string }> };
const params = planChild("photoId");

export const GET = route<Ctx>(async (_req, ctx) => {
  const { id, photoId } = parseParams(await ctx.params, params);
  const em = await requestEm();
  const user = await requireUser(em);
  return json({ photo: await getPhoto(em, user, id, photoId) });
});

/** Scale by two points: { scale: { ax, ay, bx, by, distanceMm } | null }. */
export const PATCH = route<Ctx>(async (req, ctx) => {
  const { id, photoId } = parseParams(await ctx.params, params);
  const em = await requestEm();
  const user = await requireUser(em);
  const body = await parseBody(req, scaleBody, 10_000);
  return json({ photo: await setScale(em, user, id, photoId, body.scale) });
});

export const DELETE = route<Ctx>(async (_req, ctx) => {
  const { id, photoId } = parseParams(await ctx.params, params);
  const em = await requestEm();
  const user = await requireUser(em);
  await deletePhoto(em, user, id, photoId);
  return json({ deleted: true });
});
