/**
 * A small bulk-insert helper for the tables bench: `count` orders (with their customers, one shaft
 * each, and work orders for the ones in the shop, some on hold) in a few INSERT … SELECT statements
 * over generate_series. Demo data, numbered "BT-…" so it never meets real orders; a second call
 * adds nothing while that many are there. (A general generator for the whole shop comes later.)
 */
import { Client } from "pg";

export async function insertBenchOrders(databaseUrl: string, count: number): Promise<number> {
  const db = new Client({ connectionString: databaseUrl });
  await db.connect();
  try {
    const { rows } = await db.query<{ n: number }>(
      "select count(*)::int as n from shop_order where number like 'BT-%'",
    );
    if ((rows[0]?.n ?? 0) >= count) return 0;
    await db.query("begin");
    await db.query("delete from work_order where serial like 'BENCH-%'");
    await db.query(
      "delete from order_shaft where order_id in (select id from shop_order where number like 'BT-%')",
    );
    await db.query("delete from shop_order where number like 'BT-%'");
    await db.query("delete from customer where email like 'bench-tables-%'");
    const customers = Math.max(1, Math.round(count / 10));
    await db.query(
      `insert into customer (id, name, email, phone, company, created_at)
       select gen_random_uuid(), 'Bench customer ' || i, 'bench-tables-' || i || '@bench.example',
              '555-' || lpad((i % 10000)::text, 4, '0'),
              case when i % 3 = 0 then 'Bench Haulage ' || (i % 50) else null end,
              now() - (i || ' minutes')::interval
       from generate_series(1, $1::int) i`,
      [customers],
    );
    // Status, payment and money kept consistent with the database's CHECKs (paid ≤ total, …).
    await db.query(
      `with c as (select id, row_number() over (order by email) as k from customer where email like 'bench-tables-%'),
       o as (
         select i,
           (array['awaiting_payment','received','in_shop','in_shop','ready','shipped','shipped','cancelled'])[1 + i % 8]::order_status as status,
           20000 + (i * 7919) % 300000 as total
         from generate_series(1, $1::int) i
       )
       insert into shop_order (id, number, customer_id, channel, status, payment_state, fulfilment, currency,
         subtotal_cents, tax_cents, shipping_cents, total_cents, deposit_cents, paid_cents, refunded_cents,
         promised_date, created_at, updated_at)
       select gen_random_uuid(), 'BT-' || lpad(o.i::text, 6, '0'), c.id,
         (case when o.i % 3 = 0 then 'counter' else 'online' end)::order_channel,
         o.status,
         (case o.status when 'awaiting_payment' then 'unpaid' when 'shipped' then 'paid'
            when 'cancelled' then 'refunded' when 'ready' then 'paid' else 'deposit_paid' end)::payment_state,
         (case when o.i % 2 = 0 then 'ship' else 'pickup' end)::fulfilment,
         'USD', o.total, 0, 0, o.total, o.total / 2,
         case when o.status in ('shipped', 'ready') then o.total
              when o.status in ('received', 'in_shop', 'cancelled') then o.total / 2 else 0 end,
         case when o.status = 'cancelled' then o.total / 2 else 0 end,
         current_date - 120 + (o.i % 180), now() - ((o.i % 200) || ' days')::interval, now()
       from o join c on c.k = 1 + o.i % $2::int`,
      [count, customers],
    );
    await db.query(
      `insert into order_shaft (id, order_id, position, name, design, evaluation, overall, price_lines, price_cents)
       select gen_random_uuid(), o.id, 1, 'Bench shaft ' || o.number, '{}', '{"tube": {"tubeId": "YL-T-DOM-3500-083", "odMm": 88.9, "wallMm": 2.108}}',
              'pass', '[]', o.total_cents
       from shop_order o where o.number like 'BT-%'`,
    );
    await db.query(
      `insert into work_order (id, order_id, order_shaft_id, serial, serial_year, serial_sequence, state,
         current_position, step_count, created_at, updated_at)
       select gen_random_uuid(), o.id, s.id, 'BENCH-' || o.number, 1, row_number() over (order by o.number),
         (case when right(o.number, 1) in ('3', '7') then 'on_hold' else 'in_shop' end)::work_order_state,
         1 + (substr(o.number, 4)::int % 6), 6, o.created_at, now()
       from shop_order o join order_shaft s on s.order_id = o.id
       where o.number like 'BT-%' and o.status = 'in_shop'`,
    );
    await db.query("commit");
    await db.query("analyze shop_order; analyze customer; analyze order_shaft; analyze work_order");
    return count;
  } catch (error) {
    await db.query("rollback").catch(() => undefined);
    throw error;
  } finally {
    await db.end();
  }
}
