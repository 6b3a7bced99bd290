import { z } from "zod";
import { json, parseParams, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { requireUser } from "@/lib/server/session";
import { getRevision } from "@/lib/server/services/plans";

const params = z.object({ id: z.string().uuid(), revId: z.string().uuid() });

/** One revision with its document, for preview. */
export const GET = route<{ params: Promise<{ id: string; revId: string }> }>(async (_req, ctx) => {
  const { id, revId } = parseParams(await ctx.params, params);
  const em = await requestEm();
  const user = await requireUser(em);
  return json({ revision: await getRevision(em, user, id, revId) });
});
