/** @type {import('next').NextConfig} */
const nextConfig = {
  distDir: process.env.BW_DIST_DIR ?? ".next",
  serverExternalPackages: ["@mikro-orm/postgresql", "@mikro-orm/migrations", "@mikro-orm/core", "sharp", "pdfkit"],
  poweredByHeader: false,
  typedRoutes: false,
};
export default nextConfig;
