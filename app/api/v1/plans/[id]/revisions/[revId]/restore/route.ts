import { z } from "zod";
import { json, parseBody, parseParams, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { restoreRevisionBody } from "@/lib/server/schemas";
import { requireUser } from "@/lib/server/session";
import { restoreRevision } from "@/lib/server/services/plans";

const params = z.object({ id: z.string().uuid(), revId: z.string().uuid() });

/** Make a revision current again, as a new save: { version } of the plan as loaded (stale: 409). */
export const POST = route<{ params: Promise<{ id: string; revId: string }> }>(async (req, ctx) => {
  const { id, revId } = parseParams(await ctx.params, params);
  const em = await requestEm();
  const user = await requireUser(em);
  const body = await parseBody(req, restoreRevisionBody);
  return json({ plan: await restoreRevision(em, user, id, revId, body.version) });
});
