import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect } from "vitest";
import { clusterForFile, pg } from "../setup/cluster";
import { dbTest } from "../setup/db";

const root = path.resolve(import.meta.dirname, "../..");
const password = "recovery-test-pw";

// A cluster of its own that this test stops and starts; the rest of the suite's database is untouched.
describe("the app recovers when the database comes back", () => {
  // Everything in this file talks to this cluster, which does not exist yet.
  const cluster = clusterForFile("recovery", password);

  dbTest(
    "a failed first connection is not kept; /api/health says 503, then ok",
    { timeout: 120_000 },
    async () => {
      const { getEm } = await import("@/lib/db/orm");
      const { GET } = await import("@/app/api/health/route");
      // better-auth's own pool (lib/auth/server.ts) must come back too.
      await import("@/lib/auth/server");
      const authPool = (globalThis as { yokelineAuthPool?: import("pg").Pool }).yokelineAuthPool!;
      await expect(authPool.query("select 1")).rejects.toThrow(/ECONNREFUSED/);

      await expect(getEm()).rejects.toMatchObject({
        code: "unavailable",
        message: /database is not reachable/,
      });
      const down = await GET();
      expect(down.status).toBe(503);
      expect(await down.json()).toMatchObject({ status: "degraded", database: { ok: false } });

      await cluster.up();
      const em = await getEm();
      expect(await em.getConnection().execute("select 1 as one")).toEqual([{ one: 1 }]);
      const up = await GET();
      expect(up.status).toBe(200);
      expect(await up.json()).toMatchObject({ status: "ok", database: { ok: true } });
      expect((await authPool.query("select 1 as one")).rows).toEqual([{ one: 1 }]);

      // Down again after a good start: health says so, and recovers by itself.
      await pg("pg_down", cluster.pgDir);
      expect((await GET()).status).toBe(503);
      // A handler that needs the database says so with 503 and the message, never a 500.
      const { POST: evaluate } = await import("@/app/api/designs/evaluate/route");
      const { NextRequest } = await import("next/server");
      const res = await evaluate(
        new NextRequest("http://127.0.0.1/api/designs/evaluate", {
          method: "POST",
          body: readFileSync(path.join(root, "examples/street-truck.json"), "utf8"),
          headers: { "content-type": "application/json" },
        }),
        { params: Promise.resolve({}) },
      );
      expect(res.status).toBe(503);
      expect(await res.json()).toMatchObject({ error: { code: "unavailable", message: /not reachable/ } });
      await cluster.up();
      expect((await GET()).status).toBe(200);
      expect((await authPool.query("select 2 as two")).rows).toEqual([{ two: 2 }]);
    },
  );
});
