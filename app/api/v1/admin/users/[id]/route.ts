import { json, parseBody, parseParams, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { idParam, roleBody } from "@/lib/server/schemas";
import { requireAdmin } from "@/lib/server/session";
import { setRole } from "@/lib/server/services/users";

/** Change an account's role: { role }. */
export const PATCH = route<{ params: Promise<{ id: string }> }>(async (req, ctx) => {
  const { id } = parseParams(await ctx.params, idParam);
  const em = await requestEm();
  const admin = await requireAdmin(em);
  const body = await parseBody(req, roleBody);
  return json({ user: await setRole(em, admin, id, body.role) });
});
