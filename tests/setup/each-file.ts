import "reflect-metadata";
import { afterAll } from "vitest";
import { assertLoopbackDatabase } from "../../lib/db/url";

if (process.env.DATABASE_URL) assertLoopbackDatabase(process.env.DATABASE_URL);
process.env.BETTER_AUTH_SECRET ??= "test-secret-that-is-long-enough-for-hmac-0001";
process.env.BETTER_AUTH_URL ??= "http://127.0.0.1:3999";

afterAll(async () => {
  // Close this file's pools so the worker can exit.
  const g = globalThis as { yokelineOrm?: Promise<{ close(force?: boolean): Promise<void> }> };
  if (g.yokelineOrm) await (await g.yokelineOrm).close(true);
  g.yokelineOrm = undefined;
});
