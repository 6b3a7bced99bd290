/**
 * Headers every answer carries. The pages' Content-Security-Policy needs a fresh nonce per request,
 * so proxy.ts sets it (lib/server/page-csp.ts); API answers are data and get a policy that lets nothing run.
 */
const PERMISSIONS_POLICY = [
  "camera=()",
  "microphone=()",
  "geolocation=()",
  "payment=()",
  "usb=()",
  "serial=()",
  "hid=()",
  "midi=()",
  "magnetometer=()",
  "gyroscope=()",
  "accelerometer=()",
  "display-capture=()",
  "browsing-topics=()",
  // The shop-floor view may keep the screen on; the 3D view may go full screen.
  "screen-wake-lock=(self)",
  "fullscreen=(self)",
].join(", ");

const COMMON_HEADERS = [
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "X-Frame-Options", value: "DENY" },
  { key: "Referrer-Policy", value: "same-origin" },
  { key: "Permissions-Policy", value: PERMISSIONS_POLICY },
  { key: "Cross-Origin-Opener-Policy", value: "same-origin" },
];

const API_POLICY = "default-src 'none'; style-src 'unsafe-inline'; img-src 'self' data:; form-action 'self'; base-uri 'none'; frame-ancestors 'none'";

/** @type {import('next').NextConfig} */
const nextConfig = {
  distDir: process.env.BW_DIST_DIR ?? ".next",
  serverExternalPackages: ["@mikro-orm/postgresql", "@mikro-orm/migrations", "@mikro-orm/core", "sharp", "piscina", "pino", "pg-boss", "@react-pdf/renderer"],
  poweredByHeader: false,
  // `npm test` runs tsc over the whole project first; the build need not type-check a second time.
  typescript: { ignoreBuildErrors: true },
  typedRoutes: false,
  async headers() {
    return [
      { source: "/:path*", headers: COMMON_HEADERS },
      { source: "/api/:path*", headers: [{ key: "Content-Security-Policy", value: API_POLICY }] },
    ];
  },
};
export default nextConfig;
