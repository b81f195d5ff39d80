/** The release sweep: a paid order that never reached the shop is released once; others are left alone. */
import { describe, expect, it, vi } from "vitest";
import { Order, OrderEvent, OrderShaft, WorkOrder } from "@/entities";
import { getEm } from "@/lib/db/orm";
import { releasePaidOrders } from "@/lib/floor/release-sweep";
import { logger } from "@/lib/logger";
import { missingForRouting } from "@/lib/traveller/steps";
import { exampleReport } from "../traveller/fixtures";
import { dbTest } from "../setup/db";
import { paidOrder } from "./helpers";

describe("release sweep", () => {
  dbTest("releases a paid order left in 'received', once; leaves unpaid and cancelled ones", async () => {
    const paid = await paidOrder();
    const unpaid = await paidOrder({ paymentState: "unpaid" });
    const cancelled = await paidOrder();
    const em = await getEm();
    // As the webhook leaves them: the money is recorded on the order.
    for (const o of [paid, cancelled])
      await em.nativeUpdate(Order, { id: o.id }, { paidCents: o.depositCents });
    await em.nativeUpdate(Order, { id: cancelled.id }, { status: "cancelled" });

    const first = await releasePaidOrders({ olderThanSeconds: 0 });
    expect(first).toContain(paid.id);
    expect(first).not.toContain(unpaid.id);
    expect(first).not.toContain(cancelled.id);
    expect(await releasePaidOrders({ olderThanSeconds: 0 })).not.toContain(paid.id);

    const fresh = (await getEm()).fork();
    expect((await fresh.findOneOrFail(Order, { id: paid.id })).status).toBe("in_shop");
    expect(await fresh.count(WorkOrder, { order: paid.id })).toBe(1);
    expect(await fresh.count(WorkOrder, { order: unpaid.id })).toBe(0);
    expect(await fresh.count(WorkOrder, { order: cancelled.id })).toBe(0);
  });

  dbTest(
    "skips an order whose stored evaluation has no shopFloor, with a warning naming it, and releases the others",
    async () => {
      const before = await paidOrder();
      const broken = await paidOrder();
      const after = await paidOrder();
      const em = await getEm();
      for (const o of [before, broken, after])
        await em.nativeUpdate(Order, { id: o.id }, { paidCents: o.depositCents });
      // A frozen report that lost its floor tolerances (what the traveller's limits are made of).
      const { shopFloor: _dropped, ...withoutShopFloor } = exampleReport();
      await em.nativeUpdate(
        OrderShaft,
        { order: broken.id },
        { evaluation: JSON.parse(JSON.stringify(withoutShopFloor)) as Record<string, unknown> },
      );

      const warn = vi.spyOn(logger, "warn");
      try {
        const released = await releasePaidOrders({ olderThanSeconds: 0 });
        expect(released).toEqual(expect.arrayContaining([before.id, after.id]));
        expect(released).not.toContain(broken.id);
        const messages = warn.mock.calls.map((c) => String(c[1]));
        expect(messages).toContain(
          `release sweep skipped order ${broken.number}: shaft 1's stored evaluation has no shopFloor`,
        );
        // Skipped cleanly: no TypeError reached the log for it.
        expect(warn.mock.calls.some((c) => (c[0] as { err?: unknown }).err instanceof TypeError)).toBe(false);
      } finally {
        warn.mockRestore();
      }

      const fresh = (await getEm()).fork();
      for (const o of [before, after]) {
        expect((await fresh.findOneOrFail(Order, { id: o.id })).status).toBe("in_shop");
        expect(await fresh.count(WorkOrder, { order: o.id })).toBe(1);
      }
      // The broken order is left exactly as it was: paid, received, nothing on the floor, no timeline entry.
      expect(await fresh.findOneOrFail(Order, { id: broken.id })).toMatchObject({
        status: "received",
        paidCents: broken.depositCents,
      });
      expect(await fresh.count(WorkOrder, { order: broken.id })).toBe(0);
      expect(await fresh.count(OrderEvent, { order: broken.id, kind: "step" })).toBe(0);
    },
  );

  it("what the routing needs: a whole report lacks nothing; a partial one names its gaps", () => {
    expect(missingForRouting(exampleReport())).toEqual([]);
    const { shopFloor, ...rest } = exampleReport();
    expect(missingForRouting(rest)).toEqual(["shopFloor"]);
    expect(missingForRouting({ ...rest, shopFloor: { ...shopFloor, runoutEndsMm: "0.1" } })).toEqual([
      "shopFloor.runoutEndsMm",
    ]);
    expect(missingForRouting({ broken: true })).toEqual([
      "shopFloor",
      "lengthMm",
      "phasing",
      "service",
      "balance",
    ]);
    expect(missingForRouting(null)).toEqual(["the evaluation report"]);
  });
});
