import { json, parseParams, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { requireUser } from "@/lib/server/session";
import { planChild } from "@/lib/server/services/route-params";
import { revokeLink } from "@/lib/server/services/share-links";

/** Revoke a link: it answers 404 from now on. */
export const DELETE = route<{ params: Promise<{ id: string; linkId: string }> }>(async (_req, ctx) => {
  const { id, linkId } = parseParams(await ctx.params, planChild("linkId"));
  const em = await requestEm();
  const user = await requireUser(em);
  return json({ link: await revokeLink(em, user, id, linkId) });
});
