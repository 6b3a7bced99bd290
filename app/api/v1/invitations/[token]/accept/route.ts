import { json, parseParams, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { requireUser } from "@/lib/server/session";
import { acceptInvitation } from "@/lib/server/services/invitations";
import { tokenParam } from "@/lib/server/services/route-params";

/** Accept: the signed-in account must have the invited address. */
export const POST = route<{ params: Promise<{ token: string }> }>(async (_req, ctx) => {
  const { token } = parseParams(await ctx.params, tokenParam);
  const em = await requestEm();
  const user = await requireUser(em);
  return json(await acceptInvitation(em, user, token));
});
