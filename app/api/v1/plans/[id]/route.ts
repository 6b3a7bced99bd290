import { json, parseBody, parseParams, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { idParam, renameBody, updatePlanBody } from "@/lib/server/schemas";
import { requireUser } from "@/lib/server/session";
import { deletePlan, getPlan, renamePlan, updatePlan } from "@/lib/server/services/plans";

type Ctx = { params: Promise<{ id: string }> };

export const GET = route<Ctx>(async (_req, ctx) => {
  const { id } = parseParams(await ctx.params, idParam);
  const em = await requestEm();
  const user = await requireUser(em);
  return json({ plan: await getPlan(em, user, id) });
});

/** Save: { document, version } where version is the one loaded; stale answers 409. */
export const PUT = route<Ctx>(async (req, ctx) => {
  const { id } = parseParams(await ctx.params, idParam);
  const em = await requestEm();
  const user = await requireUser(em);
  const body = await parseBody(req, updatePlanBody, 5_000_000);
  return json({ plan: await updatePlan(em, user, id, body) });
});

/** Rename: { name }. */
export const PATCH = route<Ctx>(async (req, ctx) => {
  const { id } = parseParams(await ctx.params, idParam);
  const em = await requestEm();
  const user = await requireUser(em);
  const body = await parseBody(req, renameBody);
  return json({ plan: await renamePlan(em, user, id, body.name) });
});

/** Soft delete; restorable for 30 days with POST /restore. */
export const DELETE = route<Ctx>(async (_req, ctx) => {
  const { id } = parseParams(await ctx.params, idParam);
  const em = await requestEm();
  const user = await requireUser(em);
  return json({ plan: await deletePlan(em, user, id) });
});
