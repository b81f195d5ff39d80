import { test } from "vitest";

/**
 * What tests/setup/each-file.ts puts in DATABASE_URL when none is set, so code that reaches for
 * the database anyway fails on an unresolvable host instead of using the development database.
 */
export const NO_DATABASE_URL = "postgresql://database-url-is-not-set.invalid:5432/none";

const NO_DATABASE =
  "DATABASE_URL is not set: this test needs PostgreSQL. `npm test` provides one; to run it alone, set " +
  "DATABASE_URL to a loopback database (the global setup drops and re-migrates it).";

/**
 * The test database's URL, or a failure naming what is missing: a database test without one fails,
 * never skips (and never falls back to the development database).
 */
export function requireDatabase(): string {
  const url = process.env.DATABASE_URL;
  if (!url || url === NO_DATABASE_URL) throw new Error(NO_DATABASE);
  return url;
}

/** Tests that need PostgreSQL: each fails up front when no database is configured. */
export const dbTest = test.extend<{ database: string }>({
  database: [async ({}, use) => use(requireDatabase()), { auto: true }],
});
