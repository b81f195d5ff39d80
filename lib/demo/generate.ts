import "server-only";
/**
 * Generates a shop's history (demo data): orders over past weeks in every state, with their
 * shafts, work orders, routing steps, step records (holds and rework included), payments,
 * refunds and timelines, consistent with the app's own rules (paid ≤ total, refunds ≤ paid,
 * steps signed off in routing order, an order's status following its shafts). One simulation
 * serves the demo seed (a few hundred orders) and `npm run seed -- --orders 100000` (benchmarks).
 * Rows are written in batches with `insert … select from unnest(…)`; the big JSON documents
 * (design, evaluation, record sheets) are sent once into temporary tables and joined.
 */
import { randomUUID } from "node:crypto";
import type { ClientBase } from "pg";
import { addBusinessDays } from "date-fns";
import { quoteOrder, type PriceBook } from "@/lib/pricing/price-book";
import type { ShopEngineering } from "@/lib/shop/config";
import { formatSerial } from "@/lib/traveller/codes";
import { checkMeasurements, type Failure, type SiValues } from "@/lib/traveller/measure";
import type { StepKind } from "@/lib/traveller/settings";
import type { StepSpec } from "@/lib/traveller/steps";
import { fromSi } from "@/lib/traveller/units";
import { formatMoney } from "@/lib/money";
import type { Fulfilment, PaymentKind } from "@/lib/orders/states";
import { demoDesigns, type DemoDesign } from "./designs";

const HOUR = 3_600_000;
const DAY = 24 * HOUR;

/** Mean hours each kind of step takes from the previous sign-off (queue and work; demo data). */
export const DEMO_STEP_HOURS: Record<StepKind, number> = {
  cut: 6,
  "weld-phase": 16,
  runout: 8,
  balance: 10,
  "final-inspection": 5,
  dispatch: 14,
  "sign-off": 2,
  teardown: 4,
  inspection: 3,
  assembly: 6,
};

export interface GenerateCustomer {
  id: string;
  name: string;
  /** The customer's own account (online orders are placed by it); null for phone customers. */
  userId: string | null;
}

export interface GenerateOptions {
  orders: number;
  /** The customers orders are for (picked at random). */
  customers: GenerateCustomer[];
  /** Who signs steps off, takes counter orders and refunds (any may be null). */
  staff: { counterId: string | null; floorId: string | null; ownerId: string | null };
  shop: ShopEngineering;
  now?: Date;
  /** How far back orders go; default: enough weeks for ~1,500 shafts a week, at least 20. */
  weeks?: number;
  /** The random sequence (the same seed gives the same shop). */
  seed?: number;
  /** A share of the orders placed in the last few days (a busy spell: work in hand in every state). */
  recent?: { days: number; share: number };
  /** The newest orders show the states a shop has only briefly (paid and not yet released, a hold). */
  showcase?: boolean;
  /** Add each order's timeline (order_event rows); default true. */
  events?: boolean;
  /** Orders per batch written; default 2,000. */
  batch?: number;
  /** Called after each batch (progress). */
  onBatch?: (done: number, total: number) => void;
  /** Commit after each batch (big runs); the caller owns the transaction otherwise. */
  commitEachBatch?: boolean;
}

export interface GenerateResult {
  orders: number;
  shafts: number;
  workOrders: number;
  steps: number;
  stepRecords: number;
  payments: number;
  refunds: number;
  events: number;
  byStatus: Record<string, number>;
}

/* Money in event labels: lib/money.ts (its formatters are cached per currency). */

/** A small, fast, seeded random sequence (mulberry32). */
export function randomSequence(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4_294_967_296;
  };
}

type Row = unknown[];
interface Column {
  name: string;
  /** The array type sent (uuid, text, int4, timestamptz, bool, date). */
  type: string;
  /** A cast applied to each element on insert (an enum, jsonb). */
  cast?: string;
}

/** Inserts rows through unnest(): one round trip per batch, whatever the row count. */
export async function insertRows(
  db: ClientBase,
  table: string,
  columns: Column[],
  rows: Row[],
  chunk = 5_000,
): Promise<void> {
  for (let start = 0; start < rows.length; start += chunk) {
    const part = rows.slice(start, start + chunk);
    const arrays = columns.map((_, i) => part.map((r) => r[i] ?? null));
    const names = columns.map((c) => `"${c.name}"`).join(", ");
    const select = columns.map((c, i) => (c.cast ? `c${i}::${c.cast}` : `c${i}`)).join(", ");
    const unnest = columns.map((c, i) => `$${i + 1}::${c.type}[]`).join(", ");
    const alias = columns.map((_, i) => `c${i}`).join(", ");
    await db.query(
      `insert into "${table}" (${names}) select ${select} from unnest(${unnest}) as u(${alias})`,
      arrays,
    );
  }
}

const col = (name: string, type: string, cast?: string): Column => ({ name, type, cast });

/** Invented people and firms (demo data). */
const FIRST = [
  "Avery",
  "Beau",
  "Carmen",
  "Dale",
  "Esme",
  "Floyd",
  "Gus",
  "Hollis",
  "Ida",
  "Jonah",
  "Kip",
  "Lorna",
  "Milo",
  "Nell",
  "Otis",
  "Pearl",
  "Quinn",
  "Reba",
  "Sid",
  "Tamsin",
  "Ulla",
  "Vern",
  "Wade",
  "Yara",
];
const LAST = [
  "Abernathy",
  "Brandt",
  "Calloway",
  "Dunmore",
  "Eastman",
  "Fairbanks",
  "Garrow",
  "Hensley",
  "Ingram",
  "Jessup",
  "Kettering",
  "Lunsford",
  "Merritt",
  "Norwood",
  "Ostrander",
  "Pruett",
  "Quill",
  "Rasmussen",
  "Stroud",
  "Tolliver",
  "Updike",
  "Vance",
  "Whitlock",
  "Yoder",
];
const TRADES = ["Hauling", "Farm Supply", "Speed Shop", "Off-Road", "Fleet Service", "Ag Repair", "Customs"];
const CARRIERS = ["Prairie Freight", "Plains Parcel", "Demo Freight"];
const CANCEL_REASONS = [
  "Customer sold the vehicle",
  "Customer found the shaft was not the problem",
  "Ordered twice by mistake",
  "Customer changed the axle; a new order will follow",
];
const REFUND_REASONS = ["Goodwill: pickup was a day late", "Customer supplied his own centre bolts"];

/** An invented customer name, e-mail and firm for index `i` (demo data). */
export function inventedCustomer(i: number, rnd: () => number) {
  const first = FIRST[i % FIRST.length]!;
  const last = LAST[(i * 5 + Math.floor(i / FIRST.length)) % LAST.length]!;
  const n = Math.floor(i / (FIRST.length * LAST.length));
  const name = `${first} ${last}${n ? ` ${romanish(n)}` : ""}`;
  return {
    name,
    email: `${first}.${last}${n ? n : ""}@customer.example`.toLowerCase(),
    phone: `555-${String(1000 + Math.floor(rnd() * 9000))}`,
    company: rnd() < 0.35 ? `${last} ${TRADES[i % TRADES.length]}` : null,
  };
}
const romanish = (n: number) => ["", "Jr.", "III", "IV", "V"][n] ?? `no. ${n + 1}`;

/** Inserts `count` invented phone customers; returns them for `generateShop`. */
export async function insertCustomers(
  db: ClientBase,
  count: number,
  now: Date,
  seed = 7,
  offset = 0,
): Promise<GenerateCustomer[]> {
  const rnd = randomSequence(seed);
  const rows: Row[] = [];
  const out: GenerateCustomer[] = [];
  for (let i = 0; i < count; i++) {
    const c = inventedCustomer(i + offset, rnd);
    const id = randomUUID();
    rows.push([
      id,
      c.name,
      c.email,
      c.phone,
      c.company,
      null,
      null,
      new Date(now.getTime() - (count - i) * HOUR),
    ]);
    out.push({ id, name: c.name, userId: null });
  }
  await insertRows(
    db,
    "customer",
    [
      col("id", "uuid"),
      col("name", "text"),
      col("email", "text"),
      col("phone", "text"),
      col("company", "text"),
      col("address_lines", "text"),
      col("user_id", "text"),
      col("created_at", "timestamptz"),
    ],
    rows,
  );
  return out;
}

/** In-limit values for a step's record sheet, in SI, with small spread (what a station would record). */
function passValues(spec: StepSpec, rnd: () => number, fulfilment: Fulfilment, serial: string): SiValues {
  const v: SiValues = {};
  for (const f of spec.fields) {
    if (f.type === "text") {
      if (f.key === "carrier") v[f.key] = CARRIERS[Math.floor(rnd() * CARRIERS.length)]!;
      else if (f.key === "trackingNumber")
        v[f.key] = `TRK-${serial.slice(-8)}-${Math.floor(rnd() * 900 + 100)}`;
      else if (f.key === "pickedUpBy") v[f.key] = fulfilment === "pickup" ? "Customer" : "Carrier";
      else v[f.key] = `L${Math.floor(rnd() * 90_000 + 10_000)}`;
    } else if (f.type === "confirm") v[f.key] = true;
    else if (f.type === "weights")
      v[f.key] =
        rnd() < 0.6
          ? [{ plane: "rear", massG: 6 + Math.round(rnd() * 20), angleDeg: Math.round(rnd() * 359) }]
          : [];
    else if (f.quantity === "speed") v[f.key] = 2400 + Math.round(rnd() * 4) * 100;
    else {
      const l = f.limit;
      if (!l) v[f.key] = 0;
      else if (l.nominal != null && l.max != null)
        v[f.key] = l.nominal + (rnd() - 0.5) * (l.max - l.nominal) * 0.8;
      else if (l.max != null) v[f.key] = (l.min ?? 0) + rnd() * (l.max - (l.min ?? 0)) * 0.7;
      else v[f.key] = l.min ?? 0;
    }
  }
  return v;
}

/** An out-of-limit submission run through the real measurement check: its SI values and failures. */
function holdValues(
  spec: StepSpec,
  pass: SiValues,
  units: "in" | "mm",
): { values: SiValues; failures: Failure[] } | null {
  const numeric = spec.fields.find((f) => f.type === "number" && f.limit?.max != null && !f.limit.angular);
  const confirm = spec.fields.find((f) => f.type === "confirm");
  if (!numeric && !confirm) return null;
  const input: Record<string, unknown> = {};
  for (const f of spec.fields) {
    const si = pass[f.key];
    if (f.type === "number") input[f.key] = fromSi(f.quantity, units, si as number);
    else if (f.type === "confirm") input[f.key] = si ? "yes" : "no";
    else if (f.type === "weights") input[f.key] = [];
    else input[f.key] = si;
  }
  if (numeric && numeric.type === "number" && numeric.limit?.max != null) {
    const over =
      numeric.limit.max +
      Math.max(Math.abs(numeric.limit.max - (numeric.limit.nominal ?? numeric.limit.min ?? 0)), 0.05) * 0.8;
    input[numeric.key] = fromSi(numeric.quantity, units, over);
  } else if (confirm) input[confirm.key] = "no";
  const checked = checkMeasurements(spec, input, units);
  return checked.outcome === "hold" ? { values: checked.values, failures: checked.failures } : null;
}

interface Plan {
  created: number;
  /** Hours to the first payment; null: never paid. */
  payH: number | null;
  releaseH: number;
  slow: number;
  /** Routing index of a hold per shaft (null: none) and hours until its rework passes (Infinity: still on hold). */
  hold: { step: number; reworkH: number } | null;
  cancel: { afterH: number; keepShare: number } | null;
  balanceH: number | null;
  refundAfterShip: boolean;
  shafts: number;
}

/** Draws what happens to one order (demo data; the mix is invented, not measured). */
function drawPlan(rnd: () => number, created: number, now: number): Plan {
  const ageH = (now - created) / HOUR;
  const r = rnd();
  const exp = (mean: number) => -Math.log(1 - rnd()) * mean;
  const plan: Plan = {
    created,
    payH: rnd() < 0.012 ? null : 0.2 + exp(18),
    releaseH: rnd() < 0.05 ? 6 + rnd() * 40 : 0.02,
    slow: r < 0.1 ? 2.2 + rnd() * 1.5 : 0.7 + rnd() * 0.6,
    hold:
      rnd() < 0.1 ? { step: Math.floor(rnd() * 4), reworkH: rnd() < 0.75 ? 6 + rnd() * 40 : Infinity } : null,
    cancel: rnd() < 0.045 ? { afterH: 1 + rnd() * 70, keepShare: rnd() < 0.6 ? 0 : 0.2 } : null,
    balanceH: rnd() < 0.94 ? 1 + exp(20) : null,
    refundAfterShip: rnd() < 0.03,
    shafts: rnd() < 0.55 ? 1 : rnd() < 0.75 ? 2 : 3,
  };
  // An order never paid is cancelled by the desk after ten days (common shop practice).
  if (plan.payH == null && !plan.cancel && ageH > 24 * 10) plan.cancel = { afterH: 24 * 10, keepShare: 0 };
  // Old orders were settled long ago: an endless hold only on recent ones.
  if (plan.hold && plan.hold.reworkH === Infinity && ageH > 24 * 21) plan.hold.reworkH = 30;
  return plan;
}

/** What the newest orders do in a showcase (by age: 0 = the newest). */
const SHOWCASE: Record<number, Partial<Plan>> = {
  // Paid, not yet released: the release sweep (lib/floor/release-sweep.ts) takes it to the shop
  // within a minute of the app starting, as it would an order whose automatic release went missing.
  0: { payH: 0.3, releaseH: 10_000, cancel: null },
  1: { payH: null, cancel: null }, // awaiting its deposit
  3: { payH: 0.3, releaseH: 0.02, cancel: null, hold: { step: 0, reworkH: Infinity }, slow: 0.2 }, // on hold at the saw
};

interface Sim {
  orderId: string;
  status: string;
}

/**
 * Writes `orders` orders (with everything that hangs off them) and returns what it wrote. Order
 * numbers and shaft serials continue from the highest already in the database for each year.
 */
export async function generateShop(db: ClientBase, opts: GenerateOptions): Promise<GenerateResult> {
  const now = (opts.now ?? new Date()).getTime();
  const rnd = randomSequence(opts.seed ?? 20_261_204);
  const shop = opts.shop;
  const book: PriceBook = shop.priceBook;
  const designs = demoDesigns(shop);
  const weeks = opts.weeks ?? Math.max(20, Math.ceil((opts.orders * 1.8) / 1500));
  const span = weeks * 7 * DAY;
  const withEvents = opts.events ?? true;
  const batch = opts.batch ?? 2_000;
  if (!opts.customers.length) throw new Error("generateShop needs at least one customer");

  await prepareTemp(db, designs);

  // Numbers and serials continue per year from what is there.
  const numberNext = new Map<string, number>();
  const serialNext = new Map<number, number>();
  const nextNumber = async (at: number) => {
    const yy = String(new Date(at).getUTCFullYear()).slice(2);
    const prefix = `Y${yy}-`;
    if (!numberNext.has(prefix)) {
      const { rows } = await db.query<{ n: number }>(
        `select coalesce(max(substring(number from ${prefix.length + 1})::int), 0) as n from shop_order where number like $1 and substring(number from ${prefix.length + 1}) ~ '^[0-9]+$'`,
        [`${prefix}%`],
      );
      numberNext.set(prefix, Number(rows[0]?.n ?? 0));
    }
    const n = numberNext.get(prefix)! + 1;
    numberNext.set(prefix, n);
    return `${prefix}${String(n).padStart(4, "0")}`;
  };
  const nextSerial = async (at: number) => {
    const year = new Date(at).getUTCFullYear();
    if (!serialNext.has(year)) {
      const { rows } = await db.query<{ n: number }>(
        "select coalesce(max(serial_sequence), 0) as n from work_order where serial_year = $1",
        [year],
      );
      serialNext.set(year, Number(rows[0]?.n ?? 0));
    }
    const n = serialNext.get(year)! + 1;
    serialNext.set(year, n);
    return { year, sequence: n, serial: formatSerial({ shopCode: shop.floor.shopCode, year, sequence: n }) };
  };

  // Creation times: spread over the span, a little busier lately, oldest first.
  const created: number[] = [];
  const recent = opts.recent ? Math.round(opts.orders * opts.recent.share) : 0;
  for (let i = 0; i < opts.orders; i++) {
    const u = Math.pow(rnd(), 0.85);
    created.push(i < recent ? now - HOUR - rnd() * opts.recent!.days * DAY : now - HOUR - (1 - u) * span);
  }
  created.sort((a, b) => a - b);

  const result: GenerateResult = {
    orders: 0,
    shafts: 0,
    workOrders: 0,
    steps: 0,
    stepRecords: 0,
    payments: 0,
    refunds: 0,
    events: 0,
    byStatus: {},
  };
  const staff = opts.staff;

  const emptyRows = (): BatchRows => ({
    orders: [],
    shafts: [],
    workOrders: [],
    steps: [],
    records: [],
    payments: [],
    refunds: [],
    events: [],
  });
  let rows = emptyRows();

  // One order, simulated from its plan up to now (closure over this batch's rows).
  async function simulateOrder(createdAt: number, showcase?: Partial<Plan>): Promise<Sim> {
    const plan = { ...drawPlan(rnd, createdAt, now), ...showcase };
    const customer = opts.customers[Math.floor(rnd() * opts.customers.length)]!;
    const online = customer.userId != null && rnd() < 0.7;
    const fulfilment: Fulfilment = rnd() < 0.45 ? "ship" : "pickup";
    const picked = Array.from({ length: plan.shafts }, () => designs[Math.floor(rnd() * designs.length)]!);
    const quote = quoteOrder(
      picked.map((d) => d.lines),
      fulfilment,
      book,
    );
    const orderId = randomUUID();
    const number = await nextNumber(createdAt);
    // Every order has its shafts from the moment it is placed (released or not, cancelled or not).
    const shaftIds = picked.map((d, p) => {
      const id = randomUUID();
      rows.shafts.push([id, orderId, p + 1, d.name, d.key]);
      return id;
    });
    const promised = addBusinessDays(new Date(createdAt), book.leadTimeWorkingDays)
      .toISOString()
      .slice(0, 10);
    const ev = (kind: string, label: string, at: number, pub = true, actor: string | null = null) => {
      if (withEvents && at <= now)
        rows.events.push([randomUUID(), orderId, kind, label, pub, actor, new Date(at)]);
    };
    ev(
      "received",
      `Order received (${plan.shafts} shaft${plan.shafts === 1 ? "" : "s"})`,
      createdAt,
      true,
      online ? customer.userId : staff.counterId,
    );

    let paid = 0;
    let refunded = 0;
    let status = "awaiting_payment";
    let updated = createdAt;
    const pay = (kind: PaymentKind, amount: number, at: number) => {
      const id = randomUUID();
      const payment: Row = [
        id,
        orderId,
        kind,
        amount,
        quote.currency,
        "succeeded",
        `cs_demo_${id.replaceAll("-", "")}`,
        "https://checkout.invalid/demo",
        `pi_demo_${id.replaceAll("-", "")}`,
        0,
        null,
        online ? null : staff.counterId,
        new Date(at - 10 * 60_000),
        new Date(at),
      ];
      rows.payments.push(payment);
      paid += amount;
      const what = kind === "deposit" ? "Deposit" : kind === "balance" ? "Balance" : "Payment";
      ev("paid", `${what} of ${formatMoney(amount, quote.currency)} received`, at);
      updated = Math.max(updated, at);
      return payment;
    };
    const refund = (payment: Row, amount: number, at: number, reason: string) => {
      if (amount <= 0) return;
      rows.refunds.push([
        randomUUID(),
        payment[0],
        amount,
        `re_demo_${randomUUID().replaceAll("-", "")}`,
        reason,
        staff.ownerId,
        new Date(at),
      ]);
      payment[9] = (payment[9] as number) + amount;
      refunded += amount;
      ev("refunded", `Refund of ${formatMoney(amount, quote.currency)}: ${reason}`, at);
      updated = Math.max(updated, at);
    };

    const payAt = plan.payH == null ? null : createdAt + plan.payH * HOUR;
    const cancelAt = plan.cancel ? createdAt + plan.cancel.afterH * HOUR : null;
    const firstKind = quote.dueNowCents >= quote.totalCents ? "full" : "deposit";
    let deposit: Row | null = null;
    let cancelled: { at: Date; reason: string } | null = null;
    let shippedAt: Date | null = null;

    if (cancelAt != null && cancelAt <= now) {
      // Cancelled before release: the deposit (if paid first) is refunded per the policy.
      if (payAt != null && payAt < cancelAt) {
        deposit = pay(firstKind, quote.dueNowCents, payAt);
        const keep = Math.round(quote.dueNowCents * plan.cancel!.keepShare);
        refund(
          deposit,
          quote.dueNowCents - keep,
          cancelAt + HOUR,
          keep ? "Order cancelled; the cancellation fee is kept" : "Order cancelled",
        );
      }
      status = "cancelled";
      cancelled = {
        at: new Date(cancelAt),
        reason: CANCEL_REASONS[Math.floor(rnd() * CANCEL_REASONS.length)]!,
      };
      ev("note", `Order cancelled: ${cancelled.reason}`, cancelAt, true, staff.counterId);
      updated = Math.max(updated, cancelAt);
    } else if (payAt != null && payAt <= now) {
      deposit = pay(firstKind, quote.dueNowCents, payAt);
      status = "received";
      const releaseAt = payAt + plan.releaseH * HOUR;
      if (releaseAt <= now) {
        status = "in_shop";
        ev("step", "Released to the shop", releaseAt, true, plan.releaseH > 1 ? staff.counterId : null);
        updated = Math.max(updated, releaseAt);
        const floor = await releaseShafts(releaseAt);
        if (floor.allInspected != null) {
          status = "ready";
          ev("ready", "Ready", floor.allInspected);
          const owed = quote.totalCents - paid;
          if (owed > 0 && plan.balanceH != null && floor.allInspected + plan.balanceH * HOUR <= now)
            pay("balance", owed, floor.allInspected + plan.balanceH * HOUR);
        }
        if (floor.allDispatched != null) {
          status = "shipped";
          shippedAt = new Date(floor.allDispatched);
          if (plan.refundAfterShip && paid > 0) {
            const at = floor.allDispatched + 3 * DAY;
            if (at <= now) {
              const target = rows.payments.filter((p) => p[1] === orderId).at(-1)!;
              refund(
                target,
                Math.min(Math.round(quote.totalCents * 0.1), (target[3] as number) - (target[9] as number)),
                at,
                REFUND_REASONS[Math.floor(rnd() * REFUND_REASONS.length)]!,
              );
            }
          }
        }
        updated = Math.max(updated, floor.last);
      }
    }

    const paymentState =
      refunded > 0
        ? refunded >= paid
          ? "refunded"
          : "partially_refunded"
        : paid >= quote.totalCents
          ? "paid"
          : paid > 0
            ? "deposit_paid"
            : "unpaid";
    rows.orders.push([
      orderId,
      number,
      customer.id,
      online ? customer.userId : staff.counterId,
      online ? "online" : "counter",
      status,
      paymentState,
      fulfilment,
      fulfilment === "ship"
        ? `${customer.name}\n${100 + Math.floor(rnd() * 8900)} County Road ${Math.floor(rnd() * 40) + 1}\nMillbrook, KS 67599`
        : null,
      quote.currency,
      quote.subtotalCents,
      quote.taxCents,
      quote.shippingCents,
      quote.totalCents,
      quote.dueNowCents,
      paid,
      refunded,
      promised,
      null,
      new Date(createdAt),
      new Date(Math.min(now, updated)),
      cancelled?.at ?? null,
      cancelled?.reason ?? null,
      shop.version,
      shippedAt,
    ]);
    return { orderId, status };

    /** Work orders for each shaft, steps signed off in order up to now. */
    async function releaseShafts(releaseAt: number) {
      let inspectedAll: number | null = 0;
      let dispatchedAll: number | null = 0;
      let last = releaseAt;
      for (let p = 0; p < picked.length; p++) {
        const d = picked[p]!;
        const shaftId = shaftIds[p]!;
        const woId = randomUUID();
        const serial = await nextSerial(releaseAt);
        const specs = d.steps[fulfilment];
        let t = releaseAt;
        let position = 1;
        let woState = "released";
        let inspected: number | null = null;
        let dispatched: number | null = null;
        for (const spec of specs) {
          const stepId = randomUUID();
          const mean = DEMO_STEP_HOURS[spec.kind] * plan.slow;
          const took = mean * (0.4 + rnd() * 1.2) * HOUR;
          let doneAt = t + took;
          const held = plan.hold && plan.hold.step === spec.position - 1 && (p === 0 || rnd() < 0.3);
          let holdAt: number | null = null;
          if (held) {
            holdAt = t + took * 0.6;
            doneAt = plan.hold!.reworkH === Infinity ? Infinity : doneAt + plan.hold!.reworkH * HOUR;
          }
          const pass = passValues(spec, rnd, fulfilment, serial.serial);
          if (holdAt != null && holdAt <= now) {
            const hv = holdValues(spec, pass, shop.floor.units);
            if (hv) {
              rows.records.push([
                randomUUID(),
                woId,
                stepId,
                1,
                staff.floorId,
                new Date(holdAt),
                JSON.stringify(hv.values),
                "hold",
                JSON.stringify(hv.failures),
                null,
                `demo:${randomUUID()}`,
                null,
              ]);
              ev(
                "note",
                `${serial.serial} on hold at ${spec.name}: ${hv.failures.map((f) => f.message).join("; ")}`,
                holdAt,
                false,
                staff.floorId,
              );
              last = Math.max(last, holdAt);
            } else holdAt = null;
          }
          if (doneAt <= now) {
            rows.steps.push([
              stepId,
              woId,
              1,
              spec.position,
              spec.code,
              d.key,
              fulfilment,
              "done",
              holdAt != null ? "rework" : "pass",
              new Date(doneAt),
              staff.floorId,
            ]);
            rows.records.push([
              randomUUID(),
              woId,
              stepId,
              1,
              staff.floorId,
              new Date(doneAt),
              JSON.stringify(pass),
              holdAt != null ? "rework" : "pass",
              null,
              null,
              `demo:${randomUUID()}`,
              stepId,
            ]);
            ev("step", `${serial.serial}: ${spec.name} done`, doneAt, true, staff.floorId);
            position = spec.position + 1;
            last = Math.max(last, doneAt);
            if (spec.kind === "final-inspection") inspected = doneAt;
            if (spec.kind === "dispatch") {
              dispatched = doneAt;
              const v = pass;
              ev(
                "shipped",
                fulfilment === "ship"
                  ? `${serial.serial} shipped: ${String(v.carrier)} ${String(v.trackingNumber)}`
                  : `${serial.serial} picked up by ${String(v.pickedUpBy)}`,
                doneAt,
              );
            }
            woState =
              dispatched != null
                ? fulfilment === "ship"
                  ? "shipped"
                  : "picked_up"
                : inspected != null
                  ? "ready"
                  : "in_shop";
            t = doneAt;
          } else {
            const onHold = holdAt != null && holdAt <= now && position === spec.position;
            rows.steps.push([
              stepId,
              woId,
              1,
              spec.position,
              spec.code,
              d.key,
              fulfilment,
              onHold ? "on_hold" : "pending",
              null,
              null,
              null,
            ]);
            if (onHold) woState = "on_hold";
            t = Infinity;
          }
        }
        rows.workOrders.push([
          woId,
          orderId,
          shaftId,
          serial.serial,
          serial.year,
          serial.sequence,
          1,
          woState,
          position,
          specs.length,
          plan.releaseH > 1 ? staff.counterId : null,
          plan.releaseH > 1 ? "Regular customer, released at the desk" : null,
          new Date(releaseAt),
          new Date(Math.min(now, last)),
        ]);
        inspectedAll = inspected == null || inspectedAll == null ? null : Math.max(inspectedAll, inspected);
        dispatchedAll =
          dispatched == null || dispatchedAll == null ? null : Math.max(dispatchedAll, dispatched);
      }
      return { allInspected: inspectedAll, allDispatched: dispatchedAll, last };
    }
  }

  for (let start = 0; start < opts.orders; start += batch) {
    rows = emptyRows();
    const end = Math.min(opts.orders, start + batch);
    for (let i = start; i < end; i++) {
      const sim = await simulateOrder(created[i]!, opts.showcase ? SHOWCASE[opts.orders - 1 - i] : undefined);
      result.byStatus[sim.status] = (result.byStatus[sim.status] ?? 0) + 1;
    }
    await writeBatch(db, rows);
    result.orders += end - start;
    result.shafts += rows.shafts.length;
    result.workOrders += rows.workOrders.length;
    result.steps += rows.steps.length;
    result.stepRecords += rows.records.length;
    result.payments += rows.payments.length;
    result.refunds += rows.refunds.length;
    result.events += rows.events.length;
    if (opts.commitEachBatch) {
      await db.query("commit");
      await db.query("begin");
    }
    opts.onBatch?.(end, opts.orders);
  }
  await db.query("drop table if exists demo_design; drop table if exists demo_spec");
  return result;
}

/** The designs and record sheets, sent once, joined by key on insert. */
async function prepareTemp(db: ClientBase, designs: DemoDesign[]): Promise<void> {
  await db.query(
    `drop table if exists demo_design; drop table if exists demo_spec;
     create temp table demo_design (key int primary key, application jsonb, design jsonb, evaluation jsonb, overall text, price_lines jsonb, price_cents int);
     create temp table demo_spec (key int, fulfilment text, position int, spec jsonb, primary key (key, fulfilment, position));`,
  );
  await insertRows(
    db,
    "demo_design",
    [
      col("key", "int4"),
      col("application", "text", "jsonb"),
      col("design", "text", "jsonb"),
      col("evaluation", "text", "jsonb"),
      col("overall", "text"),
      col("price_lines", "text", "jsonb"),
      col("price_cents", "int4"),
    ],
    designs.map((d) => [
      d.key,
      JSON.stringify(d.application),
      JSON.stringify(d.design),
      JSON.stringify(d.evaluation),
      d.overall,
      JSON.stringify(d.lines),
      d.priceCents,
    ]),
  );
  const specs: Row[] = [];
  for (const d of designs)
    for (const f of ["pickup", "ship"] as const)
      for (const s of d.steps[f]) specs.push([d.key, f, s.position, JSON.stringify(s)]);
  await insertRows(
    db,
    "demo_spec",
    [col("key", "int4"), col("fulfilment", "text"), col("position", "int4"), col("spec", "text", "jsonb")],
    specs,
  );
}

interface BatchRows {
  orders: Row[];
  shafts: Row[];
  workOrders: Row[];
  steps: Row[];
  records: Row[];
  payments: Row[];
  refunds: Row[];
  events: Row[];
}

async function writeBatch(db: ClientBase, rows: BatchRows): Promise<void> {
  await insertRows(
    db,
    "shop_order",
    [
      col("id", "uuid"),
      col("number", "text"),
      col("customer_id", "uuid"),
      col("placed_by_id", "text"),
      col("channel", "text", "order_channel"),
      col("status", "text", "order_status"),
      col("payment_state", "text", "payment_state"),
      col("fulfilment", "text", "fulfilment"),
      col("ship_to", "text"),
      col("currency", "text"),
      col("subtotal_cents", "int4"),
      col("tax_cents", "int4"),
      col("shipping_cents", "int4"),
      col("total_cents", "int4"),
      col("deposit_cents", "int4"),
      col("paid_cents", "int4"),
      col("refunded_cents", "int4"),
      col("promised_date", "date"),
      col("notes", "text"),
      col("created_at", "timestamptz"),
      col("updated_at", "timestamptz"),
      col("cancelled_at", "timestamptz"),
      col("cancel_reason", "text"),
      col("config_version", "int4"),
      col("shipped_at", "timestamptz"),
    ],
    rows.orders,
  );
  for (let s = 0; s < rows.shafts.length; s += 5_000) {
    const part = rows.shafts.slice(s, s + 5_000);
    await db.query(
      `insert into order_shaft (id, order_id, position, name, application, design, evaluation, overall, price_lines, price_cents)
       select u.id, u.order_id, u.position, u.name, d.application, d.design, d.evaluation, d.overall, d.price_lines, d.price_cents
       from unnest($1::uuid[], $2::uuid[], $3::int4[], $4::text[], $5::int4[]) as u(id, order_id, position, name, key)
       join demo_design d on d.key = u.key`,
      [0, 1, 2, 3, 4].map((i) => part.map((r) => r[i])),
    );
  }
  await insertRows(
    db,
    "work_order",
    [
      col("id", "uuid"),
      col("order_id", "uuid"),
      col("order_shaft_id", "uuid"),
      col("serial", "text"),
      col("serial_year", "int4"),
      col("serial_sequence", "int4"),
      col("revision", "int4"),
      col("state", "text", "work_order_state"),
      col("current_position", "int4"),
      col("step_count", "int4"),
      col("released_by_id", "text"),
      col("release_reason", "text"),
      col("created_at", "timestamptz"),
      col("updated_at", "timestamptz"),
    ],
    rows.workOrders,
  );
  for (let s = 0; s < rows.steps.length; s += 10_000) {
    const part = rows.steps.slice(s, s + 10_000);
    await db.query(
      `insert into work_order_step (id, work_order_id, revision, position, code, spec, state, completion, completed_at, completed_by_id)
       select u.id, u.wo, u.revision, u.position, u.code, d.spec, u.state::work_order_step_state, u.completion, u.completed_at, u.by
       from unnest($1::uuid[], $2::uuid[], $3::int4[], $4::int4[], $5::text[], $6::int4[], $7::text[], $8::text[], $9::text[], $10::timestamptz[], $11::text[])
         as u(id, wo, revision, position, code, key, fulfilment, state, completion, completed_at, by)
       join demo_spec d on d.key = u.key and d.fulfilment = u.fulfilment and d.position = u.position`,
      Array.from({ length: 11 }, (_, i) => part.map((r) => r[i] ?? null)),
    );
  }
  await insertRows(
    db,
    "step_record",
    [
      col("id", "uuid"),
      col("work_order_id", "uuid"),
      col("step_id", "uuid"),
      col("revision", "int4"),
      col("by_id", "text"),
      col("at", "timestamptz"),
      col("values", "text", "jsonb"),
      col("outcome", "text", "step_outcome"),
      col("failures", "text", "jsonb"),
      col("reason", "text"),
      col("idempotency_key", "text"),
      col("completion_of", "uuid"),
    ],
    rows.records,
    10_000,
  );
  await insertRows(
    db,
    "payment",
    [
      col("id", "uuid"),
      col("order_id", "uuid"),
      col("kind", "text", "payment_kind"),
      col("amount_cents", "int4"),
      col("currency", "text"),
      col("status", "text", "payment_status"),
      col("checkout_session_id", "text"),
      col("checkout_url", "text"),
      col("payment_intent_id", "text"),
      col("refunded_cents", "int4"),
      col("failure_message", "text"),
      col("requested_by_id", "text"),
      col("created_at", "timestamptz"),
      col("paid_at", "timestamptz"),
    ],
    rows.payments,
  );
  await insertRows(
    db,
    "refund",
    [
      col("id", "uuid"),
      col("payment_id", "uuid"),
      col("amount_cents", "int4"),
      col("provider_refund_id", "text"),
      col("reason", "text"),
      col("by_id", "text"),
      col("created_at", "timestamptz"),
    ],
    rows.refunds,
  );
  await insertRows(
    db,
    "order_event",
    [
      col("id", "uuid"),
      col("order_id", "uuid"),
      col("kind", "text"),
      col("label", "text"),
      col("public", "bool"),
      col("actor_id", "text"),
      col("at", "timestamptz"),
    ],
    rows.events,
    10_000,
  );
}
