import { json, parseParams, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { requireUser } from "@/lib/server/session";
import { revokeInvitation } from "@/lib/server/services/invitations";
import { planChild } from "@/lib/server/services/route-params";

/** Withdraw a pending invitation. */
export const DELETE = route<{ params: Promise<{ id: string; invId: string }> }>(async (_req, ctx) => {
  const { id, invId } = parseParams(await ctx.params, planChild("invId"));
  const em = await requestEm();
  const user = await requireUser(em);
  return json({ invitation: await revokeInvitation(em, user, id, invId) });
});
