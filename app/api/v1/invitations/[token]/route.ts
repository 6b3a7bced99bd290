import { json, parseParams, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { previewInvitation } from "@/lib/server/services/invitations";
import { tokenParam } from "@/lib/server/services/route-params";

/** What a pending invitation is for (whoever holds the link); used, withdrawn or expired: 404. */
export const GET = route<{ params: Promise<{ token: string }> }>(async (_req, ctx) => {
  const { token } = parseParams(await ctx.params, tokenParam);
  return json({ invitation: await previewInvitation(await requestEm(), token) });
});
