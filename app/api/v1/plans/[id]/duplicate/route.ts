import { json, parseParams, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { idParam } from "@/lib/server/schemas";
import { requireUser } from "@/lib/server/session";
import { duplicatePlan } from "@/lib/server/services/plans";

export const POST = route<{ params: Promise<{ id: string }> }>(async (_req, ctx) => {
  const { id } = parseParams(await ctx.params, idParam);
  const em = await requestEm();
  const user = await requireUser(em);
  return json({ plan: await duplicatePlan(em, user, id) }, 201);
});
