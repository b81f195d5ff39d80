import { test } from "vitest";

/** Tests that need PostgreSQL; `npm test` always provides one (DATABASE_URL). */
export const dbTest = process.env.DATABASE_URL ? test : test.skip;
export const hasDatabase = Boolean(process.env.DATABASE_URL);
