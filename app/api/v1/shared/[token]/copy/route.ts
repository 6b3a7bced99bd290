import { json, parseBody, parseParams, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { requireUser } from "@/lib/server/session";
import { copyBody, tokenParam } from "@/lib/server/services/route-params";
import { copyShared } from "@/lib/server/services/share-links";

/** Copy a shared plan into my account: { name? }. The copy notes where it came from. */
export const POST = route<{ params: Promise<{ token: string }> }>(async (req, ctx) => {
  const { token } = parseParams(await ctx.params, tokenParam);
  const em = await requestEm();
  const user = await requireUser(em);
  const body = await parseBody(req, copyBody, 10_000);
  return json({ plan: await copyShared(em, user, token, body.name) }, 201);
});
