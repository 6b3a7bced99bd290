import { json, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { requireUser } from "@/lib/server/session";
import { requestVerify } from "@/lib/server/services/email-tokens";

/** Send (again) the address-confirmation message to the signed-in account. */
export const POST = route(async () => {
  const em = await requestEm();
  const user = await requireUser(em);
  return json(await requestVerify(em, user), 202);
});
