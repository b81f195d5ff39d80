import { describe, expect } from "vitest";
import { AuditEvent, EmailMessage, Order, OrderEvent, OrderShaft, Payment, WorkOrder } from "@/entities";
import type { CurrentUser } from "@/lib/auth/guard";
import { getEm } from "@/lib/db/orm";
import { releaseOrder, submitStep } from "@/lib/floor/work-orders";
import { startCheckout } from "@/lib/orders/payments";
import { placeOrder } from "@/lib/orders/place-order";
import { orderView, populateOrder } from "@/lib/orders/queries";
import { dbTest } from "../setup/db";
import { newCustomer, payWithCard, paymentsHarnessForFile, saveDesign } from "../setup/orders";
import { code, good, key, staff } from "./helpers";
import { shopToday } from "@/lib/shop/locale";

const harness = paymentsHarnessForFile();

async function placed(fulfilment: "ship" | "pickup" = "ship") {
  const { user, customer } = await newCustomer();
  const design = await saveDesign(customer, user.id);
  const order = await placeOrder(user, {
    designIds: [design.id],
    fulfilment,
    ...(fulfilment === "ship" ? { shipTo: "12 Prairie Road\nSalina KS 67401" } : {}),
  });
  return { user, order };
}

/** Pays the order's next payment (deposit, or balance) through the Stripe fake and its webhook. */
async function pay(orderId: string, user: CurrentUser, kind?: Payment["kind"]) {
  const payment = await startCheckout(orderId, user, kind);
  expect((await payWithCard(harness.fake, payment.checkoutSessionId, "4242424242424242")).status).toBe(200);
  expect(await harness.fake.idle(10_000)).toBe(true);
  return payment;
}

async function view(orderId: string, user: CurrentUser) {
  const em = (await getEm()).fork();
  const order = await em.findOneOrFail(Order, { id: orderId }, { populate: ["customer"] });
  return orderView(await populateOrder(em, order), user, await shopToday());
}

const mails = async (orderId: string, template: string) =>
  (await getEm()).fork().find(EmailMessage, { orderId, template });

describe("the floor wired to payments, the customer's e-mails and the order's status", () => {
  dbTest(
    "a deposit paid via the webhook releases the order; the routing through final inspection requests the balance and sends ready, then shipped",
    { timeout: 60_000 },
    async () => {
      const { user, order } = await placed("ship");
      await pay(order.id, user);

      const em = (await getEm()).fork();
      const [wo] = await em.find(WorkOrder, { order: order.id });
      expect(wo).toBeDefined();
      expect((await em.findOneOrFail(Order, { id: order.id })).status).toBe("in_shop");
      const release = await em.findOneOrFail(AuditEvent, { action: "order.release", subjectId: order.id });
      expect(release.actor).toBeNull(); // the automatic release, not a person
      expect((await view(order.id, user)).statusLabel).toBe("In the shop — step 1 of 6");

      const floor = await staff("floor");
      const counter = await staff("counter");
      const serial = wo!.serial;
      await submitStep(code(serial, "CUT"), good.CUT!, floor, key());
      await submitStep(code(serial, "WLD"), good.WLD!, floor, key());
      const held = await submitStep(code(serial, "RUN"), { ...good.RUN!, runoutMidMm: 0.05 }, floor, key());
      expect(held.outcome).toBe("hold");
      // The customer sees where the work is, never the hold; the desk sees the hold.
      const customerSees = await view(order.id, user);
      expect(customerSees.statusLabel).toBe("In the shop — step 3 of 6");
      expect(customerSees.onHold).toBe(false);
      expect(customerSees.asBuiltReady).toBe(false); // no certificate before final inspection
      expect(customerSees.events.some((e) => /hold/i.test(e.label))).toBe(false);
      const deskSees = await view(order.id, counter);
      expect(deskSees).toMatchObject({ statusLabel: "On hold — step 3 of 6", onHold: true });
      expect(deskSees.events.some((e) => e.label.includes("on hold at Straighten and runout"))).toBe(true);

      await submitStep(code(serial, "RUN"), good.RUN!, floor, key());
      await submitStep(code(serial, "BAL"), good.BAL!, floor, key());
      expect(await em.count(Payment, { order: order.id, kind: "balance" })).toBe(0);
      expect(await mails(order.id, "shaft-ready")).toHaveLength(0);

      await submitStep(code(serial, "FIN"), good.FIN!, floor, key());
      const fresh = await view(order.id, user);
      expect(fresh.status).toBe("ready");
      expect(fresh.statusLabel).toBe("Ready to ship");
      expect(fresh.asBuiltReady).toBe(true);
      const balance = await em.fork().find(Payment, { order: order.id, kind: "balance" });
      expect(balance).toHaveLength(1);
      expect(balance[0]).toMatchObject({
        status: "open",
        amountCents: order.totalCents - order.depositCents,
      });
      expect((await mails(order.id, "balance-due")).map((m) => m.text).join()).toContain(
        balance[0]!.checkoutUrl,
      );
      const ready = await mails(order.id, "shaft-ready");
      expect(ready).toHaveLength(1);
      expect(ready[0]!.to).toBe(user.email);
      expect(ready[0]!.text).toContain("Left to pay");

      await submitStep(
        code(serial, "SHP"),
        { carrier: "Prairie Freight (demo)", trackingNumber: "PF-DEMO-55107" },
        floor,
        key(),
      );
      const shipped = await mails(order.id, "shaft-shipped");
      expect(shipped).toHaveLength(1);
      expect(shipped[0]!.text).toContain("PF-DEMO-55107");
      expect(shipped[0]!.text).toContain("Prairie Freight (demo)");
      expect(shipped[0]!.subject).toBe(`Order ${order.number} has shipped`);

      const done = await view(order.id, user);
      expect(done).toMatchObject({ status: "shipped", statusLabel: "Shipped" });
      const labels = done.events.map((e) => e.label);
      for (const step of [
        "Cut tube",
        "Weld and phase",
        "Straighten and runout",
        "Balance",
        "Final inspection",
        "Pack and ship",
      ])
        expect(labels).toContain(`${serial}: ${step} done`);
      expect(labels.some((l) => /hold|rework|concession/i.test(l))).toBe(false);
    },
  );

  dbTest(
    "paid in full before final inspection: nothing is requested; a pickup order ends picked up",
    { timeout: 60_000 },
    async () => {
      const { user, order } = await placed("pickup");
      await pay(order.id, user);
      await pay(order.id, user, "balance");
      const em = (await getEm()).fork();
      expect((await em.findOneOrFail(Order, { id: order.id })).paymentState).toBe("paid");
      // The balance payment did not release the order a second time.
      const wos = await em.find(WorkOrder, { order: order.id });
      expect(wos).toHaveLength(1);
      const floor = await staff("floor");
      const serial = wos[0]!.serial;
      for (const step of ["CUT", "WLD", "RUN", "BAL", "FIN"])
        await submitStep(code(serial, step), good[step]!, floor, key());
      expect(await em.fork().count(Payment, { order: order.id })).toBe(2); // deposit and balance only
      expect(await mails(order.id, "balance-due")).toHaveLength(0);
      const ready = await mails(order.id, "shaft-ready");
      expect(ready).toHaveLength(1);
      expect(ready[0]!.text).not.toContain("Left to pay");
      expect(ready[0]!.text).toContain("pick them up");
      expect((await view(order.id, user)).statusLabel).toBe("Ready for pickup");

      await submitStep(code(serial, "SHP"), { pickedUpBy: "Bea Buyer" }, floor, key());
      expect(await mails(order.id, "shaft-shipped")).toHaveLength(0);
      const done = await view(order.id, user);
      expect(done).toMatchObject({ status: "shipped", statusLabel: "Picked up" });
      expect(done.events.map((e) => e.label)).toContain(`${serial} picked up by Bea Buyer`);
    },
  );

  dbTest("an order released by hand before its deposit is paid is not released again", async () => {
    const { user, order } = await placed("pickup");
    await releaseOrder(order.id, await staff("counter"), "Fleet customer, long-standing account");
    await pay(order.id, user);
    const em = (await getEm()).fork();
    expect(await em.count(WorkOrder, { order: order.id })).toBe(1);
    const after = await em.findOneOrFail(Order, { id: order.id });
    expect(after).toMatchObject({ paymentState: "deposit_paid", paidCents: order.depositCents });
    expect(
      await em.count(OrderEvent, { order: order.id, label: { $like: "%automatic release%failed%" } }),
    ).toBe(0);
  });

  dbTest(
    "a release that fails after the deposit leaves the payment standing and a note for the desk",
    async () => {
      const { user, order } = await placed("pickup");
      // A frozen evaluation the routing cannot read: deriving the steps throws inside the release.
      const em = (await getEm()).fork();
      await em.nativeUpdate(OrderShaft, { order: order.id }, { evaluation: { broken: true } });
      await pay(order.id, user);
      const fresh = (await getEm()).fork();
      expect(await fresh.findOneOrFail(Order, { id: order.id })).toMatchObject({
        paymentState: "deposit_paid",
        paidCents: order.depositCents,
        status: "received",
      });
      expect(await fresh.count(WorkOrder, { order: order.id })).toBe(0);
      const note = await fresh.findOneOrFail(OrderEvent, { order: order.id, kind: "note", public: false });
      expect(note.label).toContain("automatic release to the shop failed");
      expect(await mails(order.id, "payment-receipt")).toHaveLength(1);
    },
  );
});
