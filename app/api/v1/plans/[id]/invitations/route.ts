import { json, parseBody, parseParams, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { idParam } from "@/lib/server/schemas";
import { requireUser } from "@/lib/server/session";
import { invite, listInvitations } from "@/lib/server/services/invitations";
import { inviteBody } from "@/lib/server/services/route-params";

type Ctx = { params: Promise<{ id: string }> };

export const GET = route<Ctx>(async (_req, ctx) => {
  const { id } = parseParams(await ctx.params, idParam);
  const em = await requestEm();
  const user = await requireUser(em);
  return json({ invitations: await listInvitations(em, user, id) });
});

/** Invite by e-mail: { email, role }. The message carries the accept link. */
export const POST = route<Ctx>(async (req, ctx) => {
  const { id } = parseParams(await ctx.params, idParam);
  const em = await requestEm();
  const user = await requireUser(em);
  const body = await parseBody(req, inviteBody, 10_000);
  const { invitation } = await invite(em, user, id, body);
  return json({ invitation }, 201);
});
