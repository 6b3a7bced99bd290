import { getToken } from "next-auth/jwt";
import { NextResponse, type NextRequest } from "next/server";

/** Pages that need a session redirect to sign-in here; pages and handlers check again on the server. */
export async function proxy(req: NextRequest) {
  const token = await getToken({ req, secret: process.env.NEXTAUTH_SECRET });
  if (token) return NextResponse.next();
  const url = new URL("/signin", req.url);
  url.searchParams.set("callbackUrl", req.nextUrl.pathname + req.nextUrl.search);
  return NextResponse.redirect(url);
}

export const config = { matcher: ["/plans/:path*", "/admin/:path*", "/presets/:path*"] };
