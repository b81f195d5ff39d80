import { describe, expect } from "vitest";
import { execFileSync } from "node:child_process";
import { Client } from "pg";
import { migrateWithCli } from "../setup/global-setup";
import { dbTest } from "../setup/db";

describe("migrations", () => {
  dbTest(
    "apply to an empty database, and migration:check then finds nothing pending",
    { timeout: 90_000 },
    async () => {
      const url = new URL(process.env.DATABASE_URL!);
      const scratch = `yokeline_migrations_${process.pid}`;
      const admin = new Client({ connectionString: url.toString() });
      await admin.connect();
      await admin.query(`drop database if exists ${scratch}`);
      await admin.query(`create database ${scratch}`);
      url.pathname = `/${scratch}`;
      try {
        const probe = new Client({ connectionString: url.toString() });
        await probe.connect();
        const before = await probe.query(
          "select count(*)::int as n from pg_tables where schemaname = 'public'",
        );
        expect(before.rows[0].n).toBe(0);

        migrateWithCli(url.toString());
        const after = await probe.query("select tablename from pg_tables where schemaname = 'public'");
        const tables = after.rows.map((r: { tablename: string }) => r.tablename);
        expect(tables).toEqual(
          expect.arrayContaining([
            "app_user",
            "auth_session",
            "auth_account",
            "customer",
            "audit_event",
            "mikro_orm_migrations",
          ]),
        );
        await probe.end();

        // migration:check exits non-zero when the entities and the migrations disagree.
        const out = execFileSync("npx", ["mikro-orm", "migration:check"], {
          env: { ...process.env, DATABASE_URL: url.toString() },
          encoding: "utf8",
        });
        expect(out).toMatch(/No changes required/i);
      } finally {
        await admin.query(`drop database if exists ${scratch}`);
        await admin.end();
      }
    },
  );
});
