import { getToken } from "next-auth/jwt";
import { NextResponse, type NextRequest } from "next/server";
import { pagePolicy, storageOrigin } from "@/lib/server/page-csp";

/** Pages that need a session; they and their handlers check again on the server. */
const SIGNED_IN_PAGES = /^\/(plans|admin|presets)(\/|$)/;

/** True when every path segment is valid percent-encoding (Next's own decoding of params would throw). */
function decodablePath(pathname: string): boolean {
  try {
    for (const seg of pathname.split("/")) decodeURIComponent(seg);
    return true;
  } catch {
    return false;
  }
}

function malformedPath(api: boolean): NextResponse {
  const requestId = crypto.randomUUID();
  if (api) return NextResponse.json({ error: { code: "bad_path", message: "The address is not valid (bad percent-encoding).", requestId } }, { status: 400, headers: { "x-request-id": requestId } });
  return new NextResponse("The address is not valid.", { status: 400, headers: { "content-type": "text/plain; charset=utf-8" } });
}

/**
 * Runs before every page and API request: refuses addresses Next could not decode, sends signed-out
 * visitors of signed-in pages to sign-in, and gives each page its Content-Security-Policy with a
 * fresh nonce (Next reads the nonce from the request's policy header and puts it on its scripts).
 */
export async function proxy(req: NextRequest) {
  const { pathname, search } = req.nextUrl;
  const api = pathname.startsWith("/api/");
  if (!decodablePath(pathname)) return malformedPath(api);
  if (api) return NextResponse.next();

  if (SIGNED_IN_PAGES.test(pathname)) {
    const token = await getToken({ req, secret: process.env.NEXTAUTH_SECRET });
    if (!token) {
      const url = new URL("/signin", req.url);
      url.searchParams.set("callbackUrl", pathname + search);
      return NextResponse.redirect(url);
    }
  }

  const nonce = Buffer.from(crypto.randomUUID()).toString("base64");
  const csp = pagePolicy({
    nonce,
    storageOrigin: storageOrigin(process.env),
    dev: process.env.NODE_ENV === "development",
    https: (process.env.APP_URL ?? "").startsWith("https:"),
  });
  const headers = new Headers(req.headers);
  headers.set("content-security-policy", csp);
  headers.set("x-nonce", nonce);
  const res = NextResponse.next({ request: { headers } });
  res.headers.set("Content-Security-Policy", csp);
  return res;
}

/**
 * Pages (everything but build assets and fonts), and only those API addresses that carry a
 * percent sign: Next holds a copy of the request body for the proxy, so API writes must not pass
 * through it (a large body would be buffered before the route's own limit could refuse it).
 */
export const config = { matcher: ["/((?!api/|_next/static|_next/image|fonts/|favicon.ico).*)", "/api/:rest(.*%.*)"] };
