import { json, parseParams, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { idParam } from "@/lib/server/schemas";
import { requireUser } from "@/lib/server/session";
import { listMembers } from "@/lib/server/services/members";

/** The owner and collaborators with their roles (anyone with a role on the plan). */
export const GET = route<{ params: Promise<{ id: string }> }>(async (_req, ctx) => {
  const { id } = parseParams(await ctx.params, idParam);
  const em = await requestEm();
  const user = await requireUser(em);
  return json({ members: await listMembers(em, user, id) });
});
