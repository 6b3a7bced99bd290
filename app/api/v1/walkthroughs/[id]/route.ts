import { json, parseBody, parseParams, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { idParam } from "@/lib/server/schemas";
import { currentUser, requireUser } from "@/lib/server/session";
import { deleteWalkthrough, showWalkthrough, updateWalkthrough, walkthroughBody } from "@/lib/server/services/walkthroughs";

type Ctx = { params: Promise<{ id: string }> };

/** A walk-through with its plan, for presenting: its author, anyone if published, or ?t=<student link token>. */
export const GET = route<Ctx>(async (req, ctx) => {
  const { id } = parseParams(await ctx.params, idParam);
  const em = await requestEm();
  const token = new URL(req.url).searchParams.get("t");
  return json({ walkthrough: await showWalkthrough(em, await currentUser(em), id, token) });
});

/** Replace title, steps and published (its author only). */
export const PUT = route<Ctx>(async (req, ctx) => {
  const { id } = parseParams(await ctx.params, idParam);
  const em = await requestEm();
  const user = await requireUser(em);
  const body = await parseBody(req, walkthroughBody, 200_000);
  return json({ walkthrough: await updateWalkthrough(em, user, id, body) });
});

export const DELETE = route<Ctx>(async (_req, ctx) => {
  const { id } = parseParams(await ctx.params, idParam);
  const em = await requestEm();
  const user = await requireUser(em);
  await deleteWalkthrough(em, user, id);
  return json({ deleted: true });
});
