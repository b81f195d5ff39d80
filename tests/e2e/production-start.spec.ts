import { spawn } from "node:child_process";
import { expect, test } from "@playwright/test";

/** Runs `next start` on the build with `env` until it exits (or 60 s pass): its code and stderr. */
function nextStart(env: Record<string, string>): Promise<{ code: number | null; stderr: string }> {
  return new Promise((resolve) => {
    const childEnv: NodeJS.ProcessEnv = {
      NODE_ENV: "production",
      PATH: process.env.PATH,
      HOME: process.env.HOME,
      NEXT_TELEMETRY_DISABLED: "1",
      ...env,
    };
    const child = spawn("npx", ["next", "start", "-H", "127.0.0.1", "-p", "0"], {
      env: childEnv,
      stdio: ["ignore", "ignore", "pipe"],
      detached: true,
    });
    let stderr = "";
    child.stderr.on("data", (chunk: Buffer) => (stderr += chunk.toString()));
    const timer = setTimeout(() => process.kill(-child.pid!, "SIGKILL"), 60_000);
    child.on("exit", (code: number | null) => {
      clearTimeout(timer);
      resolve({ code, stderr });
    });
  });
}

// The built server itself refuses to start in production on unsafe settings (instrumentation.ts).
test("next start in production with unsafe settings exits 1, naming each one", async () => {
  test.setTimeout(90_000);
  const run = await nextStart({
    NODE_ENV: "production",
    APP_URL: "http://shop.example.org",
    SMTP_URL: "smtp://127.0.0.1:12525",
    STRIPE_SECRET_KEY: "sk_test_local_fake",
    STRIPE_API_HOST: "127.0.0.1",
  });
  expect(run.code).toBe(1);
  const lines = run.stderr.split("\n").filter((l) => l.startsWith("  - "));
  for (const expected of [
    /BETTER_AUTH_SECRET is not set/,
    /DATABASE_URL is not set/,
    /APP_URL must be an https address/,
    /SMTP_URL points at this machine/,
    /STRIPE_SECRET_KEY is the local payment fake's key/,
    /STRIPE_API_HOST is set/,
    /STRIPE_WEBHOOK_SECRET is not set/,
  ]) {
    expect(
      lines.filter((l) => expected.test(l)),
      String(expected),
    ).toHaveLength(1);
  }
  expect(lines).toHaveLength(7);
});
