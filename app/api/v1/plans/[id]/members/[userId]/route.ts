import { json, parseBody, parseParams, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { requireUser } from "@/lib/server/session";
import { changeMemberRole, removeMember } from "@/lib/server/services/members";
import { memberRoleBody, planChild } from "@/lib/server/services/route-params";

type Ctx = { params: Promise<{ id: string; userId: string }> };

/** Change a collaborator's role: { role: "editor" | "viewer" } (owner only). */
export const PATCH = route<Ctx>(async (req, ctx) => {
  const { id, userId } = parseParams(await ctx.params, planChild("userId"));
  const em = await requestEm();
  const user = await requireUser(em);
  const body = await parseBody(req, memberRoleBody, 10_000);
  return json({ member: await changeMemberRole(em, user, id, userId, body.role) });
});

/** Remove a collaborator (owner), or leave the plan (the collaborator themselves). */
export const DELETE = route<Ctx>(async (_req, ctx) => {
  const { id, userId } = parseParams(await ctx.params, planChild("userId"));
  const em = await requestEm();
  const user = await requireUser(em);
  await removeMember(em, user, id, userId);
  return json({ removed: true });
});
