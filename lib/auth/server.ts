import "server-only";
import { betterAuth } from "better-auth";
import { APIError, createAuthMiddleware } from "better-auth/api";
import { nextCookies } from "better-auth/next-js";
import { randomUUID } from "node:crypto";
import { Pool } from "pg";
import { databaseUrl } from "@/lib/db/url";
import { logger } from "@/lib/logger";
import { recordAudit } from "@/lib/audit";
import { linkCustomerToUser } from "@/lib/customers";
import { fieldsFromIssues } from "@/lib/http/errors";
import { zodIssues } from "@/lib/validation";
import { sendAccountEmail } from "./auth-mail";
import { CLIENT_ADDRESS_HEADER } from "./client-address";
import { signUpServerBodySchema } from "./schemas";
import { clearSignInFailures, recordSignInFailure, signInLockedUntil, waitMinutes } from "./sign-in-lock";

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

/** The auth library's connection pool (the session cache reads session rows through it too). */
export const authPool = pool;

export const ACCOUNT_DEACTIVATED_MESSAGE =
  "This account has been deactivated. Ask the shop's owner if you need access again.";

/** Sign-in attempts allowed per client and window; a shop setting with a safe default. */
const signInMax = Number(process.env.AUTH_SIGN_IN_MAX ?? 8);

/** Refuses with a house-style error body that the auth library's client can also read. */
function refuse(
  status: "UNPROCESSABLE_ENTITY" | "TOO_MANY_REQUESTS",
  code: string,
  message: string,
  fields?: Record<string, string>,
) {
  return new APIError(status, {
    code,
    message,
    ...(fields ? { fields } : {}),
    error: { code: status === "TOO_MANY_REQUESTS" ? "rate_limited" : "invalid", message, fields },
  });
}

const emailOf = (body: unknown) =>
  body && typeof body === "object" && typeof (body as { email?: unknown }).email === "string"
    ? (body as { email: string }).email
    : null;

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
  // No session until the address is proven: signing up with someone else's address gets nothing.
  emailAndPassword: {
    enabled: true,
    minPasswordLength: 10,
    maxPasswordLength: 128,
    autoSignIn: false,
    requireEmailVerification: true,
  },
  emailVerification: {
    sendOnSignUp: true,
    sendOnSignIn: true,
    autoSignInAfterVerification: true,
    expiresIn: 3600,
    sendVerificationEmail: async ({ user, url }) => {
      await sendAccountEmail("verify-email", user.email, { name: user.name, url });
    },
    // Only a proven address takes over the counter's customer record of that address.
    afterEmailVerification: async (user) => {
      if ((user as { role?: string }).role === "customer") await linkCustomerToUser(user);
    },
  },
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
      "/send-verification-email": { window: 60, max: 5 },
    },
  },
  advanced: {
    database: { generateId: () => randomUUID() },
    // Set by our own server code from the socket (or the shop's proxy, TRUST_PROXY=1); never by the client.
    ipAddress: { ipAddressHeaders: [CLIENT_ADDRESS_HEADER] },
  },
  hooks: {
    before: createAuthMiddleware(async (ctx) => {
      if (ctx.path === "/sign-up/email") {
        const parsed = signUpServerBodySchema.safeParse(ctx.body);
        if (!parsed.success) {
          const fields = fieldsFromIssues(zodIssues(parsed.error));
          for (const issue of parsed.error.issues) {
            if (issue.code === "unrecognized_keys")
              for (const k of issue.keys) fields[k] = "Not a sign-up field.";
          }
          delete fields["(root)"];
          throw refuse(
            "UNPROCESSABLE_ENTITY",
            "VALIDATION_FAILED",
            Object.values(fields)[0] ?? "Check the sign-up fields.",
            fields,
          );
        }
      }
      if (ctx.path === "/sign-in/email") {
        const email = emailOf(ctx.body);
        const until = email ? await signInLockedUntil(email) : null;
        if (until) {
          throw refuse(
            "TOO_MANY_REQUESTS",
            "ACCOUNT_LOCKED",
            `Too many wrong passwords for this account. Wait ${waitMinutes(until)} minutes, then try again.`,
          );
        }
      }
    }),
    after: createAuthMiddleware(async (ctx) => {
      if (ctx.path !== "/sign-in/email") return;
      const email = emailOf(ctx.body);
      if (!email) return;
      const returned = ctx.context.returned;
      if (returned instanceof APIError) {
        if (returned.status === "UNAUTHORIZED") await recordSignInFailure(email);
      } else {
        await clearSignInFailures(email);
      }
    }),
  },
  databaseHooks: {
    session: {
      create: {
        // A deactivated account gets no session, whichever way it signs in (lib/users/staff.ts).
        before: async (session) => {
          const { rows } = await pool.query<{ deactivated_at: Date | null }>(
            "select deactivated_at from app_user where id = $1",
            [session.userId],
          );
          if (rows[0]?.deactivated_at) {
            throw new APIError("FORBIDDEN", {
              code: "ACCOUNT_DEACTIVATED",
              message: ACCOUNT_DEACTIVATED_MESSAGE,
              error: { code: "forbidden", message: ACCOUNT_DEACTIVATED_MESSAGE },
            });
          }
        },
        after: async (session) => {
          await pool.query("update app_user set last_sign_in_at = $2 where id = $1", [
            session.userId,
            session.createdAt,
          ]);
        },
      },
    },
    user: {
      create: {
        after: async (user) => {
          // Staff accounts are audited where an owner creates them (lib/users/staff.ts).
          if ((user as { role?: string }).role !== "customer") return;
          // Accounts made with a proven address (the demo seed, an accepted invitation) are linked
          // now; a sign-up waits for its verification link (afterEmailVerification above).
          if (user.emailVerified) await linkCustomerToUser(user);
          await recordAudit({
            actorId: user.id,
            action: "user.sign-up",
            subjectType: "user",
            subjectId: user.id,
            details: { email: user.email, verified: user.emailVerified },
          });
        },
      },
    },
  },
  plugins: [nextCookies()],
});

export type AuthSession = typeof auth.$Infer.Session;
