import "server-only";
/**
 * The demo shop's past months (demo data): a few hundred orders in every state with their work
 * orders, step records, payments and refunds, for the named demo customers and some invented
 * phone customers, so every screen means something on first start.
 */
import { Client } from "pg";
import { Customer, User } from "@/entities";
import { freshEm } from "@/lib/db/orm";
import { databaseUrl } from "@/lib/db/url";
import { DEMO_STAFF } from "@/lib/demo";
import { getShopEngineering, invalidateShopEngineering } from "@/lib/shop/config";
import { generateShop, insertCustomers, type GenerateResult } from "./generate";

/** How many past orders the demo shop has. */
export const DEMO_HISTORY_ORDERS = 320;
/** Invented phone customers added beside the named ones. */
export const DEMO_EXTRA_CUSTOMERS = 24;

/** How the demo history is spread: 20 weeks, with a busy spell in the last nine days (demo data). */
export const DEMO_HISTORY_SHAPE = {
  weeks: 20,
  recent: { days: 9, share: 0.1 },
  seed: 20_261_204,
  showcase: true,
} as const;

/** Writes the demo shop's history in one transaction (after its users and customers exist). */
export async function seedDemoHistory(now = new Date()): Promise<GenerateResult> {
  const em = await freshEm();
  const [customers, staff] = await Promise.all([
    em.find(Customer, {}, { orderBy: { createdAt: "asc" } }),
    em.find(User, { email: { $in: DEMO_STAFF.map((s) => s.email) } }),
  ]);
  const idOf = (email: string) => staff.find((u) => u.email === email)?.id ?? null;
  invalidateShopEngineering();
  const shop = await getShopEngineering();
  const db = new Client({ connectionString: databaseUrl() });
  await db.connect();
  try {
    await db.query("begin");
    const invented = await insertCustomers(db, DEMO_EXTRA_CUSTOMERS, now, 11);
    const result = await generateShop(db, {
      orders: DEMO_HISTORY_ORDERS,
      customers: [
        ...customers.map((c) => ({ id: c.id, name: c.name, userId: c.user?.id ?? null })),
        ...invented,
      ],
      staff: {
        ownerId: idOf(DEMO_STAFF[0].email),
        counterId: idOf(DEMO_STAFF[1].email),
        floorId: idOf(DEMO_STAFF[2].email),
      },
      shop,
      now,
      ...DEMO_HISTORY_SHAPE,
    });
    await db.query("commit");
    return result;
  } catch (error) {
    await db.query("rollback").catch(() => undefined);
    throw error;
  } finally {
    await db.end();
  }
}
