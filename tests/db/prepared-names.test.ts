import { describe, expect, test, vi } from "vitest";
import { getEm } from "@/lib/db/orm";
import { dbTest, requireDatabase } from "../setup/db";

requireDatabase();

// Next bundles lib/db/prepared.ts into each route's code (a page and a route handler each get their
// own copy) while they share one connection pool: a statement's name must follow from its text
// alone, or two copies name two different texts alike on one connection and PostgreSQL refuses
// the second ("Prepared statements must be unique").
describe("prepared read statements", () => {
  dbTest("two copies of the module, one connection, two texts: both run", async () => {
    const first = await import("@/lib/db/prepared");
    vi.resetModules();
    const second = await import("@/lib/db/prepared");
    expect(second).not.toBe(first);
    const em = (await getEm()).fork();
    await em.transactional(async (tx) => {
      // One transaction: one connection for both.
      const a = await first.preparedRows<{ x: number }>(tx, "select 1::int as x where ? = 1", [1], "probe");
      const b = await second.preparedRows<{ x: number }>(tx, "select 2::int as x where ? = 2", [2], "probe");
      expect([a[0]!.x, b[0]!.x]).toEqual([1, 2]);
    });
  });

  test("a name follows from the text", async () => {
    const { preparedName } = await import("@/lib/db/prepared");
    expect(preparedName("t", "select 1")).toBe(preparedName("t", "select 1"));
    expect(preparedName("t", "select 1")).not.toBe(preparedName("t", "select 2"));
  });
});
