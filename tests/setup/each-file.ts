import "reflect-metadata";
import { afterAll } from "vitest";
import { assertLoopbackDatabase } from "../../lib/db/url";
import { NO_DATABASE_URL } from "./db";

const url = process.env.DATABASE_URL;
// Without a test database, database tests fail (tests/setup/db.ts); nothing may fall back to the
// development cluster's default URL. (In a shared process an earlier file has set it already.)
if (!url) process.env.DATABASE_URL = NO_DATABASE_URL;
else if (url !== NO_DATABASE_URL) assertLoopbackDatabase(url);
process.env.BETTER_AUTH_SECRET ??= "test-secret-that-is-long-enough-for-hmac-0001";
process.env.BETTER_AUTH_URL ??= "http://127.0.0.1:3999";

// Files may share one process (vitest.config.mts): what a file sets in the environment is put back after it.
const environment = { ...process.env };

afterAll(async () => {
  for (const key of Object.keys(process.env)) if (!(key in environment)) delete process.env[key];
  Object.assign(process.env, environment);
  // The shop's configuration as the next file finds it in the database, not as this file cached it.
  (await import("@/lib/shop/config")).invalidateShopEngineering();
  // Stop a pg-boss this file started (flushQueuedEmails/enqueueDelivery start one), then close the pools.
  const b = globalThis as { yokelineBoss?: Promise<{ stop(options?: object): Promise<void> }> };
  if (b.yokelineBoss) await (await b.yokelineBoss.catch(() => null))?.stop({ graceful: false });
  b.yokelineBoss = undefined;
  // Close this file's pools so the worker can exit.
  const g = globalThis as { yokelineOrm?: Promise<{ close(force?: boolean): Promise<void> }> };
  if (g.yokelineOrm) await (await g.yokelineOrm).close(true);
  g.yokelineOrm = undefined;
});
