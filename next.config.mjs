// The same on every response (pages, route handlers, static files). Each page's content security
// policy and HSTS depend on the request: proxy.ts (lib/config/security-headers.ts).
const securityHeaders = [
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
  // The legacy twin of frame-ancestors 'none', for browsers that predate CSP 2.
  { key: "X-Frame-Options", value: "DENY" },
];

/** @type {import('next').NextConfig} */
const nextConfig = {
  // MikroORM keys entities by class name, so server code must keep its class names.
  experimental: { serverMinification: false, authInterrupts: true },
  serverExternalPackages: [
    "@mikro-orm/core",
    "@mikro-orm/knex",
    "@mikro-orm/postgresql",
    "@mikro-orm/migrations",
    "@mikro-orm/reflection",
    "knex",
    "pg",
    "pg-boss",
    "pino",
    "nodemailer",
  ],
  poweredByHeader: false,
  typedRoutes: false,
  async headers() {
    return [{ source: "/:path*", headers: securityHeaders }];
  },
};

export default nextConfig;
