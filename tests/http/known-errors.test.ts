/** Which faults callers are told are "unavailable" (503, try again) rather than a 500. */
import { describe, expect, test } from "vitest";
import { knownError } from "@/lib/http/known-errors";

describe("knownError", () => {
  test.each([
    // node-postgres's own words when the server goes away under a query (no SQLSTATE on them).
    "Connection terminated unexpectedly",
    "Connection terminated",
    "Client has encountered a connection error and is not queryable",
    "Client was closed and is not queryable",
    "Connection ended unexpectedly",
    "timeout exceeded when trying to connect",
    // Knex, on the next statement of a transaction whose connection died (seen in the restart test).
    "Transaction query already complete, run with DEBUG=knex:tx for more info",
    // Knex's pool, when no connection can be had in time.
    "Knex: Timeout acquiring a connection. The pool is probably full. Are you missing a .transacting(trx) call?",
  ])("a lost connection (%s) is unavailable", (message) => {
    expect(knownError(new Error(message))?.code).toBe("unavailable");
  });

  test("SQLSTATE 57P01 (admin shutdown) and class 08 are unavailable; a plain error is not known", () => {
    expect(knownError(Object.assign(new Error("terminating connection"), { code: "57P01" }))?.code).toBe(
      "unavailable",
    );
    expect(knownError(Object.assign(new Error("x"), { code: "08006" }))?.code).toBe("unavailable");
    expect(knownError(new Error("something else"))).toBeNull();
  });

  test("text PostgreSQL cannot take (a NUL: 22021, or 08P01 when the driver cannot frame it) is the caller's, not a lost database", () => {
    // 08P01 is what a NUL in a table search's value gave through the ORM: it was answered 503.
    for (const code of ["22021", "08P01"])
      expect(knownError(Object.assign(new Error("invalid byte sequence"), { code }))?.code).toBe("invalid");
  });
});
