/**
 * Sign-in and sign-out through next-auth's REST endpoints (GET /api/auth/csrf, POST
 * /api/auth/callback/credentials, POST /api/auth/signout) with plain fetch. The app reads the
 * session on the server only, so the pages need none of next-auth's React client and its runtime.
 */
const AUTH = "/api/auth";

export interface SignInResult {
  ok: boolean;
  /** next-auth's error code (CredentialsSignin, or the message the authorize step threw), or null. */
  error: string | null;
}

async function csrfToken(): Promise<string> {
  const res = await fetch(`${AUTH}/csrf`, { cache: "no-store" });
  const data = (await res.json()) as { csrfToken?: string };
  if (!data.csrfToken) throw new Error("no CSRF token from the auth endpoint");
  return data.csrfToken;
}

function form(fields: Record<string, string>): RequestInit {
  return { method: "POST", headers: { "content-type": "application/x-www-form-urlencoded" }, body: new URLSearchParams(fields) };
}

/** Signs in with e-mail and password; sets the session cookie on success and does not navigate. */
export async function signInWithPassword(email: string, password: string, callbackUrl: string): Promise<SignInResult> {
  const res = await fetch(`${AUTH}/callback/credentials`, form({ email, password, callbackUrl, csrfToken: await csrfToken(), json: "true" }));
  const data = (await res.json().catch(() => ({}))) as { url?: string };
  // next-auth answers 200 with the URL it would redirect to; a failure carries ?error=CODE.
  const error = data.url ? new URL(data.url, window.location.href).searchParams.get("error") : "unreadable_response";
  return { ok: res.ok && !error, error };
}

/** Ends the session, then loads `callbackUrl` (a full load, so server-rendered parts drop the user). */
export async function signOut(callbackUrl = "/"): Promise<void> {
  await fetch(`${AUTH}/signout`, form({ callbackUrl, csrfToken: await csrfToken(), json: "true" }));
  window.location.assign(callbackUrl);
}
