/** @type {import('next').NextConfig} */
const nextConfig = {
  // Sequelize loads dialect modules dynamically; bundling it breaks the build.
  serverExternalPackages: ["sequelize", "mariadb"],
  poweredByHeader: false,
  // Several checkouts' builds can coexist (e.g. parallel test runs): NEXT_DIST_DIR picks the folder.
  distDir: process.env.NEXT_DIST_DIR || ".next",
};
export default nextConfig;
