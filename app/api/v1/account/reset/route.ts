import { json, parseBody, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { requestReset } from "@/lib/server/services/email-tokens";
import { resetRequestBody } from "@/lib/server/services/route-params";

/** Ask for a password link: { email }. Always 202, whether or not the address has an account. */
export const POST = route(async (req) => {
  const body = await parseBody(req, resetRequestBody, 10_000);
  await requestReset(await requestEm(), body.email);
  return json({ message: "If that address has an account, a link to choose a new password is on its way." }, 202);
});
