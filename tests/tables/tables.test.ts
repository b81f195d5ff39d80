import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect } from "vitest";
import { NextRequest } from "next/server";
import { GET as exportGet } from "@/app/api/exports/[table]/route";
import { GET as tableGet } from "@/app/api/tables/[table]/route";
import { Customer, Order } from "@/entities";
import type { OrderStatus, PaymentState } from "@/lib/orders/states";
import { getEm } from "@/lib/db/orm";
import { releaseOrder, submitStep } from "@/lib/floor/work-orders";
import { createStaffUser } from "@/lib/users/staff";
import { parseTableQuery } from "@/lib/tables/params";
import { orderTablePage } from "@/lib/tables/orders";
import { listOrdersQuerySchema } from "@/lib/tables/orders-spec";
import { customerTablePage } from "@/lib/tables/customers";
import { listCustomersQuerySchema } from "@/lib/tables/customers-spec";
import { shaftTablePage } from "@/lib/tables/shafts";
import { listShaftsQuerySchema } from "@/lib/tables/shafts-spec";
import { stepTablePage } from "@/lib/tables/steps";
import { shopToday } from "@/lib/shop/locale";
import { listStepsQuerySchema } from "@/lib/tables/steps-spec";
import { authRequest, sessionCookie, signUpVerified, uniqueEmail } from "../setup/auth-requests";
import { dbTest, requireDatabase } from "../setup/db";
import { code, good, key, paidOrder, staff } from "../floor/helpers";
import { readCsv } from "./csv-read";

const BASE = "http://127.0.0.1";
const TODAY = "2026-06-15"; // a fixed "today" for the late rule (demo data)
const tag = `tbl${randomUUID().slice(0, 6)}`;

/** Known orders (demo data): number suffix, status, payment, channel, promised date, total. */
const KNOWN: [string, OrderStatus, PaymentState, "online" | "counter", string, number][] = [
  ["01", "received", "deposit_paid", "online", "2026-06-01", 120_000], // late
  ["02", "in_shop", "deposit_paid", "counter", "2026-06-14", 95_000], // late
  ["03", "shipped", "paid", "online", "2026-05-01", 80_000], // shipped: never late
  ["04", "cancelled", "refunded", "counter", "2026-05-02", 70_000], // cancelled: never late
  ["05", "awaiting_payment", "unpaid", "online", "2026-06-15", 60_000], // due today: not late
  ["06", "ready", "paid", "counter", "2026-07-01", 150_000],
];

const q = (search: string) => parseTableQuery(listOrdersQuerySchema, new URLSearchParams(search)).query;
const numbers = (rows: { number: string }[]) => rows.map((r) => r.number);

async function cookieFor(role: "owner" | "counter" | "floor") {
  const email = `tables-${role}-${randomUUID().slice(0, 8)}@test.example`;
  await createStaffUser({ name: `Tables ${role}`, email, role, password: "a-long-password-1" }, null);
  return sessionCookie(await authRequest("/sign-in/email", { email, password: "a-long-password-1" }));
}

const call = (handler: typeof exportGet, table: string, search: string, cookie?: string) =>
  handler(new NextRequest(`${BASE}/api/x/${table}?${search}`, { headers: cookie ? { cookie } : {} }), {
    params: Promise.resolve({ table }),
  });

describe("the staff tables on known data", () => {
  let customerName = "";
  beforeAll(async () => {
    requireDatabase();
    const em = await getEm();
    const customer = em.create(Customer, {
      name: `Ada ${tag}`,
      email: `ada-${tag}@test.example`,
      company: `Gearworks ${tag}`,
      phone: "555-0142",
      createdAt: new Date(),
    });
    customerName = customer.name;
    KNOWN.forEach(([n, status, paymentState, channel, promisedDate, totalCents], i) =>
      em.create(Order, {
        number: `${tag}-${n}`,
        customer,
        channel,
        status,
        paymentState,
        fulfilment: "pickup",
        currency: "USD",
        subtotalCents: totalCents,
        taxCents: 0,
        shippingCents: 0,
        totalCents,
        depositCents: Math.round(totalCents / 2),
        paidCents: paymentState === "paid" ? totalCents : paymentState === "unpaid" ? 0 : totalCents / 2,
        refundedCents: paymentState === "refunded" ? totalCents / 2 : 0,
        promisedDate,
        createdAt: new Date(Date.UTC(2026, 0, 1 + i)),
        updatedAt: new Date(),
      }),
    );
    // 30 more open orders, promised in the future, for paging (demo data).
    for (let i = 0; i < 30; i++)
      em.create(Order, {
        number: `${tag}-p${String(i).padStart(2, "0")}`,
        customer,
        channel: "online",
        fulfilment: "ship",
        currency: "USD",
        subtotalCents: 1000 + i,
        taxCents: 0,
        shippingCents: 0,
        totalCents: 1000 + i,
        depositCents: 500,
        promisedDate: "2026-09-01",
        createdAt: new Date(Date.UTC(2026, 1, 1 + i)),
        updatedAt: new Date(),
      });
    await em.flush();
  });

  dbTest("late: promised before today and not shipped or cancelled", async () => {
    const page = await orderTablePage(await getEm(), q(`q=${tag}&late=1&sort=promised&dir=asc`), {
      today: TODAY,
    });
    expect(numbers(page.rows)).toEqual([`${tag}-01`, `${tag}-02`]);
    expect(page.total).toBe(2);
    expect(page.rows.every((r) => r.late)).toBe(true);
    // The creation instant comes back as ISO 8601 in UTC, to the millisecond, as it was stored.
    const created = new Map(
      KNOWN.map(([n], i) => [`${tag}-${n}`, new Date(Date.UTC(2026, 0, 1 + i)).toISOString()]),
    );
    for (const row of page.rows) expect(row.createdAt).toBe(created.get(row.number));
  });

  dbTest("status, payment, channel, promised range and the search each narrow the rows", async () => {
    const em = await getEm();
    const nums = async (s: string) =>
      numbers(
        (await orderTablePage(em, q(`q=${tag}&size=100&sort=number&dir=asc&${s}`), { today: TODAY })).rows,
      );
    expect(await nums("status=shipped")).toEqual([`${tag}-03`]);
    expect(await nums("payment=paid")).toEqual([`${tag}-03`, `${tag}-06`]);
    expect(await nums("channel=counter")).toEqual([`${tag}-02`, `${tag}-04`, `${tag}-06`]);
    expect(await nums("from=2026-06-01&to=2026-06-15")).toEqual([`${tag}-01`, `${tag}-02`, `${tag}-05`]);
    expect((await nums("status=open")).length).toBe(4 + 30);
    // The search finds the order number, the customer's name, e-mail, company and phone (any capitals;
    // the customer's words are one text, so the company runs on into the phone).
    expect(await nums("")).toHaveLength(36);
    for (const text of [`Ada ${tag}`, `ada-${tag}@test`, `GEARWORKS ${tag}`, `gearworks ${tag} 555-0142`])
      expect(
        numbers((await orderTablePage(em, q(`q=${encodeURIComponent(text)}&size=100`))).rows),
      ).toHaveLength(36);
    expect(numbers((await orderTablePage(em, q(`q=${tag}-06`))).rows)).toEqual([`${tag}-06`]);
  });

  dbTest("sorting by total both ways, and pages of 25 that add up", async () => {
    const em = await getEm();
    const byTotal = await orderTablePage(
      em,
      q(`q=${tag}&status=shipped,cancelled&sort=total&dir=desc&payment=paid`),
    );
    // `status` takes one value: the list is dropped (and named), the payment filter still applies.
    expect(numbers(byTotal.rows)).toEqual([`${tag}-06`, `${tag}-03`]);
    const desc = await orderTablePage(em, q(`q=${tag}&sort=total&dir=desc&size=25`));
    expect(numbers(desc.rows).slice(0, 3)).toEqual([`${tag}-06`, `${tag}-01`, `${tag}-02`]);
    expect(desc.total).toBe(36);
    const asc = await orderTablePage(em, q(`q=${tag}&sort=total&dir=asc&size=25`));
    expect(numbers(asc.rows).slice(0, 2)).toEqual([`${tag}-p00`, `${tag}-p01`]);
    const second = await orderTablePage(em, q(`q=${tag}&sort=total&dir=asc&size=25&page=2`));
    expect(second.rows).toHaveLength(11);
    expect(second.total).toBe(36);
    expect(new Set([...numbers(asc.rows), ...numbers(second.rows)]).size).toBe(36);
    // Past the last page: no rows, the count still right.
    const past = await orderTablePage(em, q(`q=${tag}&size=25&page=9`));
    expect(past).toEqual({ rows: [], total: 36 });
    // Balance due = total − paid: order 05 owes all of its 600.00, order 01 half of its 1,200.00 —
    // a tie at the top (broken by id, so in either order); the rest owe less.
    const balance = await orderTablePage(em, q(`q=${tag}&sort=balance&dir=desc&size=25`));
    const top = balance.rows.slice(0, 2);
    expect(numbers(top).sort()).toEqual([`${tag}-01`, `${tag}-05`]);
    expect(top.map((r) => r.balanceCents)).toEqual([60_000, 60_000]);
    expect(balance.rows[2]!.balanceCents).toBeLessThan(60_000);
  });

  dbTest(
    "sorting by the customer's name (any capitals), each row with its own customer, across pages",
    async () => {
      // Two customers of their own (demo data), so the other tests' counts stay as they are.
      const other = `srt${randomUUID().slice(0, 6)}`;
      const em = await getEm();
      const [bea, abe] = ["Bea", "abe"].map((first) =>
        em.create(Customer, {
          name: `${first} ${other}`,
          email: `${first.toLowerCase()}-${other}@test.example`,
          company: first === "Bea" ? `Bea Haulage ${other}` : null,
          createdAt: new Date(),
        }),
      );
      for (const [customer, n] of [
        [bea!, "1"],
        [abe!, "2"],
        [bea!, "3"],
      ] as const)
        em.create(Order, {
          number: `${other}-${n}`,
          customer,
          channel: "online",
          fulfilment: "pickup",
          currency: "USD",
          subtotalCents: 5_000,
          taxCents: 0,
          shippingCents: 0,
          totalCents: 5_000,
          depositCents: 2_500,
          promisedDate: "2026-09-01",
          createdAt: new Date(),
          updatedAt: new Date(),
        });
      await em.flush();
      const page = await orderTablePage(em, q(`q=${other}&sort=customer&dir=asc&size=25`));
      expect(page.total).toBe(3);
      // "abe" before "Bea": the sort ignores capitals.
      expect(page.rows.map((r) => r.customerName)).toEqual([`abe ${other}`, `Bea ${other}`, `Bea ${other}`]);
      expect(page.rows[0]).toMatchObject({
        number: `${other}-2`,
        customerEmail: `abe-${other}@test.example`,
        customerCompany: null,
      });
      expect(page.rows[1]).toMatchObject({ customerCompany: `Bea Haulage ${other}` });
      const desc = await orderTablePage(em, q(`q=${other}&sort=customer&dir=desc`), { limit: 2, offset: 2 });
      expect(desc).toMatchObject({ total: 3, rows: [{ number: `${other}-2` }] });
      // Found by the company of one customer only.
      expect(
        numbers((await orderTablePage(em, q(`q=bea%20haulage%20${other}&sort=number&dir=asc`))).rows),
      ).toEqual([`${other}-1`, `${other}-3`]);
    },
  );

  dbTest("customers: found by name, company, e-mail and phone digits, with their order counts", async () => {
    const em = await getEm();
    for (const text of [`ada ${tag}`, `gearworks ${tag}`, `ada-${tag}`]) {
      const page = await customerTablePage(em, parseTableQuery(listCustomersQuerySchema, { q: text }).query);
      expect(page.rows.map((r) => r.name)).toEqual([customerName]);
      expect(page.rows[0]).toMatchObject({
        orderCount: 36,
        openOrderCount: 34,
        hasAccount: false,
        phone: "555-0142",
      });
    }
    const byDigits = await customerTablePage(
      em,
      parseTableQuery(listCustomersQuerySchema, { q: "5550142" }).query,
    );
    expect(byDigits.rows.map((r) => r.name)).toContain(customerName);
  });

  dbTest(
    "CSV export: the same rows, in the same order, as the page query for the same parameters",
    { timeout: 60_000 },
    async () => {
      const counter = await cookieFor("counter");
      const search = `q=${tag}&sort=promised&dir=asc&size=25&hide=email,company`;
      const res = await call(exportGet, "orders", search, counter);
      expect(res.status).toBe(200);
      expect(res.headers.get("content-type")).toMatch(/^text\/csv/);
      expect(res.headers.get("content-disposition")).toMatch(
        /attachment; filename="orders-\d{4}-\d{2}-\d{2}\.csv"/,
      );
      const [header, ...rows] = readCsv(await res.text());
      expect(header).toEqual([
        "Order",
        "Customer",
        "Shafts",
        "Status",
        "Payment",
        "Channel",
        "Total",
        "Balance due",
        "Currency",
        "Placed",
        "Promised",
        "Late",
      ]);
      // Every matching row (36), not just the first page of 25, in the page's order.
      const em = await getEm();
      const first = await orderTablePage(em, q(search));
      const second = await orderTablePage(em, q(`${search}&page=2`));
      expect(rows.map((r) => r[0])).toEqual(numbers([...first.rows, ...second.rows]));
      expect(rows).toHaveLength(36);
      const six = rows.find((r) => r[0] === `${tag}-06`)!;
      expect(six.slice(1, 8)).toEqual([
        `Ada ${tag}`,
        "",
        "Ready for pickup",
        "Paid in full",
        "Counter",
        "1500.00",
        "0.00",
      ]);
    },
  );

  dbTest("a formula typed as a customer's name is exported as text", async () => {
    const em = await getEm();
    const evil = em.create(Customer, {
      name: `=HYPERLINK("http://evil.example","${tag}x")`,
      email: `evil-${tag}@test.example`,
      createdAt: new Date(),
    });
    await em.flush();
    const res = await call(exportGet, "customers", `q=${tag}x`, await cookieFor("counter"));
    const [, row] = readCsv(await res.text());
    expect(row?.[0]).toBe(`'${evil.name}`);
  });

  dbTest(
    "bad parameters: the page falls back, the export and JSON answer 422 naming each field",
    async () => {
      const counter = await cookieFor("counter");
      for (const handler of [exportGet, tableGet]) {
        const res = await call(handler, "orders", "sort=drop%20table&page=0&from=2026-13-01", counter);
        expect(res.status).toBe(422);
        const body = (await res.json()) as { error: { code: string; fields: Record<string, string> } };
        expect(body.error.code).toBe("invalid");
        expect(Object.keys(body.error.fields).sort()).toEqual(["from", "page", "sort"]);
      }
      expect((await call(exportGet, "invoices", "", counter)).status).toBe(404);
      const ok = await call(tableGet, "orders", `q=${tag}&late=1`, counter);
      expect(ok.status).toBe(200);
    },
  );

  dbTest(
    "who may see which table: anonymous 401; customer and floor 403; counter the desk's tables only",
    { timeout: 60_000 },
    async () => {
      const email = uniqueEmail("tables-buyer");
      const customer = await signUpVerified({ name: "Tia Buyer", email, password: "a-long-password-1" });
      const [floor, counter, owner] = [
        await cookieFor("floor"),
        await cookieFor("counter"),
        await cookieFor("owner"),
      ];
      const expected: Record<string, [string | undefined, number][]> = {
        orders: [
          [undefined, 401],
          [customer, 403],
          [floor, 403],
          [counter, 200],
          [owner, 200],
        ],
        customers: [
          [undefined, 401],
          [customer, 403],
          [floor, 403],
          [counter, 200],
          [owner, 200],
        ],
        shafts: [
          [undefined, 401],
          [customer, 403],
          [floor, 403],
          [counter, 403],
          [owner, 200],
        ],
        steps: [
          [undefined, 401],
          [customer, 403],
          [floor, 403],
          [counter, 403],
          [owner, 200],
        ],
      };
      for (const [table, cases] of Object.entries(expected))
        for (const [cookie, status] of cases)
          for (const handler of [exportGet, tableGet]) {
            const res = await call(handler, table, "", cookie);
            expect(`${table} ${res.status}`).toBe(`${table} ${status}`);
            await res.body?.cancel();
          }
    },
  );

  dbTest(
    "shafts and step records: current step, hold, tube; who signed what, filtered by step, result and user",
    { timeout: 60_000 },
    async () => {
      const order = await paidOrder();
      const [wo] = (await releaseOrder(order.id, await staff("counter"))).workOrders;
      const serial = wo!.serial;
      const floor = await staff("floor");
      await submitStep(code(serial, "CUT"), good.CUT!, floor, key());
      await submitStep(code(serial, "WLD"), good.WLD!, floor, key());
      // Out-of-limit runout: a hold at RUN.
      await submitStep(code(serial, "RUN"), { ...good.RUN!, runoutFrontMm: 0.02 }, floor, key());
      const em = await getEm();

      const shafts = await shaftTablePage(em, parseTableQuery(listShaftsQuerySchema, { q: serial }).query);
      expect(shafts.total).toBe(1);
      expect(shafts.rows[0]).toMatchObject({
        serial,
        orderNumber: order.number,
        state: "on_hold",
        stepCode: "RUN",
        stepName: "Straighten and runout",
        position: 3,
        stepCount: 6,
        onHold: true,
        holdStep: "Straighten and runout",
      });
      expect(shafts.rows[0]!.tube).toMatch(/^YL-T-DOM-3500-083 \(88\.9 × 2\.11 mm\)$/); // README street truck
      const held = await shaftTablePage(
        em,
        parseTableQuery(listShaftsQuerySchema, { hold: "1", step: "run", size: "100" }).query,
      );
      expect(held.rows.map((r) => r.serial)).toContain(serial);
      const cut = await shaftTablePage(
        em,
        parseTableQuery(listShaftsQuerySchema, { q: serial, step: "CUT" }).query,
      );
      expect(cut.total).toBe(0);

      // The hold shows on the orders table too.
      const orders = await orderTablePage(em, q(`q=${order.number}&hold=1`));
      expect(orders.rows[0]).toMatchObject({
        number: order.number,
        onHold: true,
        statusLabel: "On hold — step 3 of 6",
      });

      const steps = (s: Record<string, string>) =>
        stepTablePage(em, parseTableQuery(listStepsQuerySchema, { user: floor.id, ...s }).query);
      const all = await steps({ sort: "at", dir: "asc" });
      expect(all.rows.map((r) => `${r.stepCode} ${r.outcome} ${r.byName}`)).toEqual([
        "CUT pass Test floor",
        "WLD pass Test floor",
        "RUN hold Test floor",
      ]);
      expect(all.rows[2]!.notes).toMatch(/runout/i);
      expect((await steps({ result: "hold" })).rows.map((r) => r.stepCode)).toEqual(["RUN"]);
      expect((await steps({ step: "WLD" })).rows.map((r) => r.stepCode)).toEqual(["WLD"]);
      expect((await steps({ from: "2000-01-01", to: "2000-12-31" })).total).toBe(0);
      const today = await shopToday();
      expect((await steps({ from: today, to: today })).total).toBe(3);
      // Days are the shop's (America/Chicago by default), not UTC's: 03:30 UTC on 10 March 2026 is
      // 22:30 on the 9th in Chicago (CDT, UTC−5, from 8 March 2026 — the IANA tz database).
      await em
        .getConnection()
        .execute(`update step_record set at = '2026-03-10T03:30:00Z' where id = ?`, [all.rows[0]!.id]);
      expect((await steps({ from: "2026-03-09", to: "2026-03-09" })).rows.map((r) => r.stepCode)).toEqual([
        "CUT",
      ]);
      expect((await steps({ from: "2026-03-10", to: "2026-03-10" })).total).toBe(0);
    },
  );
});
