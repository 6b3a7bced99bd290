import { json, parseBody, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { createPlanBody } from "@/lib/server/schemas";
import { requireUser } from "@/lib/server/session";
import { createPlan, listPlans } from "@/lib/server/services/plans";

/** My plans and plans shared with me; ?deleted=1 lists my restorable deleted plans. */
export const GET = route(async (req) => {
  const em = await requestEm();
  const user = await requireUser(em);
  const deleted = new URL(req.url).searchParams.get("deleted") === "1";
  return json({ plans: await listPlans(em, user, { deleted }) });
});

export const POST = route(async (req) => {
  const em = await requestEm();
  const user = await requireUser(em);
  const body = await parseBody(req, createPlanBody);
  return json({ plan: await createPlan(em, user, body) }, 201);
});
