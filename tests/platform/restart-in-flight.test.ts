/**
 * PostgreSQL restarted while scans, payment events and orders are in flight: every call either
 * completes (and its work is there after the restart) or fails as "unavailable" (503 at the
 * handlers, see knownError) having changed nothing; the app recovers by itself, and sending the
 * failed ones again (same idempotency keys and event ids) records each exactly once.
 * A cluster of its own, stopped and started by scripts/pg.sh, as in database-recovery.test.ts.
 */
import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect } from "vitest";
import { clusterForFile, pg } from "../setup/cluster";
import { dbTest } from "../setup/db";
import { migrateWithCli } from "../setup/global-setup";

const password = "restart-test-pw";

type Outcome = { ok: true } | { ok: false; code: string | undefined; message: string };

describe("a database restart in the middle of use", () => {
  const cluster = clusterForFile("restart", password);
  beforeAll(async () => {
    await cluster.up();
    migrateWithCli(cluster.url);
  }, 120_000);

  dbTest(
    "no acknowledged scan, payment event or order is lost, and the failed ones apply once when sent again",
    { timeout: 240_000 },
    async () => {
      const { getEm } = await import("@/lib/db/orm");
      const { Order, Payment, StepRecord, WebhookEvent } = await import("@/entities");
      const { releaseOrder, submitStep } = await import("@/lib/floor/work-orders");
      const { applyPaymentEvent } = await import("@/lib/orders/payments");
      const { placeOrder } = await import("@/lib/orders/place-order");
      const { knownError } = await import("@/lib/http/known-errors");
      const { AppError } = await import("@/lib/http/errors");
      const { code, good, paidOrder, staff } = await import("../floor/helpers");
      const { newCustomer, saveDesign } = await import("../setup/orders");

      // Work to do: 6 released shafts (their cut step), 6 open checkouts, orders from one design.
      const floor = await staff("floor");
      const counter = await staff("counter");
      const serials: string[] = [];
      const payments: { id: string; sessionId: string; amountCents: number }[] = [];
      for (let i = 0; i < 6; i++) {
        const order = await paidOrder();
        serials.push((await releaseOrder(order.id, counter)).workOrders[0]!.serial);
        const em = await getEm();
        const unpaid = await paidOrder({ paymentState: "unpaid" });
        const sessionId = `cs_restart_${randomUUID()}`;
        const p = em.create(Payment, {
          order: unpaid,
          kind: "deposit",
          amountCents: unpaid.depositCents,
          currency: unpaid.currency,
          checkoutSessionId: sessionId,
          checkoutUrl: `http://127.0.0.1/pay/${sessionId}`,
          createdAt: new Date(),
        });
        await em.flush();
        payments.push({ id: p.id, sessionId: p.checkoutSessionId!, amountCents: p.amountCents });
      }
      const { user, customer } = await newCustomer();
      const design = await saveDesign(customer, user.id);

      const outcome = async (fn: () => Promise<unknown>): Promise<Outcome> => {
        try {
          await fn();
          return { ok: true };
        } catch (error) {
          const app = error instanceof AppError ? error : knownError(error);
          return { ok: false, code: app?.code, message: String(error) };
        }
      };
      const scans = serials.map((serial) => ({ code: code(serial, "CUT"), key: randomUUID() }));
      const events = payments.map((p) => ({
        id: `evt_restart_${randomUUID()}`,
        type: "checkout.session.completed" as const,
        sessionId: p.sessionId,
        paymentIntentId: `pi_${p.sessionId}`,
        amountCents: p.amountCents,
        paid: true,
        raw: {},
      }));

      // In flight: one of each every 150 ms while the cluster is restarted underneath.
      const results: { kind: string; index: number; result: Outcome }[] = [];
      let ordersPlaced = 0;
      const work = (async () => {
        for (let i = 0; i < 6; i++) {
          const [s, e, o] = await Promise.all([
            outcome(() => submitStep(scans[i]!.code, good.CUT!, floor, scans[i]!.key)),
            outcome(() => applyPaymentEvent(events[i]!)),
            outcome(() => placeOrder(user, { designIds: [design.id], fulfilment: "pickup" })),
          ]);
          results.push({ kind: "scan", index: i, result: s });
          results.push({ kind: "payment", index: i, result: e });
          results.push({ kind: "order", index: i, result: o });
          if (o.ok) ordersPlaced++;
          await new Promise((r) => setTimeout(r, 150));
        }
      })();
      await new Promise((r) => setTimeout(r, 200));
      await pg("pg_down", cluster.pgDir);
      await new Promise((r) => setTimeout(r, 600));
      await cluster.up();
      await work;

      // Every failure says the database is unavailable (a 503 the page shows), never anything else.
      const failed = results.filter((r) => !r.result.ok);
      for (const f of failed)
        expect(
          f.result.ok ? null : f.result.code,
          `${f.kind} ${f.index}: ${f.result.ok ? "" : f.result.message}`,
        ).toBe("unavailable");
      expect(failed.length, "the restart hit some calls").toBeGreaterThan(0);

      // Recovered by itself: acknowledged work is there; failed work left nothing behind.
      const em = (await getEm()).fork();
      for (const r of results.filter((x) => x.kind === "scan")) {
        const found = await em.count(StepRecord, { idempotencyKey: scans[r.index]!.key });
        expect(found, `scan ${r.index}`).toBe(r.result.ok ? 1 : 0);
      }
      for (const r of results.filter((x) => x.kind === "payment")) {
        const p = await em.findOneOrFail(Payment, { id: payments[r.index]!.id });
        expect(p.status, `payment ${r.index}`).toBe(r.result.ok ? "succeeded" : "open");
        expect(await em.count(WebhookEvent, { id: events[r.index]!.id })).toBe(r.result.ok ? 1 : 0);
      }
      expect(await em.count(Order, { customer: customer.id })).toBe(ordersPlaced);

      // Sending everything again (a retrying tablet, the provider's redelivery): each applies once.
      for (let i = 0; i < 6; i++) {
        await submitStep(scans[i]!.code, good.CUT!, floor, scans[i]!.key);
        await applyPaymentEvent(events[i]!);
      }
      // A paid order whose release to the shop failed in the outage is released by the sweep job.
      const { releasePaidOrders } = await import("@/lib/floor/release-sweep");
      await releasePaidOrders({ olderThanSeconds: 0 });
      const after = (await getEm()).fork();
      for (let i = 0; i < 6; i++) {
        expect(await after.count(StepRecord, { idempotencyKey: scans[i]!.key })).toBe(1);
        const p = await after.findOneOrFail(Payment, { id: payments[i]!.id }, { populate: ["order"] });
        expect(p.status).toBe("succeeded");
        expect(p.order.paidCents).toBe(p.amountCents);
        expect(p.order.status).toBe("in_shop");
      }
    },
  );
});
