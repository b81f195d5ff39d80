/** The release sweep: a paid order that never reached the shop is released once; others are left alone. */
import { describe, expect } from "vitest";
import { Order, WorkOrder } from "@/entities";
import { getEm } from "@/lib/db/orm";
import { releasePaidOrders } from "@/lib/floor/release-sweep";
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
});
