import { defineConfig } from "@playwright/test";

const port = Number(process.env.APP_PORT ?? 3100);
const baseURL = `http://127.0.0.1:${port}`;

/** Browser tests drive Debian's Chromium (never a downloaded browser) against `next start`. */
export default defineConfig({
  testDir: "tests/e2e",
  fullyParallel: false,
  workers: 1,
  retries: 0,
  timeout: 60_000,
  expect: { timeout: 10_000 },
  reporter: [["list"]],
  use: {
    baseURL,
    trace: "off",
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
      args: [
        "--headless",
        "--no-sandbox",
        "--disable-gpu",
        "--disable-quic",
        "--no-first-run",
        "--disable-background-networking",
        "--disable-component-update",
        "--disable-sync",
      ],
    },
  },
  webServer: [
    {
      command: "npx tsx fakes/run-all.ts",
      url: `http://127.0.0.1:${process.env.MAIL_FAKE_HTTP_PORT ?? 12680}/messages`,
      reuseExistingServer: false,
      timeout: 30_000,
    },
    {
      command: `npx next start -H 127.0.0.1 -p ${port}`,
      url: `${baseURL}/api/health`,
      reuseExistingServer: false,
      timeout: 60_000,
      // Every browser here signs in from 127.0.0.1; the production limit is tested in tests/auth.
      env: { NODE_ENV: "production", AUTH_SIGN_IN_MAX: "200" },
    },
  ],
});
