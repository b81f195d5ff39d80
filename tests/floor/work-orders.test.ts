import { describe, expect } from "vitest";
import { AuditEvent, Order, OrderEvent, OrderShaft, StepRecord, WorkOrder } from "@/entities";
import { getEm } from "@/lib/db/orm";
import { inToMm } from "@/lib/driveline/units";
import {
  concedeHold,
  orderFloorState,
  releaseOrder,
  submitStep,
  travellerViewFor,
  voidAndReissue,
} from "@/lib/floor/work-orders";
import { parseSerial } from "@/lib/traveller/codes";
import { dbTest } from "../setup/db";
import { code, good, key, paidOrder, staff } from "./helpers";

describe("releasing an order", () => {
  dbTest(
    "each shaft becomes a work order with a serial and the routing's steps; twice is refused",
    async () => {
      const counter = await staff("counter");
      const order = await paidOrder({ shafts: 2 });
      const released = await releaseOrder(order.id, counter);
      expect(released.workOrders).toHaveLength(2);
      for (const w of released.workOrders) {
        expect(parseSerial(w.serial)).toMatchObject({
          ok: true,
          parts: { shopCode: "YL", year: new Date().getUTCFullYear() },
        });
        expect(w.stepCount).toBe(6);
      }
      const sequences = released.workOrders.map((w) => {
        const p = parseSerial(w.serial);
        return p.ok ? p.parts.sequence : null;
      });
      expect(sequences[1]! - sequences[0]!).toBe(1);
      await expect(releaseOrder(order.id, counter)).rejects.toMatchObject({ code: "conflict" });

      const em = await getEm();
      expect((await em.findOneOrFail(Order, { id: order.id })).status).toBe("in_shop");
      expect(await em.count(AuditEvent, { action: "order.release", subjectId: order.id })).toBe(1);
      const state = await orderFloorState(em, order.id);
      expect(state).toMatchObject({ state: "released", step: { k: 1, n: 6 } });
    },
  );

  dbTest("without the deposit a reason is required; customers and floor staff cannot release", async () => {
    const counter = await staff("counter");
    const order = await paidOrder({ paymentState: "unpaid" });
    await expect(releaseOrder(order.id, counter)).rejects.toMatchObject({ code: "invalid" });
    await expect(releaseOrder(order.id, await staff("floor"), "rush")).rejects.toMatchObject({ status: 403 });
    await expect(releaseOrder(order.id, { ...counter, role: "customer" }, "rush")).rejects.toMatchObject({
      status: 403,
    });
    const ok = await releaseOrder(order.id, counter, "Regular fleet customer, pays on pickup");
    expect(ok.workOrders).toHaveLength(1);
    const em = await getEm();
    expect((await em.findOneOrFail(WorkOrder, { order: order.id })).releaseReason).toBe(
      "Regular fleet customer, pays on pickup",
    );
  });
});

describe("signing off steps", () => {
  dbTest(
    "in routing order through a hold, a rework, final inspection and shipping; order state follows",
    { timeout: 60_000 },
    async () => {
      const [counter, floor] = [await staff("counter"), await staff("floor")];
      const order = await paidOrder();
      const { workOrders } = await releaseOrder(order.id, counter);
      const serial = workOrders[0]!.serial;
      const em = await getEm();

      // Scanning ahead says which step is next.
      await expect(submitStep(code(serial, "WLD"), good.WLD!, floor, key())).rejects.toMatchObject({
        code: "conflict",
        message: expect.stringContaining("Next for"),
      });
      const cut = await submitStep(code(serial, "CUT"), good.CUT!, floor, key());
      expect(cut).toMatchObject({
        outcome: "pass",
        workOrderState: "in_shop",
        next: { code: "WLD", position: 2 },
      });
      expect(cut.values.cutLengthMm).toBeCloseTo(1188.8, 6);
      expect((await orderFloorState(em, order.id)).label).toBe("In the shop, step 2 of 6");

      // Signing off the same step again (another key) is refused and says what is next.
      await expect(submitStep(code(serial, "CUT"), good.CUT!, floor, key())).rejects.toMatchObject({
        code: "conflict",
        message: expect.stringContaining("already signed off"),
      });

      await submitStep(code(serial, "WLD"), good.WLD!, floor, key());
      // Out-of-limit runout near the front weld: hold with the value and the limit.
      const held = await submitStep(code(serial, "RUN"), { ...good.RUN!, runoutFrontMm: 0.02 }, floor, key());
      expect(held.outcome).toBe("hold");
      expect(held.workOrderState).toBe("on_hold");
      expect(held.failures).toEqual([
        expect.objectContaining({
          key: "runoutFrontMm",
          value: inToMm(0.02),
          limit: expect.objectContaining({ max: 0.25 }),
        }),
      ]);
      expect(held.failures[0]!.message).toContain("0.0200 in is outside the limit at most 0.0098 in");
      const onHold = await orderFloorState(em, order.id);
      expect(onHold).toMatchObject({
        state: "on_hold",
        shafts: [{ hold: { step: "Straighten and runout" } }],
      });
      // The next step cannot be done while this one is on hold.
      await expect(submitStep(code(serial, "BAL"), good.BAL!, floor, key())).rejects.toMatchObject({
        code: "conflict",
      });

      // Rework: straightened again, a new in-limit measurement clears the hold.
      const rework = await submitStep(code(serial, "RUN"), good.RUN!, floor, key());
      expect(rework).toMatchObject({ outcome: "rework", workOrderState: "in_shop", next: { code: "BAL" } });
      await submitStep(code(serial, "BAL"), good.BAL!, floor, key());
      const fin = await submitStep(code(serial, "FIN"), good.FIN!, floor, key());
      expect(fin).toMatchObject({ outcome: "pass", workOrderState: "ready", next: { code: "SHP" } });
      expect((await em.fork().findOneOrFail(Order, { id: order.id })).status).toBe("ready");
      expect((await orderFloorState(em.fork(), order.id)).state).toBe("ready");

      const shipped = await submitStep(code(serial, "SHP"), good.SHP!, floor, key());
      expect(shipped).toMatchObject({ outcome: "pass", workOrderState: "shipped", next: null });
      const fresh = em.fork();
      const left = await fresh.findOneOrFail(Order, { id: order.id });
      expect(left.status).toBe("shipped");
      // The order is stamped with the time it left (the owner's days-to-ship figure reads it).
      expect(left.shippedAt).toBeInstanceOf(Date);
      expect((await orderFloorState(fresh, order.id)).state).toBe("shipped");
      await expect(submitStep(code(serial, "SHP"), good.SHP!, floor, key())).rejects.toMatchObject({
        code: "conflict",
      });

      // Who and when for every event; the customer's timeline has each step but not the hold's detail.
      const records = await fresh.find(
        StepRecord,
        { workOrder: workOrders[0]!.id },
        { orderBy: { at: "asc" } },
      );
      expect(records.map((r) => r.outcome)).toEqual([
        "pass",
        "pass",
        "hold",
        "rework",
        "pass",
        "pass",
        "pass",
      ]);
      expect(records.every((r) => r.by?.id === floor.id && r.at instanceof Date)).toBe(true);
      const timeline = await fresh.find(
        OrderEvent,
        { order: order.id, public: true },
        { orderBy: { at: "asc" } },
      );
      const labels = timeline.map((e) => e.label);
      expect(labels).toEqual(
        expect.arrayContaining([
          `${serial}: Cut tube done`,
          `${serial}: Straighten and runout done`,
          "Ready",
          `${serial} shipped: Freight demo TRACK-0001`,
        ]),
      );
      expect(labels.some((l) => l.includes("hold"))).toBe(false);
    },
  );

  dbTest("the same submission (same key) records once and answers the same result", async () => {
    const floor = await staff("floor");
    const order = await paidOrder({ fulfilment: "pickup" });
    const serial = (await releaseOrder(order.id, await staff("counter"))).workOrders[0]!.serial;
    const k = key();
    const first = await submitStep(code(serial, "CUT"), good.CUT!, floor, k);
    const again = await submitStep(code(serial, "CUT"), good.CUT!, floor, k);
    expect(again).toEqual({ ...first, replayed: true });
    const em = await getEm();
    expect(await em.count(StepRecord, { idempotencyKey: k })).toBe(1);
  });

  dbTest("values outside the limit need an owner's concession with a reason (audited)", async () => {
    const [floor, owner] = [await staff("floor"), await staff("owner")];
    const order = await paidOrder({ fulfilment: "pickup" });
    const wo = (await releaseOrder(order.id, await staff("counter"))).workOrders[0]!;
    const held = await submitStep(code(wo.serial, "CUT"), { ...good.CUT!, cutLengthMm: 46.9 }, floor, key());
    expect(held.outcome).toBe("hold");
    await expect(concedeHold(wo.id, floor, "looks fine")).rejects.toMatchObject({ status: 403 });
    await expect(concedeHold(wo.id, owner, "  ")).rejects.toMatchObject({ code: "invalid" });
    const conceded = await concedeHold(wo.id, owner, "Customer accepts 2 mm long: slip has the room");
    expect(conceded).toMatchObject({
      outcome: "concession",
      workOrderState: "in_shop",
      next: { code: "WLD" },
    });
    const em = await getEm();
    const audit = await em.findOneOrFail(AuditEvent, { action: "floor.concession", subjectId: wo.id });
    expect(audit.details).toMatchObject({
      reason: "Customer accepts 2 mm long: slip has the room",
      step: "CUT",
    });
    expect(audit.actor?.id).toBe(owner.id);
    await expect(concedeHold(wo.id, owner, "again")).rejects.toMatchObject({ code: "conflict" });
  });

  dbTest("a mistyped code is refused before anything is looked up", async () => {
    const floor = await staff("floor");
    const order = await paidOrder();
    const serial = (await releaseOrder(order.id, await staff("counter"))).workOrders[0]!.serial;
    const typo = code(serial, "CUT").replace("-CUT-", "-CVT-");
    await expect(submitStep(typo, good.CUT!, floor, key())).rejects.toMatchObject({
      code: "invalid",
      message: expect.stringContaining("check character"),
    });
    await expect(submitStep(code(serial, "CUT"), { cutLengthMm: "x" }, floor, key())).rejects.toMatchObject({
      code: "invalid",
      fields: { tubeHeatLot: expect.any(String), cutLengthMm: expect.any(String) },
    });
  });
});

describe("void and reissue", () => {
  dbTest(
    "after a design change the old revision's codes are refused and the new traveller starts over",
    async () => {
      const [counter, floor] = [await staff("counter"), await staff("floor")];
      const order = await paidOrder();
      const wo = (await releaseOrder(order.id, counter)).workOrders[0]!;
      await submitStep(code(wo.serial, "CUT"), good.CUT!, floor, key());

      // The design changed (e.g. 10 mm longer): the order shaft's frozen copy is replaced, then reissued.
      const em = await getEm();
      const shaft = await em.findOneOrFail(OrderShaft, { id: wo.shaftId });
      shaft.evaluation = { ...shaft.evaluation, lengthMm: 1330.8, cutLengthMm: 1198.8 };
      await em.flush();
      const reissued = await voidAndReissue(wo.id, counter, "Customer re-measured: 10 mm longer");
      expect(reissued).toEqual({ serial: wo.serial, revision: 2 });

      await expect(submitStep(code(wo.serial, "WLD", 1), good.WLD!, floor, key())).rejects.toMatchObject({
        code: "conflict",
        message: expect.stringContaining("This traveller is void"),
      });
      // Revision 2 starts at the cut, with the new length's limits.
      const oldLength = await submitStep(code(wo.serial, "CUT", 2), good.CUT!, floor, key());
      expect(oldLength.outcome).toBe("hold");
      const newLength = await submitStep(
        code(wo.serial, "CUT", 2),
        { ...good.CUT!, cutLengthMm: 1198.8 / 25.4 },
        floor,
        key(),
      );
      expect(newLength.outcome).toBe("rework");

      const fresh = em.fork();
      const current = await travellerViewFor(fresh, wo.id);
      const old = await travellerViewFor(fresh, wo.id, 1);
      expect(current).toMatchObject({ revision: 2, voidedBy: null });
      expect(old).toMatchObject({ revision: 1, voidedBy: 2 });
      expect(current.steps[0]!.barcodeText).toBe(code(wo.serial, "CUT", 2));
      expect(old.steps[0]!.barcodeText).toBe(code(wo.serial, "CUT", 1));
      expect(await fresh.count(AuditEvent, { action: "floor.reissue", subjectId: wo.id })).toBe(1);
    },
  );
});

describe("concurrency", () => {
  dbTest(
    "50 parallel submissions of one step record exactly one completion",
    { timeout: 60_000 },
    async () => {
      const floor = await staff("floor");
      const order = await paidOrder();
      const wo = (await releaseOrder(order.id, await staff("counter"))).workOrders[0]!;
      const settled = await Promise.allSettled(
        Array.from({ length: 50 }, () => submitStep(code(wo.serial, "CUT"), good.CUT!, floor, key())),
      );
      const passed = settled.filter((s) => s.status === "fulfilled");
      const refused = settled.filter((s) => s.status === "rejected");
      expect(passed).toHaveLength(1);
      expect(refused.every((r) => (r as PromiseRejectedResult).reason?.code === "conflict")).toBe(true);

      // The same submission sent 20 times at once (a double-tapped button, a retrying tablet).
      const k = key();
      const same = await Promise.all(
        Array.from({ length: 20 }, () => submitStep(code(wo.serial, "WLD"), good.WLD!, floor, k)),
      );
      expect(new Set(same.map((r) => r.recordId)).size).toBe(1);
      expect(same.filter((r) => !r.replayed)).toHaveLength(1);

      const em = await getEm();
      const records = await em.find(StepRecord, { workOrder: wo.id });
      expect(records.map((r) => r.outcome).sort()).toEqual(["pass", "pass"]);
      expect(records.every((r) => r.completionOf != null)).toBe(true);
    },
  );
});
