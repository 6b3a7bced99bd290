/**
 * The shop view's service worker (bundled by scripts/build-worker.ts, served at /shop-sw.js): with
 * Serwist's caching strategies, the shop pages and their build and progress data come from the
 * network when it answers within a few seconds and from the cache otherwise; the app's hashed
 * scripts, styles and fonts come from the cache once fetched. Nothing else is touched.
 */
import { CacheFirst, ExpirationPlugin, NetworkFirst, Serwist } from "serwist";

const SHOP_PAGE = /^\/(plans\/[0-9a-f-]{36}|s\/[A-Za-z0-9_-]{10,100})\/shop\/?$/;
const SHOP_DATA = /^\/api\/v1\/(plans\/[0-9a-f-]{36}\/(build|progress)|shared\/[A-Za-z0-9_-]{10,100}\/build)$/;

const serwist = new Serwist({
  skipWaiting: true,
  clientsClaim: true,
  runtimeCaching: [
    {
      matcher: ({ request, url, sameOrigin }) => sameOrigin && request.method === "GET" && SHOP_PAGE.test(url.pathname) && !request.headers.has("rsc"),
      handler: new NetworkFirst({ cacheName: "shop-pages", networkTimeoutSeconds: 4, plugins: [new ExpirationPlugin({ maxEntries: 30 })] }),
    },
    {
      matcher: ({ request, url, sameOrigin }) => sameOrigin && request.method === "GET" && SHOP_DATA.test(url.pathname),
      handler: new NetworkFirst({ cacheName: "shop-data", networkTimeoutSeconds: 4, plugins: [new ExpirationPlugin({ maxEntries: 60 })] }),
    },
    {
      matcher: ({ request, url, sameOrigin }) => sameOrigin && request.method === "GET" && (url.pathname.startsWith("/_next/static/") || url.pathname.startsWith("/fonts/")),
      handler: new CacheFirst({ cacheName: "shop-static", plugins: [new ExpirationPlugin({ maxEntries: 300, maxAgeSeconds: 30 * 86_400 })] }),
    },
  ],
});

serwist.addEventListeners();
