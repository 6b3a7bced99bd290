import { json, parseBody, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { currentUser, requireUser } from "@/lib/server/session";
import { ownerQuery } from "@/lib/server/services/route-params";
import { createWalkthrough, createWalkthroughBody, listWalkthroughs } from "@/lib/server/services/walkthroughs";
import { unauthorized } from "@/lib/server/errors";

/** My walk-throughs, or ?owner=<id>: that instructor's published ones (no sign-in needed). */
export const GET = route(async (req) => {
  const em = await requestEm();
  const user = await currentUser(em);
  const ownerId = ownerQuery.catch(undefined).parse(new URL(req.url).searchParams.get("owner") ?? undefined);
  if (!ownerId && !user) throw unauthorized();
  return json({ walkthroughs: await listWalkthroughs(em, user, { ownerId }) });
});

/** An instructor's new walk-through on a plan they can edit: { planId, title, steps, published? }. */
export const POST = route(async (req) => {
  const em = await requestEm();
  const user = await requireUser(em);
  const body = await parseBody(req, createWalkthroughBody, 200_000);
  return json({ walkthrough: await createWalkthrough(em, user, body) }, 201);
});
