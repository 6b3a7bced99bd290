import { json, parseBody, parseParams, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { idParam } from "@/lib/server/schemas";
import { requireAdmin } from "@/lib/server/session";
import { adminAccountBody, changeAccount } from "@/lib/server/services/users";

/** Change an account: { role?, disabled? }. Disabling ends every session of the account and refuses its sign-in. */
export const PATCH = route<{ params: Promise<{ id: string }> }>(async (req, ctx) => {
  const { id } = parseParams(await ctx.params, idParam);
  const em = await requestEm();
  const admin = await requireAdmin(em);
  const body = await parseBody(req, adminAccountBody, 10_000);
  return json({ user: await changeAccount(em, admin, id, body) });
});
