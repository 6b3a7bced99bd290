import { json, parseBody, route } from "@/lib/server/http";
import { clientAddress } from "@/lib/server/client-address";
import { requestEm } from "@/lib/server/db";
import { requireUser } from "@/lib/server/session";
import { readSessionClaims, reissueSession } from "@/lib/server/session-token";
import { changePassword, passwordChangeBody } from "@/lib/server/services/users";

/**
 * Change my password: { currentPassword, newPassword }. Every session of the account ends; this
 * browser gets a fresh cookie and stays signed in. Wrong current password: 422; many wrong: 429.
 */
export const PUT = route(async (req) => {
  const em = await requestEm();
  const user = await requireUser(em);
  const body = await parseBody(req, passwordChangeBody, 10_000);
  const version = await changePassword(em, user, body, clientAddress(req.headers));
  const claims = await readSessionClaims();
  if (claims) await reissueSession(claims, version);
  return json({ message: "Your password was changed. Other devices were signed out." });
});
