import "server-only";
import { requestEm } from "./db";
import { accountState, isLive } from "./session-state";
import { readSessionClaims } from "./session-token";

/**
 * The session's user for rendering (name, role); null when signed out or when the session was
 * ended (sign-out elsewhere, password reset or change, disabled). Name and e-mail come from the
 * cookie; whether the session is live and the role come from the account (one cached read).
 */
export async function sessionUser(): Promise<{ id: string; name: string; email: string; role: string } | null> {
  const claims = await readSessionClaims();
  if (!claims) return null;
  const state = await accountState(await requestEm(), claims.uid);
  if (!state || !isLive(claims, state)) return null;
  const email = typeof claims.raw.email === "string" ? claims.raw.email : "";
  const name = typeof claims.raw.name === "string" && claims.raw.name ? claims.raw.name : email;
  return { id: claims.uid, name, email, role: state.role };
}
