import "server-only";
import { DEV_DATABASE_URL, isLoopbackHost } from "@/lib/db/url";

type Env = Record<string, string | undefined>;

/** better-auth signs sessions with it; 32 characters is what its own docs generate. */
const MIN_SECRET_LENGTH = 32;

function hostOf(url: string): string | null {
  try {
    return new URL(url).hostname;
  } catch {
    return null;
  }
}

/** Production means NODE_ENV=production without demo mode (the demo runs on the local fakes). */
export function isProductionRun(env: Env = process.env): boolean {
  return env.NODE_ENV === "production" && env.YOKELINE_DEMO !== "1";
}

/**
 * The settings a production run refuses to start without, one line each (empty when all are
 * safe). Pure, so the start-up hook, the scripts and the tests all ask the same question.
 */
export function unsafeProductionSettings(env: Env): string[] {
  const problems: string[] = [];

  const secret = env.BETTER_AUTH_SECRET ?? "";
  if (!secret)
    problems.push("BETTER_AUTH_SECRET is not set (sessions would be signed with a default secret)");
  else if (secret.length < MIN_SECRET_LENGTH)
    problems.push(`BETTER_AUTH_SECRET is shorter than ${MIN_SECRET_LENGTH} characters`);

  const dbUrl = env.DATABASE_URL;
  if (!dbUrl) problems.push("DATABASE_URL is not set (the development database would be used)");
  else if (dbUrl === DEV_DATABASE_URL) problems.push("DATABASE_URL is the development default");
  else if (!hostOf(dbUrl)) problems.push("DATABASE_URL is not a valid URL");

  const appUrl = env.APP_URL ?? env.BETTER_AUTH_URL;
  if (!appUrl) problems.push("APP_URL is not set (it must be the shop's public https address)");
  else if (!appUrl.startsWith("https://") || !hostOf(appUrl))
    problems.push(`APP_URL must be an https address (it is ${appUrl})`);

  if (env.RESEND_API_KEY) {
    const base = env.RESEND_BASE_URL;
    if (base && isLoopbackHost(hostOf(base) ?? ""))
      problems.push("RESEND_BASE_URL points at this machine (the local mail catcher); unset it");
  } else if (!env.SMTP_URL) {
    problems.push(
      "No mail transport: set RESEND_API_KEY or SMTP_URL (the default is the local mail catcher)",
    );
  } else {
    const host = hostOf(env.SMTP_URL);
    if (!host) problems.push("SMTP_URL is not a valid URL");
    else if (isLoopbackHost(host)) problems.push("SMTP_URL points at this machine (the local mail catcher)");
  }

  if (!env.STRIPE_SECRET_KEY) problems.push("STRIPE_SECRET_KEY is not set");
  else if (env.STRIPE_SECRET_KEY === "sk_test_local_fake")
    problems.push("STRIPE_SECRET_KEY is the local payment fake's key");
  if (env.STRIPE_API_HOST)
    problems.push(`STRIPE_API_HOST is set (${env.STRIPE_API_HOST}: the local payment fake); unset it`);
  if (!env.STRIPE_WEBHOOK_SECRET) problems.push("STRIPE_WEBHOOK_SECRET is not set");
  else if (env.STRIPE_WEBHOOK_SECRET === "whsec_local_fake")
    problems.push("STRIPE_WEBHOOK_SECRET is the local payment fake's secret");

  return problems;
}

/**
 * Stops the process when a production run has unsafe settings: every problem on its own line on
 * stderr, then exit 1. Does nothing outside production.
 */
export function refuseUnsafeProduction(env: Env = process.env, what = "Yokeline"): void {
  if (!isProductionRun(env)) return;
  const problems = unsafeProductionSettings(env);
  if (problems.length === 0) return;
  const lines = [
    `${what} refuses to start in production (NODE_ENV=production, YOKELINE_DEMO unset):`,
    ...problems.map((p) => `  - ${p}`),
  ];
  process.stderr.write(lines.join("\n") + "\n");
  process.exit(1);
}
