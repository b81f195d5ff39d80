import "reflect-metadata";
import { execFileSync } from "node:child_process";
import { Client } from "pg";
import { assertLoopbackDatabase } from "../../lib/db/url";

/**
 * Before the whole run: when a database is configured (npm test always does), rebuild its
 * schema from empty through the migrations, with the same CLI production uses.
 */
export default async function setup() {
  const url = process.env.DATABASE_URL;
  if (!url) return;
  assertLoopbackDatabase(url);
  const client = new Client({ connectionString: url });
  await client.connect();
  // pg-boss lives in its own schema, also created by the migrations.
  await client.query(
    "drop schema if exists pgboss cascade; drop schema if exists public cascade; create schema public",
  );
  await client.end();
  migrateWithCli(url);
}

/** Runs `mikro-orm migration:up` against `url` (throws with its output on failure). */
export function migrateWithCli(url: string, command = "migration:up"): string {
  return execFileSync("npx", ["mikro-orm", command], {
    env: { ...process.env, DATABASE_URL: url },
    encoding: "utf8",
    stdio: ["ignore", "pipe", "pipe"],
  });
}
