import "server-only";
import { cookies } from "next/headers";
import { decode, encode } from "next-auth/jwt";
import { env } from "./env";
import type { SessionClaims } from "./session-state";

/** Sessions last this long from sign-in (or from the last re-issue). */
export const SESSION_MAX_AGE_S = 30 * 24 * 3600;

/** next-auth's cookie name: the __Secure- prefix when the app is served over https. */
export function sessionCookieName(): string {
  const base = env().NEXTAUTH_URL ?? env().APP_URL;
  return `${base.startsWith("https://") ? "__Secure-" : ""}next-auth.session-token`;
}

/** The claims in this request's session cookie (signed and encrypted by next-auth), or null. */
export async function readSessionClaims(): Promise<(SessionClaims & { raw: Record<string, unknown> }) | null> {
  const value = (await cookies()).get(sessionCookieName())?.value;
  if (!value) return null;
  try {
    const token = await decode({ token: value, secret: env().NEXTAUTH_SECRET });
    if (!token || typeof token.uid !== "string") return null;
    return { uid: token.uid, sv: typeof token.sv === "number" ? token.sv : undefined, raw: token as Record<string, unknown> };
  } catch {
    return null;
  }
}

/**
 * Replaces this request's session cookie with one at the account's new session version (after a
 * password change ended every other session, the browser that made the change stays signed in).
 */
export async function reissueSession(claims: { raw: Record<string, unknown> }, sessionVersion: number): Promise<void> {
  const { exp: _exp, iat: _iat, jti: _jti, ...rest } = claims.raw;
  const token = { ...rest, sv: sessionVersion };
  const value = await encode({ token, secret: env().NEXTAUTH_SECRET, maxAge: SESSION_MAX_AGE_S });
  const name = sessionCookieName();
  (await cookies()).set(name, value, { httpOnly: true, sameSite: "lax", path: "/", secure: name.startsWith("__Secure-"), maxAge: SESSION_MAX_AGE_S });
}
