import { json, parseBody, parseParams, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { idParam } from "@/lib/server/schemas";
import { requireUser } from "@/lib/server/session";
import { progressBody, readProgress, recordProgress } from "@/lib/server/services/shop-progress";

type Ctx = { params: Promise<{ id: string }> };

/** Everyone's shop-floor check-offs on the plan, summed per item (owners, editors, viewers). */
export const GET = route<Ctx>(async (_req, ctx) => {
  const { id } = parseParams(await ctx.params, idParam);
  const em = await requestEm();
  const user = await requireUser(em);
  const res = json(await readProgress(em, user, id));
  res.headers.set("cache-control", "private, no-store");
  return res;
});

/** Records check-offs: { checks: [{ id, item, delta: 1 | -1, madeAt }] }; a repeated id is stored once. */
export const POST = route<Ctx>(async (req, ctx) => {
  const { id } = parseParams(await ctx.params, idParam);
  const em = await requestEm();
  const user = await requireUser(em);
  const body = await parseBody(req, progressBody, 200_000);
  return json(await recordProgress(em, user, id, body));
});
