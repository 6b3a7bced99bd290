import { json, parseParams, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { idParam } from "@/lib/server/schemas";
import { requireUser } from "@/lib/server/session";
import { dropViewLink, newViewLink } from "@/lib/server/services/walkthroughs";

type Ctx = { params: Promise<{ id: string }> };

/** A new student link for presenting without editing rights (the previous one stops working). */
export const POST = route<Ctx>(async (_req, ctx) => {
  const { id } = parseParams(await ctx.params, idParam);
  const em = await requestEm();
  const user = await requireUser(em);
  return json(await newViewLink(em, user, id), 201);
});

/** Turn the student link off. */
export const DELETE = route<Ctx>(async (_req, ctx) => {
  const { id } = parseParams(await ctx.params, idParam);
  const em = await requestEm();
  const user = await requireUser(em);
  await dropViewLink(em, user, id);
  return json({ removed: true });
});
