import { afterAll, beforeAll, describe, expect } from "vitest";
import { Client } from "pg";
import { dbTest, requireDatabase } from "../setup/db";
import { defaultGeneration } from "./helpers";
import { defaultFloorSettings } from "@/lib/traveller/settings";
import { generateShop, insertCustomers, type GenerateResult } from "@/lib/demo/generate";
import { DEMO_HISTORY_ORDERS, DEMO_HISTORY_SHAPE } from "@/lib/demo/history";
import { overviewFigures, type OverviewFigures } from "@/lib/shop/overview";
import { pgExec } from "@/lib/shop/overview-queries";

// The demo shop's history as the seed makes it (same size, shape and random sequence), on empty
// tables inside a transaction that is rolled back: every state is there, and the rows agree with
// each other the way the app's own code keeps them.
let db: Client;
let made: GenerateResult;
let figures: OverviewFigures;
let ms = 0;

/**
 * The clock of the shop in this test: the latest Wednesday, 14:00 UTC. "At risk" is remaining
 * floor time running past a promise, and promises fall on working days, so on a Saturday or a
 * Sunday nothing due on Monday is at risk yet; the history is made and read at the same moment.
 */
function lastWednesdayAfternoon(today = new Date()): Date {
  const at = new Date(Date.UTC(today.getUTCFullYear(), today.getUTCMonth(), today.getUTCDate(), 14));
  let daysBack = (at.getUTCDay() + 4) % 7; // days since Wednesday (day 3)
  if (daysBack === 0 && at > today) daysBack = 7; // a Wednesday morning: the week before
  at.setUTCDate(at.getUTCDate() - daysBack);
  return at;
}

const q = async <T = Record<string, unknown>>(sql: string) => (await db.query(sql)).rows as T[];

describe("the demo history", () => {
  beforeAll(async () => {
    db = new Client({ connectionString: requireDatabase() });
    await db.connect();
    await db.query("begin");
    await db.query(
      "truncate refund, payment, step_record, work_order_step, work_order, order_event, order_shaft, upload, email_message, shop_order, customer cascade",
    );
    const now = lastWednesdayAfternoon();
    const t0 = performance.now();
    const customers = await insertCustomers(db, 28, now, 11);
    made = await generateShop(db, {
      orders: DEMO_HISTORY_ORDERS,
      customers,
      ...defaultGeneration,
      now,
      ...DEMO_HISTORY_SHAPE,
    });
    ms = performance.now() - t0;
    figures = await overviewFigures(now, pgExec(db), defaultFloorSettings);
  }, 120_000);

  afterAll(async () => {
    await db?.query("rollback");
    await db?.end();
  });

  dbTest("a few hundred orders in every state, written in seconds", () => {
    expect(made.orders).toBe(DEMO_HISTORY_ORDERS);
    for (const s of ["awaiting_payment", "received", "in_shop", "ready", "shipped", "cancelled"])
      expect(made.byStatus[s] ?? 0, s).toBeGreaterThan(0);
    expect(ms).toBeLessThan(10_000); // the seed runs on every first `npm start`
  });

  dbTest("late, at risk, on hold with a reason, refunded — on the owner's overview", () => {
    expect(figures.late.count).toBeGreaterThan(0);
    expect(figures.atRisk.count).toBeGreaterThan(0);
    expect(figures.onHold.count).toBeGreaterThan(0);
    expect(figures.onHold.items.every((h) => h.reasons.length > 0)).toBe(true);
    expect(figures.money.refundsCents).toBeGreaterThan(0);
    expect(figures.finishedByWeek.filter((w) => w.shafts > 0).length).toBeGreaterThan(8);
  });

  dbTest("money agrees: paid = payments taken, refunded = refunds given, within the total", async () => {
    const bad = await q(`
      select o.number from shop_order o
      left join (select order_id, sum(amount_cents) paid, sum(refunded_cents) refunded from payment where status = 'succeeded' group by order_id) p on p.order_id = o.id
      where o.paid_cents <> coalesce(p.paid, 0) or o.refunded_cents <> coalesce(p.refunded, 0)
         or o.paid_cents > o.total_cents or o.refunded_cents > o.paid_cents`);
    expect(bad).toEqual([]);
    const refunds = await q(`
      select p.id from payment p left join (select payment_id, sum(amount_cents) s from refund group by payment_id) r on r.payment_id = p.id
      where p.refunded_cents <> coalesce(r.s, 0)`);
    expect(refunds).toEqual([]);
    const states = await q(`
      select number, payment_state::text from shop_order where payment_state::text <> case
        when refunded_cents > 0 then case when refunded_cents >= paid_cents then 'refunded' else 'partially_refunded' end
        when paid_cents >= total_cents then 'paid' when paid_cents > 0 then 'deposit_paid' else 'unpaid' end`);
    expect(states).toEqual([]);
  });

  dbTest(
    "steps are signed off in routing order, and each shaft and order is where its steps say",
    async () => {
      const outOfOrder = await q(`
      select s.id from work_order_step s join work_order_step n
        on n.work_order_id = s.work_order_id and n.revision = s.revision and n.position = s.position + 1
      where n.state = 'done' and (s.state <> 'done' or n.completed_at < s.completed_at)`);
      expect(outOfOrder).toEqual([]);
      const position = await q(`
      select w.serial from work_order w
      where w.current_position <> 1 + (select count(*) from work_order_step s where s.work_order_id = w.id and s.state = 'done')`);
      expect(position).toEqual([]);
      const records = await q(`
      select s.id from work_order_step s left join step_record r on r.completion_of = s.id
      where (s.state = 'done') <> (r.id is not null)`);
      expect(records).toEqual([]);
      const holds = await q(`
      select w.serial from work_order w where (w.state = 'on_hold') <>
        exists (select 1 from work_order_step s where s.work_order_id = w.id and s.state = 'on_hold')`);
      expect(holds).toEqual([]);
      // Released orders have a work order per shaft; others none. Shipped: every shaft left the shop.
      const release = await q(`
      select o.number from shop_order o where
        (o.status in ('in_shop', 'ready', 'shipped')) <> exists (select 1 from work_order w where w.order_id = o.id)
        or (o.status = 'shipped' and exists (select 1 from work_order w where w.order_id = o.id and w.state not in ('shipped', 'picked_up')))
        or (o.status = 'ready' and exists (select 1 from work_order w where w.order_id = o.id and w.state not in ('ready', 'shipped', 'picked_up')))`);
      expect(release).toEqual([]);
    },
  );

  dbTest("every order has its shafts, as many as its timeline says, released or not", async () => {
    const received = await q<{ number: string; status: string; label: string; shafts: number }>(`
      select o.number, o.status::text, e.label, (select count(*)::int from order_shaft s where s.order_id = o.id) shafts
      from shop_order o join order_event e on e.order_id = o.id and e.kind = 'received'`);
    expect(received).toHaveLength(DEMO_HISTORY_ORDERS);
    const disagree = received.filter((r) => {
      const said = /^Order received \((\d+) shafts?\)$/.exec(r.label);
      return !said || Number(said[1]) !== r.shafts || r.shafts < 1;
    });
    expect(disagree).toEqual([]);
    // Those never released (awaiting payment, paid but not yet released, cancelled) included.
    for (const status of ["awaiting_payment", "received", "cancelled"])
      expect(received.filter((r) => r.status === status && r.shafts > 0).length, status).toBeGreaterThan(0);
    // Released shafts each have their work order; an order's shafts are numbered 1..n.
    const gaps = await q(`
      select o.number from shop_order o where exists (
        select 1 from order_shaft s where s.order_id = o.id
        group by s.order_id having min(s.position) <> 1 or max(s.position) <> count(*))
        or exists (select 1 from work_order w where w.order_id = o.id)
          and exists (select 1 from order_shaft s where s.order_id = o.id
            and not exists (select 1 from work_order w where w.order_shaft_id = s.id))`);
    expect(gaps).toEqual([]);
    expect(made.shafts).toBe(received.reduce((n, r) => n + r.shafts, 0));
  });
});
