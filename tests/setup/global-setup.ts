import "reflect-metadata";
import { execFileSync } from "node:child_process";
import { Client } from "pg";
import { assertLoopbackDatabase } from "../../lib/db/url";

/**
 * Before the whole run: when a database is configured (npm test always does), rebuild its
 * schema from empty through the migrations, with the same CLI production uses. A copy of the
 * migrated, still empty database is kept as a template (`templateDatabase`) for tests that want
 * a database of their own without migrating again.
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
  // Nothing is connected to the database just now, as copying it needs.
  const template = templateDatabase(url);
  const admin = new Client({ connectionString: url });
  await admin.connect();
  try {
    await admin.query(`drop database if exists ${template}`);
    await admin.query(`create database ${template} template ${new URL(url).pathname.slice(1)}`);
  } finally {
    await admin.end();
  }
}

/** The name of the freshly migrated, empty copy of the test database the global setup keeps. */
export function templateDatabase(url: string): string {
  return `${new URL(url).pathname.slice(1)}_migrated`;
}

/** Runs `mikro-orm migration:up` against `url` (throws with its output on failure). */
export function migrateWithCli(url: string, command = "migration:up"): string {
  return execFileSync("npx", ["mikro-orm", command], {
    env: { ...process.env, DATABASE_URL: url },
    encoding: "utf8",
    stdio: ["ignore", "pipe", "pipe"],
  });
}
