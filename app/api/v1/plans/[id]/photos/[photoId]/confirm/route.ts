import { json, parseParams, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { requireUser } from "@/lib/server/session";
import { planChild } from "@/lib/server/services/route-params";
import { confirmUpload } from "@/lib/server/services/uploads";

/** Finish an upload: the server checks the file by content, re-encodes it without metadata and keeps only the clean copy. */
export const POST = route<{ params: Promise<{ id: string; photoId: string }> }>(async (_req, ctx) => {
  const { id, photoId } = parseParams(await ctx.params, planChild("photoId"));
  const em = await requestEm();
  const user = await requireUser(em);
  return json({ photo: await confirmUpload(em, user, id, photoId) });
});
