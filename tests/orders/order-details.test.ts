/**
 * Two people at the desk save one order's details: the later save, based on the version both
 * opened, is refused with 409 naming who saved in between; nothing is overwritten silently.
 */
import { describe, expect } from "vitest";
import { AuditEvent, Order } from "@/entities";
import { getEm } from "@/lib/db/orm";
import { updateOrderDetailsSchema } from "@/lib/orders/desk-schemas";
import { updateOrderDetails } from "@/lib/orders/details";
import { dbTest } from "../setup/db";
import { paidOrder, staff } from "../floor/helpers";

describe("the desk's order details (optimistic locking)", () => {
  dbTest("the later of two saves from the same version is told about the earlier one", async () => {
    const order = await paidOrder({ fulfilment: "ship" });
    const [ann, ben] = [await staff("counter"), await staff("owner")];
    const opened = (await (await getEm()).fork().findOneOrFail(Order, { id: order.id })).version;

    const first = await updateOrderDetails(ann, {
      orderId: order.id,
      version: opened,
      promisedDate: "2027-01-15",
      shipTo: "4 Mill Lane\nSalina KS",
    });
    expect(first.version).toBe(opened + 1);
    await expect(
      updateOrderDetails(ben, {
        orderId: order.id,
        version: opened,
        promisedDate: "2027-02-01",
        shipTo: "9 Elm St\nAbilene KS",
      }),
    ).rejects.toMatchObject({ code: "conflict", message: new RegExp(`^${ann.name} saved this order`) });

    const saved = await (await getEm()).fork().findOneOrFail(Order, { id: order.id });
    expect(saved.promisedDate).toBe("2027-01-15");
    expect(saved.shipTo).toBe("4 Mill Lane\nSalina KS");
    const audits = await (
      await getEm()
    )
      .fork()
      .find(AuditEvent, { action: "order.details", subjectId: order.id });
    expect(audits).toHaveLength(1);
    expect(audits[0]!.details).toMatchObject({
      before: { promisedDate: order.promisedDate },
      after: { promisedDate: "2027-01-15" },
    });

    // Parallel: of five saves from one version, exactly one lands.
    const settled = await Promise.allSettled(
      ["2027-03-01", "2027-03-02", "2027-03-03", "2027-03-04", "2027-03-05"].map((d) =>
        updateOrderDetails(ann, { orderId: order.id, version: first.version, promisedDate: d, shipTo: "x" }),
      ),
    );
    expect(settled.filter((s) => s.status === "fulfilled")).toHaveLength(1);
  });

  dbTest("bad input names its field; a pickup order has no address; a shipping one needs one", async () => {
    const pickup = await paidOrder({ fulfilment: "pickup" });
    const owner = await staff("owner");
    await expect(
      updateOrderDetails(owner, {
        orderId: pickup.id,
        version: 1,
        promisedDate: "2027-01-15",
        shipTo: "here",
      }),
    ).rejects.toMatchObject({ code: "invalid", fields: { shipTo: "only for orders that ship" } });
    const ship = await paidOrder({ fulfilment: "ship" });
    await expect(
      updateOrderDetails(owner, { orderId: ship.id, version: 1, promisedDate: "2027-01-15", shipTo: "" }),
    ).rejects.toMatchObject({ fields: { shipTo: "required for an order that ships" } });
    // The action's schema (the screen's path): a malformed date is a field error naming it.
    const parsed = updateOrderDetailsSchema.safeParse({
      orderId: ship.id,
      version: 1,
      promisedDate: "15/01/2027",
      shipTo: "x",
    });
    expect(parsed.success).toBe(false);
    expect(parsed.error?.issues.map((i) => i.path.join("."))).toEqual(["promisedDate"]);
  });
});
