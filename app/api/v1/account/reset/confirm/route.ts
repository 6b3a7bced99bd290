import { json, parseBody, route } from "@/lib/server/http";
import { requestEm } from "@/lib/server/db";
import { confirmReset } from "@/lib/server/services/email-tokens";
import { resetConfirmBody } from "@/lib/server/services/route-params";

/** Set a new password with the e-mailed link: { token, password }. Used or expired link: 404. */
export const POST = route(async (req) => {
  const body = await parseBody(req, resetConfirmBody, 10_000);
  await confirmReset(await requestEm(), body.token, body.password);
  return json({ message: "Your password was changed. Sign in with the new one." });
});
