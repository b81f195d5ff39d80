import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { randomUUID } from "node:crypto";
import { Client } from "pg";
import { dbTest, requireDatabase } from "../setup/db";
import { medianOf, overviewFigures, weekStart, type OverviewFigures } from "@/lib/shop/overview";
import { pgExec } from "@/lib/shop/overview-queries";
import { defaultFloorSettings } from "@/lib/traveller/settings";

// The owner's figures against a small shop built by hand (invented data), inside one transaction
// that starts from empty tables and is rolled back. Expected values are worked out in the comments.
const NOW = new Date("2026-06-10T12:00:00Z"); // a Wednesday; today = 2026-06-10, its week starts 06-08
const H = 3_600_000;
const ROUTING = ["CUT", "WLD", "RUN", "BAL", "FIN", "SHP"] as const;
const NAMES = [
  "Cut tube",
  "Weld and phase",
  "Straighten and runout",
  "Balance",
  "Final inspection",
  "Pack and ship",
];

let db: Client;
let f: OverviewFigures;

async function order(o: {
  status: string;
  promised: string;
  total: number;
  paid?: number;
  refunded?: number;
  created?: string;
}): Promise<string> {
  const id = randomUUID();
  await db.query(
    `insert into shop_order (id, number, customer_id, channel, status, payment_state, fulfilment, currency,
       subtotal_cents, tax_cents, shipping_cents, total_cents, deposit_cents, paid_cents, refunded_cents, promised_date, created_at, updated_at)
     values ($1, $2, $3, 'counter', $4, 'unpaid', 'pickup', 'USD', $5, 0, 0, $5, 0, $6, $7, $8, $9, $9)`,
    [
      id,
      `T-${id.slice(0, 6)}`,
      customerId,
      o.status,
      o.total,
      o.paid ?? 0,
      o.refunded ?? 0,
      o.promised,
      o.created ?? "2026-05-31T00:00:00Z",
    ],
  );
  return id;
}

/** A work order released at `release`, its steps signed off after the given hours each (then pending). */
async function workOrder(
  orderId: string,
  release: string,
  hoursEach: number[],
  hold?: { message: string },
): Promise<void> {
  const shaftId = randomUUID();
  await db.query(
    `insert into order_shaft (id, order_id, position, name, design, evaluation, overall, price_lines, price_cents)
     values ($1, $2, 1, 'Test shaft', '{}', '{}', 'pass', '[]', 0)`,
    [shaftId, orderId],
  );
  const woId = randomUUID();
  const done = hoursEach.length;
  const state = hold
    ? "on_hold"
    : done === 6
      ? "picked_up"
      : done >= 5
        ? "ready"
        : done === 0
          ? "released"
          : "in_shop";
  await db.query(
    `insert into work_order (id, order_id, order_shaft_id, serial, serial_year, serial_sequence, state, current_position, step_count, created_at, updated_at)
     values ($1, $2, $3, $4, 2026, $5, $6, $7, 6, $8, $8)`,
    [woId, orderId, shaftId, `T-${woId.slice(0, 8)}`, ++sequence, state, done + 1, release],
  );
  let t = new Date(release).getTime();
  for (let i = 0; i < 6; i++) {
    const stepId = randomUUID();
    const doneAt = i < done ? new Date((t += hoursEach[i]! * H)) : null;
    const stepState = doneAt ? "done" : hold && i === done ? "on_hold" : "pending";
    await db.query(
      `insert into work_order_step (id, work_order_id, revision, position, code, spec, state, completed_at)
       values ($1, $2, 1, $3, $4, $5, $6, $7)`,
      [stepId, woId, i + 1, ROUTING[i], JSON.stringify({ name: NAMES[i] }), stepState, doneAt],
    );
    if (stepState === "on_hold")
      await db.query(
        `insert into step_record (id, work_order_id, step_id, revision, at, values, outcome, failures, idempotency_key)
         values ($1, $2, $3, 1, '2026-06-09T08:00:00Z', '{}', 'hold', $4, $5)`,
        [
          randomUUID(),
          woId,
          stepId,
          JSON.stringify([{ key: "cutLengthMm", message: hold!.message }]),
          randomUUID(),
        ],
      );
  }
}

async function payment(
  orderId: string,
  kind: string,
  amount: number,
  paidAt: string,
  refunds: [number, string][] = [],
) {
  const id = randomUUID();
  const refunded = refunds.reduce((s, [a]) => s + a, 0);
  await db.query(
    `insert into payment (id, order_id, kind, amount_cents, currency, status, checkout_session_id, checkout_url, refunded_cents, paid_at, created_at)
     values ($1, $2, $3, $4, 'USD', 'succeeded', $5, 'x', $6, $7, $7)`,
    [id, orderId, kind, amount, `cs_${id}`, refunded, paidAt],
  );
  for (const [a, at] of refunds)
    await db.query(
      `insert into refund (id, payment_id, amount_cents, provider_refund_id, reason, created_at) values ($1, $2, $3, $4, 'test', $5)`,
      [randomUUID(), id, a, `re_${randomUUID()}`, at],
    );
}

let customerId = "";
let sequence = 90_000;
const ids: Record<string, string> = {};

describe("overview figures on a hand-built shop", () => {
  beforeAll(async () => {
    db = new Client({ connectionString: requireDatabase() });
    await db.connect();
    await db.query("begin");
    await db.query(
      "truncate refund, payment, step_record, work_order_step, work_order, order_event, order_shaft, upload, email_message, shop_order, customer cascade",
    );
    customerId = randomUUID();
    await db.query(
      `insert into customer (id, name, email) values ($1, 'Test Customer', 'test@customer.example')`,
      [customerId],
    );

    // History: five shipped orders, released 2026-06-01; steps take CUT 10, WLD 20, RUN 10, BAL 20,
    // FIN 5, SHP 15 hours after the previous sign-off — except the fifth, whose CUT took 20 h.
    const usual = [10, 20, 10, 20, 5, 15];
    for (let i = 0; i < 5; i++) {
      const id = await order({
        status: "shipped",
        promised: "2026-06-05",
        total: 1000,
        paid: 1000,
        refunded: i === 0 ? 100 : 0,
      });
      ids[`S${i + 1}`] = id;
      await workOrder(id, "2026-06-01T00:00:00Z", i === 4 ? [20, ...usual.slice(1)] : usual);
      // The floor stamps the order when its last shaft leaves (lib/floor/hooks.ts): the SHP sign-off.
      await db.query(
        `update shop_order set shipped_at = (select max(s.completed_at) from work_order_step s
           join work_order w on w.id = s.work_order_id where w.order_id = $1 and s.state = 'done') where id = $1`,
        [id],
      );
    }
    // S1's deposit and balance in the window (weeks 06-01 and 06-08), 100 refunded on 06-09; the
    // other shipped orders were paid in January (before the 12 weeks the charts show).
    await payment(ids.S1!, "deposit", 500, "2026-06-01T10:00:00Z");
    await payment(ids.S1!, "balance", 500, "2026-06-09T10:00:00Z", [[100, "2026-06-09T12:00:00Z"]]);
    for (const s of ["S2", "S3", "S4", "S5"]) await payment(ids[s]!, "full", 1000, "2026-01-05T10:00:00Z");

    // Open work. Late: promised yesterday, two steps done.
    ids.L = await order({ status: "in_shop", promised: "2026-06-09", total: 1500 });
    await workOrder(ids.L, "2026-06-07T00:00:00Z", [10, 20]);
    // At risk: promised tomorrow, BAL + FIN + SHP ahead = 20 + 5 + 15 = 40 h → 06-12 04:00.
    ids.R = await order({ status: "in_shop", promised: "2026-06-11", total: 2000, paid: 1000 });
    await workOrder(ids.R, "2026-06-08T00:00:00Z", [10, 20, 10]);
    await payment(ids.R, "deposit", 1000, "2026-06-08T09:00:00Z");
    // On course: promised 06-20, WLD onwards ahead (70 h) → 06-13.
    ids.K = await order({ status: "in_shop", promised: "2026-06-20", total: 900 });
    await workOrder(ids.K, "2026-06-09T00:00:00Z", [10]);
    // On hold at the cut, promised 06-30 (81.25 h ahead → 06-13: on course).
    ids.H = await order({ status: "in_shop", promised: "2026-06-30", total: 800, paid: 400 });
    await workOrder(ids.H, "2026-06-09T00:00:00Z", [], {
      message: "Cut length 32.970 in is outside the limit",
    });
    await payment(ids.H, "deposit", 400, "2026-05-20T09:00:00Z");
    // Awaiting payment, promised tomorrow: the whole routing ahead (81.25 h → 06-13): at risk.
    ids.P = await order({ status: "awaiting_payment", promised: "2026-06-11", total: 700 });
    // Cancelled with its deposit refunded: neither late nor owed, though its promise has passed.
    ids.C = await order({
      status: "cancelled",
      promised: "2026-06-01",
      total: 600,
      paid: 300,
      refunded: 300,
    });
    await payment(ids.C, "deposit", 300, "2026-06-02T10:00:00Z", [[300, "2026-06-03T10:00:00Z"]]);

    // The hand-built orders below are dated in UTC days: the shop here keeps UTC.
    f = await overviewFigures(NOW, pgExec(db), defaultFloorSettings, "UTC");
  });

  afterAll(async () => {
    await db?.query("rollback");
    await db?.end();
  });

  dbTest("orders by state: counts and value", () => {
    expect(f.byState).toEqual([
      { status: "awaiting_payment", count: 1, valueCents: 700 },
      { status: "received", count: 0, valueCents: 0 },
      { status: "in_shop", count: 4, valueCents: 1500 + 2000 + 900 + 800 },
      { status: "ready", count: 0, valueCents: 0 },
      { status: "shipped", count: 5, valueCents: 5000 },
      { status: "cancelled", count: 1, valueCents: 600 },
    ]);
    expect(f.open).toBe(5);
  });

  dbTest("measured time per step: the average from the previous sign-off (or the release)", () => {
    const hours = Object.fromEntries(f.stepAverages.map((s) => [s.code, [s.hours, s.samples, s.isDefault]]));
    // CUT: S1–S4, L, R, K took 10 h, S5 20 h → (7 × 10 + 20) / 8 = 11.25 h.
    expect(hours.CUT![0]).toBeCloseTo(11.25, 6);
    expect(hours.CUT![1]).toBe(8);
    expect(hours.WLD).toEqual([20, 7, false]); // S1–S5, L, R
    expect(hours.RUN).toEqual([10, 6, false]); // S1–S5, R
    expect(hours.BAL).toEqual([20, 5, false]);
    expect(hours.FIN).toEqual([5, 5, false]);
    expect(hours.SHP).toEqual([15, 5, false]);
  });

  dbTest("late vs at risk", () => {
    expect(f.late.count).toBe(1);
    expect(f.late.valueCents).toBe(1500);
    expect(f.late.items.map((o) => o.id)).toEqual([ids.L]);
    expect(f.atRisk.count).toBe(2);
    const risk = Object.fromEntries(f.atRisk.items.map((o) => [o.id, o]));
    expect(risk[ids.R!]).toMatchObject({
      promisedDate: "2026-06-11",
      expectedDate: "2026-06-12",
      stepsLeft: 3,
    });
    expect(risk[ids.R!]!.remainingHours).toBeCloseTo(40, 6);
    expect(risk[ids.P!]).toMatchObject({
      promisedDate: "2026-06-11",
      expectedDate: "2026-06-13",
      stepsLeft: 0,
    });
    expect(risk[ids.P!]!.remainingHours).toBeCloseTo(81.25, 6);
    expect(risk[ids.K!]).toBeUndefined();
    expect(risk[ids.H!]).toBeUndefined();
  });

  dbTest("on hold and why", () => {
    expect(f.onHold.count).toBe(1);
    expect(f.onHold.items[0]).toMatchObject({
      orderId: ids.H,
      step: "Cut tube",
      since: "2026-06-09T08:00:00.000Z",
      reasons: ["Cut length 32.970 in is outside the limit"],
    });
  });

  dbTest("money: deposits held, balances due, taken and refunds by week", () => {
    // Held: paid less refunded on open orders: R 1000 + H 400.
    expect(f.money.depositsHeldCents).toBe(1400);
    // Due on accepted orders: R 1000 + H 400 + K 900 + L 1500; P's 700 awaits its first payment.
    expect(f.money.balancesDueCents).toBe(3800);
    expect(f.money.balancesDueOrders).toBe(4);
    expect(f.money.awaitingCents).toBe(700);
    expect(f.money.weeks).toHaveLength(12);
    const week = (w: string) => f.money.weeks.find((x) => x.week === w);
    expect(week("2026-05-18")).toEqual({
      week: "2026-05-18",
      depositsCents: 400,
      balancesCents: 0,
      refundsCents: 0,
    });
    expect(week("2026-06-01")).toEqual({
      week: "2026-06-01",
      depositsCents: 800,
      balancesCents: 0,
      refundsCents: 300,
    });
    expect(week("2026-06-08")).toEqual({
      week: "2026-06-08",
      depositsCents: 1000,
      balancesCents: 500,
      refundsCents: 100,
    });
    expect(f.money.takenCents).toBe(400 + 800 + 1500);
    expect(f.money.refundsCents).toBe(400);
  });

  dbTest("throughput and days from order to ship", () => {
    // FIN signed off 65 h (S5: 75 h) after the 06-01 release: all five in the week of 06-01.
    expect(f.finishedByWeek.find((w) => w.week === "2026-06-01")?.shafts).toBe(5);
    expect(f.finishedByWeek.reduce((s, w) => s + w.shafts, 0)).toBe(5);
    // Ordered 05-31 00:00, shipped 104 h (S5: 114 h) later: 4 whole days each.
    expect(f.orderToShip.orders).toBe(5);
    expect(f.orderToShip.medianDays).toBe(4);
    expect(f.orderToShip.histogram.find((b) => b.days === "4–7")?.orders).toBe(5);
  });
});

describe("overview helpers", () => {
  test("weeks start on Monday (UTC)", () => {
    expect(weekStart(new Date("2026-06-10T12:00:00Z"))).toBe("2026-06-08");
    expect(weekStart(new Date("2026-06-08T00:00:00Z"))).toBe("2026-06-08");
    expect(weekStart(new Date("2026-06-07T23:59:59Z"))).toBe("2026-06-01");
  });
  test("whole-day median of a histogram", () => {
    expect(medianOf(new Map())).toBeNull();
    expect(medianOf(new Map([[3, 1]]))).toBe(3);
    expect(
      medianOf(
        new Map([
          [2, 1],
          [5, 1],
        ]),
      ),
    ).toBe(3.5); // two orders: halfway
    expect(
      medianOf(
        new Map([
          [1, 2],
          [4, 1],
          [9, 4],
        ]),
      ),
    ).toBe(9); // 1,1,4,9,9,9,9
  });
});
