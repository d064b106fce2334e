// Pages get their Content-Security-Policy (with a per-request script nonce) and HSTS from proxy.ts;
// API routes bypass the proxy (it would buffer their bodies) and get these fixed ones: JSON and files run no script.
const apiContentSecurityPolicy = "default-src 'none'; frame-ancestors 'none'";
// as HSTS in lib/http/security-headers.ts; only when the request reached the TLS proxy over https
const hsts = { key: "Strict-Transport-Security", value: "max-age=63072000; includeSubDomains" };

const securityHeaders = [
  { key: "X-Frame-Options", value: "DENY" },
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "Referrer-Policy", value: "same-origin" },
  { key: "Permissions-Policy", value: "camera=(self), microphone=(), geolocation=()" },
];

/** @type {import('next').NextConfig} */
const nextConfig = {
  // Sequelize loads dialect modules dynamically; bundling it breaks the build.
  // pdfkit reads its font metrics from its own package folder at run time; highs loads its .wasm from beside its script.
  serverExternalPackages: ["sequelize", "mariadb", "pdfkit", "highs"],
  poweredByHeader: false,
  // Several checkouts' builds can coexist (e.g. parallel test runs): NEXT_DIST_DIR picks the folder.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  async headers() {
    return [
      { source: "/:path*", headers: securityHeaders },
      { source: "/api/:path*", headers: [{ key: "Content-Security-Policy", value: apiContentSecurityPolicy }] },
      { source: "/api/:path*", has: [{ type: "header", key: "x-forwarded-proto", value: "https" }], headers: [hsts] },
    ];
  },
};
export default nextConfig;
