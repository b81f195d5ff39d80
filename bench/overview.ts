/**
 * The owner's overview queries on a large shop: generates BENCH_OVERVIEW_ORDERS orders (default
 * 100,000: ~160k shafts, ~1M step records) into the bench database, VACUUM ANALYZE, then times
 * each overview query (lib/shop/overview-queries.ts, the very SQL the page runs) over repeated
 * runs, beside a floor measured in the same run (`select 1` on the same connection).
 */
import "reflect-metadata";
import { Client } from "pg";
import { getOrm } from "../lib/db/orm";
import { databaseUrl } from "../lib/db/url";
import { generateLargeShop } from "../lib/demo/large";
import { getShopEngineering } from "../lib/shop/config";
import { measuredStepAverages, overviewContext } from "../lib/shop/overview";
import { OVERVIEW_QUERIES, pgExec } from "../lib/shop/overview-queries";
import { addRow } from "./table";

const TARGET_MS = 100;
const RUNS = Number(process.env.BENCH_OVERVIEW_RUNS ?? 30);

const pct = (xs: number[], p: number) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor((p / 100) * s.length))]!;
};

export async function benchOverview(): Promise<void> {
  if (!process.env.DATABASE_URL) {
    console.log("\noverview queries: skipped (needs DATABASE_URL; run through `npm run bench`).");
    return;
  }
  const orders = Number(process.env.BENCH_OVERVIEW_ORDERS ?? 100_000);
  // An earlier bench closed the process's ORM when it finished.
  const orm = await getOrm();
  if (!(await orm.isConnected())) await orm.connect();
  console.log(`\noverview queries (${orders.toLocaleString("en-US")} generated orders)`);
  // BENCH_OVERVIEW_ORDERS=0 times the queries on the data already there (a second look).
  const made =
    orders > 0
      ? await generateLargeShop({ orders, events: false, log: (l) => console.log(`  ${l.trim()}`) })
      : null;
  const db = new Client({ connectionString: databaseUrl() });
  await db.connect();
  try {
    // Pages all-visible and fresh statistics, as autovacuum leaves a settled database.
    await db.query("vacuum analyze");
    const exec = pgExec(db);
    const { floor } = await getShopEngineering();
    const now = new Date();
    const ctx = overviewContext(now, floor, await measuredStepAverages(exec, floor, now));
    const time = async (sql: string, params: unknown[]) => {
      let n = 0;
      const text = sql.replace(/\?/g, () => `$${++n}`);
      const t0 = performance.now();
      await db.query(text, params);
      return performance.now() - t0;
    };
    const ms = (xs: number[]) => `p50 ${pct(xs, 50).toFixed(1)} ms · p99 ${pct(xs, 99).toFixed(1)} ms`;
    const floorMs: number[] = [];
    for (let i = 0; i < 20; i++) await time("select 1", []);
    for (let i = 0; i < RUNS * 3; i++) floorMs.push(await time("select 1", []));
    const { rows } = await db.query<Record<string, string>>(
      `select (select count(*) from shop_order) as orders, (select count(*) from work_order) as shafts,
         (select count(*) from work_order_step) as steps, (select count(*) from step_record) as records`,
    );
    const c = rows[0]!;
    console.log(
      `  data: ${c.orders} orders, ${c.shafts} shafts, ${c.steps} steps, ${c.records} step records${made ? ` (generated in ${(made.ms / 1000).toFixed(0)} s)` : ""}`,
    );
    for (const q of Object.values(OVERVIEW_QUERIES)) {
      const params = q.params(ctx);
      for (let i = 0; i < 3; i++) await time(q.sql, params); // warm the cache
      const xs: number[] = [];
      for (let i = 0; i < RUNS; i++) xs.push(await time(q.sql, params));
      addRow({
        what: `overview: ${q.name} (${c.orders} orders)`,
        figure: ms(xs),
        floor: `select 1: ${ms(floorMs)}`,
        target: `p99 < ${TARGET_MS} ms`,
        met: pct(xs, 99) < TARGET_MS,
      });
    }
  } finally {
    await db.end();
    await (await getOrm()).close();
  }
}
