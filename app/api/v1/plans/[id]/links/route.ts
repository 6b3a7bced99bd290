import { json, parseBody, parseParams, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { idParam } from "@/lib/server/schemas";
import { requireUser } from "@/lib/server/session";
import { createLinkBody } from "@/lib/server/services/route-params";
import { createLink, listLinks } from "@/lib/server/services/share-links";

type Ctx = { params: Promise<{ id: string }> };

/** The plan's read-only links with when each was last opened (owner only). */
export const GET = route<Ctx>(async (_req, ctx) => {
  const { id } = parseParams(await ctx.params, idParam);
  const em = await requestEm();
  const user = await requireUser(em);
  return json({ links: await listLinks(em, user, id) });
});

/** A new link: { label?, expiresAt? | expiresInDays? }. The token is in the answer once. */
export const POST = route<Ctx>(async (req, ctx) => {
  const { id } = parseParams(await ctx.params, idParam);
  const em = await requestEm();
  const user = await requireUser(em);
  const body = await parseBody(req, createLinkBody, 10_000);
  const expiresAt = body.expiresAt ? new Date(body.expiresAt) : body.expiresInDays ? new Date(Date.now() + body.expiresInDays * 86_400_000) : null;
  return json(await createLink(em, user, id, { label: body.label, expiresAt }), 201);
});
