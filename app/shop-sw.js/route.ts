import { readFile } from "node:fs/promises";
import { ensureShopServiceWorker } from "@/lib/server/shop-sw-file";

export const dynamic = "force-dynamic";

/**
 * GET /shop-sw.js: the shop view's service worker. Served from the site's root so it may look after
 * /plans/.../shop and /s/.../shop; it caches only those pages, their data and the app's static files.
 */
export async function GET(): Promise<Response> {
  const body = await readFile(ensureShopServiceWorker(), "utf8");
  return new Response(body, {
    headers: { "content-type": "text/javascript; charset=utf-8", "cache-control": "no-cache", "service-worker-allowed": "/" },
  });
}
