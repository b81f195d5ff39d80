import "server-only";
/**
 * Large generated data sets for benchmarks (`npm run seed -- --orders 100000`): invented phone
 * customers and that many orders through the same simulation as the demo shop, committed batch
 * by batch, then ANALYZE so the planner knows the tables' new sizes. Loopback databases only.
 */
import { Client } from "pg";
import { User } from "@/entities";
import { freshEm } from "@/lib/db/orm";
import { assertLoopbackDatabase, databaseUrl } from "@/lib/db/url";
import { getShopEngineering, invalidateShopEngineering } from "@/lib/shop/config";
import { generateShop, insertCustomers, type GenerateResult } from "./generate";

export interface LargeShopOptions {
  orders: number;
  seed?: number;
  events?: boolean;
  /** One customer per this many orders (default 25). */
  ordersPerCustomer?: number;
  url?: string;
  log?: (line: string) => void;
}

/** Generates `orders` orders into the database at `url` (default DATABASE_URL); refuses other hosts. */
export async function generateLargeShop(opts: LargeShopOptions): Promise<GenerateResult & { ms: number }> {
  const url = opts.url ?? databaseUrl();
  assertLoopbackDatabase(url);
  const log = opts.log ?? (() => undefined);
  const em = await freshEm();
  const byRole = async (role: "owner" | "counter" | "floor") =>
    (await em.findOne(User, { role }, { orderBy: { createdAt: "asc" } }))?.id ?? null;
  const staff = {
    ownerId: await byRole("owner"),
    counterId: await byRole("counter"),
    floorId: await byRole("floor"),
  };
  invalidateShopEngineering();
  const shop = await getShopEngineering();
  const t0 = performance.now();
  const db = new Client({ connectionString: url });
  await db.connect();
  try {
    const { rows } = await db.query<{ n: string }>("select count(*) as n from customer");
    // Generated data can be made again: no need to wait for each batch's commit to reach the disk.
    await db.query("set synchronous_commit = off");
    await db.query("begin");
    const count = Math.max(1, Math.ceil(opts.orders / (opts.ordersPerCustomer ?? 25)));
    const customers = await insertCustomers(db, count, new Date(), opts.seed ?? 5, Number(rows[0]?.n ?? 0));
    let lastLog = 0;
    const result = await generateShop(db, {
      orders: opts.orders,
      customers,
      staff,
      shop,
      seed: opts.seed,
      events: opts.events,
      commitEachBatch: true,
      onBatch: (done, total) => {
        if (performance.now() - lastLog > 5_000 || done === total) {
          lastLog = performance.now();
          log(`  ${done.toLocaleString("en-US")} of ${total.toLocaleString("en-US")} orders`);
        }
      },
    });
    await db.query("commit");
    await db.query("analyze");
    const ms = performance.now() - t0;
    log(
      `Generated ${result.orders} orders, ${result.shafts} shafts, ${result.workOrders} work orders, ${result.steps} steps, ${result.stepRecords} step records, ${result.payments} payments, ${result.refunds} refunds, ${result.events} timeline entries in ${(ms / 1000).toFixed(1)} s.`,
    );
    log(
      `By status: ${Object.entries(result.byStatus)
        .map(([k, v]) => `${k} ${v}`)
        .join(", ")}`,
    );
    return { ...result, ms };
  } catch (error) {
    await db.query("rollback").catch(() => undefined);
    throw error;
  } finally {
    await db.end();
  }
}
