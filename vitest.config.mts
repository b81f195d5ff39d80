import { defineConfig } from "vitest/config";
import path from "node:path";

/**
 * Test files that need a fresh module graph of their own: they mock Next's request APIs
 * (`vi.mock("next/headers")`), read settings the app reads once at import (AUTH_SIGN_IN_MAX),
 * point the app at another PostgreSQL cluster, or swap the mail transport under it.
 */
const ISOLATED = [
  "tests/auth/access-matrix.test.ts",
  "tests/auth/rate-limit.test.ts",
  "tests/customers/search.test.ts",
  "tests/http/body-fuzz.test.ts",
  "tests/http/odd-requests.test.ts",
  "tests/mail/outbox.test.ts",
  "tests/orders/desk-signoff.test.ts",
  "tests/platform/database-recovery.test.ts",
  "tests/platform/restart-in-flight.test.ts",
  "tests/tables/prepared-names.test.ts",
  "tests/users/staff.test.ts",
];

export default defineConfig({
  resolve: {
    alias: {
      "@": path.resolve(import.meta.dirname),
      // Server-only modules are plain modules outside Next's server bundle.
      "server-only": path.resolve(import.meta.dirname, "tests/setup/server-only.ts"),
    },
  },
  test: {
    exclude: ["tests/e2e/**", "node_modules/**"],
    globalSetup: ["tests/setup/global-setup.ts"],
    setupFiles: ["tests/setup/each-file.ts"],
    // One file at a time: the files share one database.
    fileParallelism: false,
    testTimeout: 20_000,
    hookTimeout: 60_000,
    projects: [
      {
        // The rest share one process and its loaded modules (importing the app's modules again
        // for every file took a third of the run); tests/setup/each-file.ts puts back the
        // environment and closes the database pools after each file.
        extends: true,
        test: { name: "shared", include: ["tests/**/*.test.ts"], exclude: ISOLATED, isolate: false },
      },
      { extends: true, test: { name: "isolated", include: ISOLATED } },
    ],
  },
});
