import { describe, expect, test } from "vitest";
import { createRequire } from "node:module";
import PgBoss from "pg-boss";
import { PGBOSS_CONSTRUCTION_SQL, PGBOSS_SCHEMA_VERSION } from "@/migrations/Migration20261202080000";

const require = createRequire(import.meta.url);

describe("the pg-boss schema migration", () => {
  test("matches the installed pg-boss (after an upgrade, add a migration with getMigrationPlans)", () => {
    expect((require("pg-boss/version.json") as { schema: number }).schema).toBe(PGBOSS_SCHEMA_VERSION);
    const plan = PgBoss.getConstructionPlans("pgboss");
    const squash = (sql: string) => sql.replace(/\s+/g, " ").trim();
    expect(squash(plan)).toContain(squash(PGBOSS_CONSTRUCTION_SQL));
  });
});
