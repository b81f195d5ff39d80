import { spawnSync } from "node:child_process";
import path from "node:path";
import { Client } from "pg";
import { afterAll, describe, expect } from "vitest";
import { templateDatabase } from "../setup/global-setup";
import { dbTest, requireDatabase } from "../setup/db";

// Each case on its own fresh database (a copy of the migrated, empty one the global setup keeps):
// the seed only acts on an empty one.
const admin = process.env.DATABASE_URL ?? "";
const databases: string[] = [];

async function freshDatabase(name: string): Promise<string> {
  const db = `${name}_${Math.random().toString(36).slice(2, 8)}`;
  const client = new Client({ connectionString: admin });
  await client.connect();
  await client.query(`create database ${db} template ${templateDatabase(admin)}`);
  await client.end();
  databases.push(db);
  const url = new URL(admin);
  url.pathname = `/${db}`;
  return url.toString();
}

/** tsx is what `npm start` runs the seed with (called directly: npx would only look it up again). */
const TSX = path.resolve(import.meta.dirname, "../../node_modules/.bin/tsx");

function run(script: string, url: string, env: Record<string, string | undefined>, args: string[] = []) {
  const { YOKELINE_DEMO: _demo, ...rest } = process.env;
  return spawnSync(TSX, ["--tsconfig", "scripts/tsconfig.json", script, ...args], {
    env: { ...rest, DATABASE_URL: url, APP_URL: "http://127.0.0.1:3999", YOKELINE_JOBS: "0", ...env },
    encoding: "utf8",
  });
}

async function query<T>(url: string, sql: string, params: unknown[] = []): Promise<T[]> {
  const client = new Client({ connectionString: url });
  await client.connect();
  try {
    return (await client.query(sql, params)).rows as T[];
  } finally {
    await client.end();
  }
}

afterAll(async () => {
  requireDatabase();
  const client = new Client({ connectionString: admin });
  await client.connect();
  for (const db of databases) await client.query(`drop database if exists ${db} with (force)`);
  await client.end();
});

describe("seed outside demo mode and the first owner", () => {
  dbTest(
    "outside demo mode: the shop row with neutral details, no accounts, no demo customers or orders",
    async () => {
      const url = await freshDatabase("seed_prod");
      const seeded = run("scripts/seed.ts", url, {});
      expect(seeded.status, seeded.stderr).toBe(0);
      expect(seeded.stdout).toMatch(/owner:create/);
      expect(await query(url, "select count(*)::int as n from app_user")).toEqual([{ n: 0 }]);
      expect(await query(url, "select count(*)::int as n from customer")).toEqual([{ n: 0 }]);
      expect(await query(url, "select count(*)::int as n from shop_order")).toEqual([{ n: 0 }]);
      const [shop] = await query<{ name: string; email: string }>(url, "select name, email from shop");
      expect(shop).toEqual({ name: "Your shop", email: "" });
      expect(await query(url, "select count(*)::int as n from shop_config")).toEqual([{ n: 1 }]);

      // The first owner: a one-time link to choose the password; a second owner is refused.
      const made = run("scripts/owner-create.ts", url, {}, ["Boss@Shop.example"]);
      expect(made.status, made.stderr).toBe(0);
      const link = made.stdout.match(/http:\/\/127\.0\.0\.1:3999\/set-password\?token=([\w-]+)/);
      expect(link).not.toBeNull();
      // An invitation for the owner role (its token only hashed); the account is made when it is used.
      const invitations = await query<{ role: string; email: string; token_hash: string }>(
        url,
        "select role, email, token_hash from staff_invitation",
      );
      expect(invitations).toEqual([expect.objectContaining({ role: "owner", email: "boss@shop.example" })]);
      expect(invitations[0]!.token_hash).not.toBe(link![1]);
      const again = run("scripts/owner-create.ts", url, {}, ["second@shop.example"]);
      expect(again.status).toBe(1);
      expect(again.stderr).toMatch(/already exists/);
      expect(await query(url, "select count(*)::int as n from staff_invitation")).toEqual([{ n: 1 }]);
      expect(await query(url, "select count(*)::int as n from app_user")).toEqual([{ n: 0 }]);
    },
    120_000,
  );

  dbTest(
    "in demo mode: the demo staff, customers and orders",
    async () => {
      const url = await freshDatabase("seed_demo");
      const seeded = run("scripts/seed.ts", url, { YOKELINE_DEMO: "1" });
      expect(seeded.status, seeded.stderr).toBe(0);
      const roles = await query<{ role: string }>(url, "select distinct role from app_user");
      expect(roles.map((r) => r.role).sort()).toEqual(["counter", "customer", "floor", "owner"]);
      // The two named demo orders plus the invented shop's history (320 past orders, lib/demo/history.ts).
      expect(await query(url, "select count(*)::int as n from shop_order")).toEqual([{ n: 322 }]);
    },
    120_000,
  );
});
