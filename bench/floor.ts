/**
 * The floor service at the library level, on the bench database: signing off a step (submitStep,
 * one transaction with the row lock and the milestone hooks) and looking a shaft up by its serial
 * (asBuiltRecord), each beside a floor measured in the same run (an empty transaction / one
 * `select 1` through the same entity manager). Leaves one released shaft for the scan route bench.
 */
import "reflect-metadata";
import { randomUUID } from "node:crypto";
import { readFileSync } from "node:fs";
import { Customer, EmailMessage, Order, OrderShaft, User, WorkOrder } from "../entities";
import type { CurrentUser } from "../lib/auth/access";
import { getEm, getOrm, inTransaction } from "../lib/db/orm";
import { evaluateDesign, parseDesign } from "../lib/driveline";
import { asBuiltRecord } from "../lib/floor/queries";
import { releaseOrder, submitStep, travellerViewFor } from "../lib/floor/work-orders";
import { stopBoss } from "../lib/jobs/boss";
import { getShopEngineering } from "../lib/shop/config";
import type { StepSpec } from "../lib/traveller/steps";
import { fromSi, type FloorUnits } from "../lib/traveller/units";
import { addRow } from "./table";

const SHAFTS = 20;
const LOOKUPS = 200;
/** A sign-off is one short transaction; the scan station's budget is the route's p99 < 50 ms. */
const TARGET_SUBMIT_P50_MS = 25;

/** In-limit values for a step, in the shop's units (the middle of each limit). */
function inLimitValues(spec: StepSpec, units: FloorUnits): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const f of spec.fields) {
    if (f.type === "text") out[f.key] = `BENCH-${f.key}`;
    else if (f.type === "confirm") out[f.key] = true;
    else if (f.type === "weights") out[f.key] = [];
    else if (f.quantity === "speed") out[f.key] = 2500;
    else {
      const l = f.limit;
      const si =
        l?.nominal ??
        (l?.min != null && l.max != null ? (l.min + l.max) / 2 : l?.max != null ? l.max / 2 : 1);
      out[f.key] = fromSi(f.quantity, units, si);
    }
  }
  return out;
}

const pct = (xs: number[], p: number) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor((p / 100) * s.length))]!;
};

async function timed(fn: () => Promise<unknown>): Promise<number> {
  const t0 = performance.now();
  await fn();
  return performance.now() - t0;
}

async function userOf(role: "owner" | "floor"): Promise<CurrentUser> {
  const em = await getEm();
  const u =
    (await em.findOne(User, { role }, { orderBy: { createdAt: "asc" } })) ??
    em.create(User, {
      id: randomUUID(),
      name: `Bench ${role}`,
      email: `bench-${role}-${randomUUID().slice(0, 8)}@bench.example`,
      emailVerified: true,
      role,
      createdAt: new Date(),
      updatedAt: new Date(),
    });
  await em.flush();
  return { id: u.id, name: u.name, email: u.email, role };
}

/** An order of one README street-truck shaft, released by hand; its work order id. */
async function releasedShaft(owner: CurrentUser, customer: Customer, report: object): Promise<string> {
  const em = await getEm();
  const order = em.create(Order, {
    number: `B-${randomUUID().slice(0, 8)}`,
    customer: em.getReference(Customer, customer.id),
    channel: "counter",
    fulfilment: "pickup",
    currency: "USD",
    subtotalCents: 50_000,
    taxCents: 0,
    shippingCents: 0,
    totalCents: 50_000,
    depositCents: 25_000,
    promisedDate: "2026-12-24",
    createdAt: new Date(),
    updatedAt: new Date(),
  });
  em.create(OrderShaft, {
    order,
    position: 1,
    name: "Bench shaft",
    application: { description: "Bench (demo data)", use: "street" },
    design: {},
    evaluation: JSON.parse(JSON.stringify(report)) as Record<string, unknown>,
    overall: "pass",
    priceLines: [],
    priceCents: 50_000,
  });
  await em.flush();
  const released = await releaseOrder(order.id, owner, "bench");
  return released.workOrders[0]!.id;
}

/** Runs the floor bench; returns a step code of a released shaft for the scan route bench. */
export async function benchFloor(): Promise<{ scanCode: string } | null> {
  if (!process.env.DATABASE_URL) {
    console.log("\nfloor service: skipped (needs DATABASE_URL; run through `npm run bench`).");
    return null;
  }
  const parsed = parseDesign(JSON.parse(readFileSync("examples/street-truck.json", "utf8")));
  if (!parsed.ok) throw new Error("bad example");
  const report = evaluateDesign(parsed.design);
  const [owner, floor, { floor: settings }] = await Promise.all([
    userOf("owner"),
    userOf("floor"),
    getShopEngineering(),
  ]);
  const em = await getEm();
  const customer = em.create(Customer, {
    name: "Bench customer (demo data)",
    email: `bench-${randomUUID().slice(0, 8)}@bench.example`,
    createdAt: new Date(),
  });
  await em.flush();

  const woIds: string[] = [];
  for (let i = 0; i < SHAFTS + 1; i++) woIds.push(await releasedShaft(owner, customer, report));
  const scanWo = woIds.pop()!;

  // Warm-up: the floor's queries and a first transaction.
  for (let i = 0; i < 20; i++) await inTransaction((t) => t.execute("select 1"));
  const emptyTx: number[] = [];
  for (let i = 0; i < 100; i++) emptyTx.push(await timed(() => inTransaction((t) => t.execute("select 1"))));

  const submits: number[] = [];
  const serials: string[] = [];
  for (const id of woIds) {
    const view = await travellerViewFor((await getEm()).fork(), id);
    serials.push(view.serial);
    for (const step of view.steps) {
      const values = inLimitValues(step, settings.units);
      submits.push(await timed(() => submitStep(step.barcodeText, values, floor, randomUUID())));
    }
  }

  const selectOne: number[] = [];
  const lookups: number[] = [];
  for (let i = 0; i < LOOKUPS; i++) {
    const fork = (await getEm()).fork();
    selectOne.push(await timed(() => fork.execute("select 1")));
    const lookupEm = (await getEm()).fork();
    lookups.push(await timed(() => asBuiltRecord(lookupEm, serials[i % serials.length]!)));
  }

  const scanView = await travellerViewFor((await getEm()).fork(), scanWo);
  // The bench's own "ready" e-mails are not for delivery.
  const orderIds = (await (await getEm()).fork().find(WorkOrder, { id: { $in: woIds } })).map(
    (w) => w.order.id,
  );
  await (await getEm()).fork().nativeDelete(EmailMessage, { orderId: { $in: orderIds } });

  const ms = (xs: number[]) => `p50 ${pct(xs, 50).toFixed(1)} ms · p99 ${pct(xs, 99).toFixed(1)} ms`;
  const p50 = pct(submits, 50);
  console.log(`\nfloor service (library, one process, ${SHAFTS} shafts × ${submits.length / SHAFTS} steps)`);
  addRow({
    what: "submitStep: sign off one step (library)",
    figure: ms(submits),
    floor: `empty transaction: ${ms(emptyTx)}`,
    target: `p50 < ${TARGET_SUBMIT_P50_MS} ms`,
    met: p50 < TARGET_SUBMIT_P50_MS,
  });
  addRow({
    what: "asBuiltRecord: a shaft by its serial (library)",
    figure: ms(lookups),
    floor: `select 1: ${ms(selectOne)}`,
    target: "",
    met: null,
  });

  await stopBoss();
  await (await getOrm()).close();
  return { scanCode: scanView.steps[0]!.barcodeText };
}
