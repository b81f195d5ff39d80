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
};

export default nextConfig;
