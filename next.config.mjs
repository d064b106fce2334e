/** @type {import('next').NextConfig} */
const nextConfig = {
  // Sequelize loads dialect modules dynamically; bundling it breaks the build.
  serverExternalPackages: ["sequelize", "mariadb"],
  poweredByHeader: false,
};
export default nextConfig;
