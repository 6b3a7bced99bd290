import { json, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { requireAdmin } from "@/lib/server/session";
import { listAccounts } from "@/lib/server/services/users";

export const GET = route(async () => {
  const em = await requestEm();
  await requireAdmin(em);
  return json({ users: await listAccounts(em) });
});
