import { betterAuth } from "better-auth";
import { nextCookies } from "better-auth/next-js";
import { randomUUID } from "node:crypto";
import { Pool } from "pg";
import { databaseUrl } from "@/lib/db/url";
import { logger } from "@/lib/logger";
import { recordAudit } from "@/lib/audit";
import { linkCustomerToUser } from "@/lib/customers";

const snake = <T extends string>(...names: T[]) =>
  Object.fromEntries(names.map((n) => [n, n.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`)])) as Record<
    T,
    string
  >;

const globalForAuth = globalThis as unknown as { yokelineAuthPool?: Pool };
// An idle connection dropped by a database restart must not crash the server: log it, the pool reconnects.
const pool = (globalForAuth.yokelineAuthPool ??= new Pool({ connectionString: databaseUrl(), max: 5 }).on(
  "error",
  (err: Error & { code?: string }) =>
    logger.warn({ code: err.code, message: err.message }, "auth database connection lost"),
));

/** Sign-in attempts allowed per client and window; a shop setting with a safe default. */
const signInMax = Number(process.env.AUTH_SIGN_IN_MAX ?? 8);

/**
 * The auth library, on the same database as everything else. Its tables are declared as
 * MikroORM entities in entities/ and created by our migrations (snake_case columns, mapped here).
 */
export const auth = betterAuth({
  appName: "Yokeline",
  logger: { level: process.env.NODE_ENV === "test" ? "error" : "warn" },
  baseURL: process.env.BETTER_AUTH_URL ?? process.env.APP_URL ?? "http://127.0.0.1:3000",
  secret: process.env.BETTER_AUTH_SECRET,
  database: pool,
  emailAndPassword: { enabled: true, minPasswordLength: 10, autoSignIn: true },
  user: {
    modelName: "app_user",
    fields: snake("emailVerified", "createdAt", "updatedAt"),
    additionalFields: {
      role: { type: "string", required: false, defaultValue: "customer", input: false },
    },
  },
  session: {
    modelName: "auth_session",
    fields: snake("expiresAt", "createdAt", "updatedAt", "ipAddress", "userAgent", "userId"),
    cookieCache: { enabled: false },
  },
  account: {
    modelName: "auth_account",
    fields: snake(
      "accountId",
      "providerId",
      "userId",
      "accessToken",
      "refreshToken",
      "idToken",
      "accessTokenExpiresAt",
      "refreshTokenExpiresAt",
      "createdAt",
      "updatedAt",
    ),
  },
  verification: {
    modelName: "auth_verification",
    fields: snake("expiresAt", "createdAt", "updatedAt"),
  },
  rateLimit: {
    enabled: true,
    storage: "database",
    modelName: "auth_rate_limit",
    fields: { lastRequest: "last_request" },
    window: 60,
    max: 100,
    customRules: {
      "/sign-in/email": { window: 60, max: signInMax },
      "/sign-up/email": { window: 60, max: 10 },
    },
  },
  advanced: {
    database: { generateId: () => randomUUID() },
    ipAddress: { ipAddressHeaders: ["x-forwarded-for", "x-real-ip"] },
  },
  databaseHooks: {
    user: {
      create: {
        after: async (user) => {
          // Staff accounts are audited where an owner creates them (lib/users/staff.ts).
          if ((user as { role?: string }).role !== "customer") return;
          await linkCustomerToUser(user);
          await recordAudit({
            actorId: user.id,
            action: "user.sign-up",
            subjectType: "user",
            subjectId: user.id,
            details: { email: user.email },
          });
        },
      },
    },
  },
  plugins: [nextCookies()],
});

export type AuthSession = typeof auth.$Infer.Session;
