import { AppError } from "./errors";

const STATE_CHANGING = new Set(["POST", "PUT", "PATCH", "DELETE"]);

const originOf = (url: string | undefined): string | null => {
  if (!url) return null;
  try {
    return new URL(url).origin;
  } catch {
    return null;
  }
};

/**
 * The origins a browser page of this app sends: the configured APP_URL / NEXTAUTH_URL, and the
 * host the request was addressed to (a foreign page cannot choose the Host its visitor's browser sends).
 */
export function ownOrigins(req: Request): Set<string> {
  const own = new Set<string>();
  for (const u of [process.env.APP_URL, process.env.NEXTAUTH_URL]) {
    const o = originOf(u);
    if (o) own.add(o);
  }
  const host = req.headers.get("host");
  if (host) {
    const proto = (req.headers.get("x-forwarded-proto") ?? new URL(req.url).protocol.replace(":", "")).split(",")[0].trim();
    own.add(`${proto}://${host}`.toLowerCase());
  }
  return own;
}

/**
 * Refuses a state-changing request that a browser sent from another site (403). Requests without
 * an Origin header (command-line clients, server-to-server) are let through: browsers always send
 * one on cross-site POST, PUT, PATCH and DELETE.
 */
export function checkOrigin(req: Request): void {
  if (!STATE_CHANGING.has(req.method)) return;
  const origin = req.headers.get("origin");
  if (origin === null) return;
  if (ownOrigins(req).has(origin.toLowerCase())) return;
  throw new AppError(403, "foreign_origin", "This request came from another site and was refused.");
}
