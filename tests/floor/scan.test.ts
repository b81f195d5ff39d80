import { readFileSync } from "node:fs";
import { describe, expect } from "vitest";
import { Design, OrderShaft } from "@/entities";
import { getEm } from "@/lib/db/orm";
import { reorderShaft, loadShaftForUser } from "@/lib/floor/reorder";
import { scanCode } from "@/lib/floor/scan";
import { releaseOrder, submitStep, voidAndReissue } from "@/lib/floor/work-orders";
import { createTestOrder } from "../setup/test-orders";
import { dbTest } from "../setup/db";
import { exampleReport } from "../traveller/fixtures";
import { code, good, key, paidOrder, staff } from "./helpers";

async function releasedShaft() {
  const order = await paidOrder();
  const released = await releaseOrder(order.id, await staff("counter"));
  return { order, wo: released.workOrders[0]! };
}

describe("what a scanned code means", () => {
  dbTest(
    "a step code opens its sheet with limits in the shop's units and says whose turn it is",
    async () => {
      const { order, wo } = await releasedShaft();
      const em = await getEm();
      const cut = await scanCode(em, code(wo.serial, "CUT").toLowerCase());
      expect(cut).toMatchObject({ kind: "step", serial: wo.serial, status: "next", units: "in" });
      // The order's words the station shows, against the order and shaft read apart.
      const shaft = await em
        .fork()
        .findOneOrFail(OrderShaft, { order: order.id }, { populate: ["order.customer"] });
      expect(cut).toMatchObject({
        orderNumber: shaft.order.number,
        customerName: shaft.order.customer.name,
        promisedDate: shaft.order.promisedDate,
        shaftName: shaft.name,
      });
      expect(cut.kind === "step" && /^\d{4}-\d{2}-\d{2}$/.test(cut.promisedDate)).toBe(true);
      if (cut.kind !== "step") throw new Error("not a step");
      const length = cut.step.fields.find((f) => f.key === "cutLengthMm");
      // README street truck: 1188.8 mm cut = 46.803 in; ±0.8 mm (the floor default) = ±0.031 in.
      expect(length).toMatchObject({ type: "number", unit: "in", limit: "46.803 in ± 0.031 in" });

      const ahead = await scanCode(em, code(wo.serial, "RUN"));
      expect(ahead).toMatchObject({ status: "ahead", next: { code: "CUT", position: 1 } });
      if (ahead.kind !== "step") throw new Error("not a step");
      // Runout stations say where to read them: 75 mm = 2.953 in from the front weld.
      expect(ahead.step.fields[0]).toMatchObject({ station: "2.953 in from the front weld" });

      const floor = await staff("floor");
      await submitStep(code(wo.serial, "CUT"), good.CUT!, floor, key());
      await submitStep(code(wo.serial, "WLD"), good.WLD!, floor, key());
      expect(await scanCode(em, code(wo.serial, "CUT"))).toMatchObject({
        status: "done",
        next: { code: "RUN" },
      });
      await submitStep(code(wo.serial, "RUN"), { ...good.RUN!, runoutMidMm: 0.05 }, floor, key());
      const held = await scanCode(await getEm(), code(wo.serial, "RUN"));
      expect(held).toMatchObject({ status: "on_hold" });
      if (held.kind !== "step") throw new Error("not a step");
      expect(held.hold!.failures).toEqual([
        expect.objectContaining({ key: "runoutMidMm", message: expect.stringContaining("0.0500 in") }),
      ]);
      // When it was held, in ISO 8601 UTC, as the record has it.
      const [record] = await em.execute<{ at: string }[]>(
        "select r.at from step_record r join work_order_step s on s.id = r.step_id where s.work_order_id = ? and r.outcome = 'hold'",
        [wo.id],
      );
      expect(held.hold!.at).toBe(new Date(record!.at).toISOString());
    },
  );

  dbTest("a serial points at its as-built record; void, mistyped and unknown codes are refused", async () => {
    const { wo } = await releasedShaft();
    const em = await getEm();
    expect(await scanCode(em, wo.serial)).toEqual({
      kind: "serial",
      serial: wo.serial,
      href: `/floor/shafts/${wo.serial}`,
    });
    // One character changed: the check character refuses it, naming the field.
    const typo = code(wo.serial, "CUT").replace("-CUT-", "-CUP-");
    await expect(scanCode(em, typo)).rejects.toMatchObject({
      code: "invalid",
      fields: { code: expect.stringContaining("check character") },
    });
    await expect(scanCode(em, "hello")).rejects.toMatchObject({
      code: "invalid",
      fields: { code: expect.any(String) },
    });
    // A work order voided with its order (cancelled): its traveller says not to work on it.
    await em.execute(
      "update work_order set voided_at = now(), void_reason = 'Order cancelled' where id = ?",
      [wo.id],
    );
    await expect(scanCode(await getEm(), code(wo.serial, "CUT"))).rejects.toMatchObject({
      code: "conflict",
      message: expect.stringContaining("Order cancelled. Do not work on this shaft."),
    });
    await em.execute("update work_order set voided_at = null, void_reason = null where id = ?", [wo.id]);
    await voidAndReissue(wo.id, await staff("counter"), "Length changed");
    await expect(scanCode(await getEm(), code(wo.serial, "CUT", 1))).rejects.toMatchObject({
      code: "conflict",
      message: expect.stringContaining("This traveller is void"),
    });
    expect(await scanCode(await getEm(), code(wo.serial, "CUT", 2))).toMatchObject({
      status: "next",
      revision: 2,
    });
  });
});

describe("reorder from an as-built record", () => {
  dbTest("the owning customer gets a new draft with the same design; another customer gets 404", async () => {
    const em = await getEm();
    const owner = await staff("customer");
    const order = await createTestOrder(em, { userId: owner.id });
    order.paymentState = "deposit_paid";
    order.status = "received";
    const design = JSON.parse(readFileSync("examples/street-truck.json", "utf8")) as Record<string, unknown>;
    const report = exampleReport();
    em.create(OrderShaft, {
      order,
      position: 1,
      name: "Ranch truck",
      application: { description: "Half-ton pickup", use: "towing" },
      design,
      evaluation: JSON.parse(JSON.stringify(report)) as Record<string, unknown>,
      overall: report.overall,
      priceLines: [],
      priceCents: 50_000,
    });
    await em.flush();
    const [wo] = (await releaseOrder(order.id, await staff("counter"))).workOrders;

    const stranger = await staff("customer");
    await expect(loadShaftForUser(stranger, wo!.serial)).rejects.toMatchObject({ code: "not_found" });
    await expect(reorderShaft(stranger, wo!.serial)).rejects.toMatchObject({ code: "not_found" });

    const again = await reorderShaft(owner, wo!.serial);
    expect(again.href).toBe(`/build?draft=${again.draftId}`);
    const draft = await (
      await getEm()
    ).findOneOrFail(Design, { id: again.draftId }, { populate: ["customer"] });
    expect(draft.design).toMatchObject({ lengthMm: design.lengthMm, tube: design.tube });
    expect(draft.application).toEqual({ description: "Half-ton pickup", use: "towing" });
    expect(draft.customer!.id).toBe(order.customer.id);

    // The counter reorders for the customer and lands on the phone-order builder.
    const counter = await staff("counter");
    const desk = await reorderShaft(counter, wo!.serial);
    expect(desk.href).toBe(`/desk/new?customer=${order.customer.id}&draft=${desk.draftId}`);
  });
});
