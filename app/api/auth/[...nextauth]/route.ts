import NextAuth from "next-auth";
import { NextRequest } from "next/server";
import { SIGN_IN_CODES, authOptions } from "@/lib/server/auth";
import { errorResponse, toErrorResponse } from "@/lib/server/http";
import { log } from "@/lib/server/log";
import { readBodyText } from "@/lib/server/request-body";

type Ctx = { params: Promise<{ nextauth: string[] }> };

/** Sign-in, sign-out and CSRF forms are small; nothing larger is read. */
const MAX_FORM_BYTES = 16_000;

/** Status and message for the error code the sign-in step put in its answer's URL. */
function signInStatus(code: string | null): { status: number; message: string; retryAfter?: number } | null {
  if (!code) return null;
  if (code.startsWith(SIGN_IN_CODES.wait)) {
    const seconds = Number(code.slice(SIGN_IN_CODES.wait.length)) || 1;
    return { status: 429, message: `Several sign-ins to this account from here failed. Wait ${seconds} seconds and try again.`, retryAfter: seconds };
  }
  if (code === SIGN_IN_CODES.capped) return { status: 429, message: "Too many failed sign-ins from this address. Wait a while and try again." };
  if (code === SIGN_IN_CODES.disabled) return { status: 403, message: "This account was disabled by an administrator." };
  if (code === SIGN_IN_CODES.unavailable) return { status: 503, message: "Sign-in is unavailable for a moment. Try again shortly." };
  return null;
}

/** Gives the JSON answer of a refused sign-in its real status (429, 403, 503) and a message; the URL stays for the form. */
async function withSignInStatus(res: Response): Promise<Response> {
  if (!(res.headers.get("content-type") ?? "").includes("application/json")) return res;
  const body = (await res.clone().json().catch(() => null)) as { url?: unknown } | null;
  if (!body || typeof body.url !== "string") return res;
  let code: string | null = null;
  try {
    code = new URL(body.url, "http://x").searchParams.get("error");
  } catch {
    return res;
  }
  const mapped = signInStatus(code);
  if (!mapped) return res;
  const headers = new Headers(res.headers);
  headers.delete("content-length");
  if (mapped.retryAfter) headers.set("retry-after", String(mapped.retryAfter));
  return new Response(JSON.stringify({ url: body.url, error: { code, message: mapped.message } }), { status: mapped.status, headers });
}

/**
 * next-auth's endpoints, guarded: the credentials callback takes only a form POST (405 otherwise),
 * every POST must be a form (415; JSON bodies made next-auth fail with 500), bodies are capped while
 * read (413), and no next-auth fault reaches the client as a 500 with its text.
 */
async function handler(req: NextRequest, ctx: Ctx): Promise<Response> {
  try {
    const [action, provider] = (await ctx.params).nextauth ?? [];
    if (action === "callback" && provider === "credentials" && req.method !== "POST") {
      const res = errorResponse(405, "method_not_allowed", "Sign in by posting the sign-in form (POST).");
      res.headers.set("allow", "POST");
      return res;
    }
    let forward: NextRequest = req;
    if (req.method === "POST") {
      const type = (req.headers.get("content-type") ?? "").split(";")[0]!.trim().toLowerCase();
      if (type !== "application/x-www-form-urlencoded") return errorResponse(415, "unsupported_media_type", "Send this form as application/x-www-form-urlencoded.");
      const text = await readBodyText(req, MAX_FORM_BYTES);
      forward = new NextRequest(req.url, { method: "POST", headers: req.headers, body: text });
    }
    const res = await NextAuth(authOptions())(forward, ctx);
    if (res.status >= 500) {
      log.error({ status: res.status, method: req.method, action, provider }, "auth endpoint answered a server error");
      return errorResponse(400, "bad_request", "This sign-in request is not supported.");
    }
    return action === "callback" ? await withSignInStatus(res) : res;
  } catch (e) {
    return toErrorResponse(e);
  }
}

export { handler as GET, handler as POST };
