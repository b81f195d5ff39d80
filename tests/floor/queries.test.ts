import { describe, expect } from "vitest";
import { Order, WorkOrder } from "@/entities";
import { getEm } from "@/lib/db/orm";
import { asBuiltRecord, workQueue } from "@/lib/floor/queries";
import { releaseOrder, releaseOrderOnDeposit, submitStep } from "@/lib/floor/work-orders";
import { dbTest } from "../setup/db";
import { code, good, key, paidOrder, staff } from "./helpers";

describe("floor read models", () => {
  dbTest("the work queue lists each shaft's next step and why it is on hold", async () => {
    const floor = await staff("floor");
    const order = await paidOrder({ shafts: 2 });
    const [a, b] = (await releaseOrder(order.id, await staff("counter"))).workOrders;
    await submitStep(code(a!.serial, "CUT"), good.CUT!, floor, key());
    await submitStep(code(b!.serial, "CUT"), { ...good.CUT!, cutLengthMm: 47 }, floor, key());
    const queue = (await workQueue(await getEm())).filter((q) => q.orderId === order.id);
    expect(queue.map((q) => [q.serial, q.state, q.next?.code, q.hold?.step ?? null])).toEqual([
      [a!.serial, "in_shop", "WLD", null],
      [b!.serial, "on_hold", "CUT", "Cut tube"],
    ]);
    expect(queue[1]!.hold!.failures[0]!.key).toBe("cutLengthMm");
    expect(queue[0]).toMatchObject({ promisedDate: "2026-12-24", stepCount: 6 });
  });

  dbTest("the as-built record, found by serial, holds every measurement with who and when", async () => {
    const floor = await staff("floor");
    const order = await paidOrder({ fulfilment: "pickup" });
    const [wo] = (await releaseOrder(order.id, await staff("counter"))).workOrders;
    await submitStep(code(wo!.serial, "CUT"), { ...good.CUT!, cutLengthMm: 47 }, floor, key());
    await submitStep(code(wo!.serial, "CUT"), good.CUT!, floor, key());
    const record = await asBuiltRecord(await getEm(), wo!.serial.toLowerCase());
    expect(record.serial).toBe(wo!.serial);
    expect((record.evaluation as { lengthMm: number }).lengthMm).toBe(1320.8);
    expect(record.steps[0]!.records.map((r) => [r.outcome, r.byName])).toEqual([
      ["hold", floor.name],
      ["rework", floor.name],
    ]);
    expect(record.steps[0]!.records[1]!.values).toMatchObject({ tubeHeatLot: "H-2291" });
    expect(record.steps[1]!.records).toEqual([]);
  });

  dbTest("the automatic release runs once the deposit is paid, and only once", async () => {
    const unpaid = await paidOrder({ paymentState: "unpaid" });
    expect(await releaseOrderOnDeposit(unpaid.id)).toBeNull();
    const paid = await paidOrder();
    const first = await releaseOrderOnDeposit(paid.id);
    expect(first?.workOrders).toHaveLength(1);
    expect(await releaseOrderOnDeposit(paid.id)).toBeNull();
    const em = await getEm();
    expect(await em.count(WorkOrder, { order: paid.id })).toBe(1);
    expect((await em.findOneOrFail(Order, { id: paid.id })).status).toBe("in_shop");
  });
});
