/** @type {import('next').NextConfig} */
const nextConfig = {
  serverExternalPackages: ["@mikro-orm/postgresql", "@mikro-orm/migrations", "@mikro-orm/core", "sharp", "pdfkit"],
  poweredByHeader: false,
  typedRoutes: false,
};
export default nextConfig;
