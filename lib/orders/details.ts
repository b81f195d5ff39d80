import "server-only";
import { AuditEvent, OrderEvent, User } from "@/entities";
import type { CurrentUser } from "@/lib/auth/guard";
import { recordAudit } from "@/lib/audit";
import { inTransaction } from "@/lib/db/orm";
import { AppError } from "@/lib/http/errors";
import type { UpdateOrderDetailsInput } from "./desk-schemas";
import { lockOrder } from "./payments";
import { formatDateTime } from "@/lib/dates";
import { getShopLocale } from "@/lib/shop/locale";
import type { Fulfilment } from "./states";

const AUDIT_ACTION = "order.details";

/** What the desk's details form shows and sends back. */
export interface OrderDetailsView {
  version: number;
  promisedDate: string;
  shipTo: string | null;
  fulfilment: Fulfilment;
}

/**
 * Saves the promised date and the ship-to address of an order (counter or owner; checked by the
 * action). The save names the version its form was opened with; when someone saved since, it is
 * refused with 409 saying who and what, and nothing changes. Audited (before → after); a moved
 * promised date is on the customer's timeline.
 */
export async function updateOrderDetails(
  user: CurrentUser,
  input: UpdateOrderDetailsInput,
): Promise<OrderDetailsView> {
  return inTransaction(async (em) => {
    const order = await lockOrder(em, input.orderId);
    if (order.status === "cancelled" || order.status === "shipped")
      throw new AppError("conflict", `Order ${order.number} is ${order.status}; its details are final.`);
    if (order.version !== input.version) {
      const last = await em.findOne(
        AuditEvent,
        { action: AUDIT_ACTION, subjectId: order.id },
        { orderBy: { at: "desc" } },
      );
      const who = last?.actor ? (await em.findOne(User, { id: last.actor.id }))?.name : null;
      const when = last ? formatDateTime(last.at, (await getShopLocale()).timeZone) : null;
      throw new AppError(
        "conflict",
        `${who ?? "Someone"} saved this order's details${when ? ` at ${when}` : ""} after you opened it. ` +
          "Reload to see their changes, then make yours again.",
      );
    }
    if (input.shipTo && order.fulfilment !== "ship")
      throw new AppError("invalid", "This order is picked up; it has no ship-to address.", {
        shipTo: "only for orders that ship",
      });
    if (order.fulfilment === "ship" && !input.shipTo)
      throw new AppError("invalid", "An order that ships needs an address.", {
        shipTo: "required for an order that ships",
      });
    const before = { promisedDate: order.promisedDate, shipTo: order.shipTo ?? null };
    const after = { promisedDate: input.promisedDate, shipTo: input.shipTo || null };
    if (before.promisedDate !== after.promisedDate) {
      em.create(OrderEvent, {
        order,
        kind: "note",
        label: `Promised date moved from ${before.promisedDate} to ${after.promisedDate}`,
        at: new Date(),
      });
    }
    order.promisedDate = after.promisedDate;
    order.shipTo = after.shipTo;
    order.version += 1;
    await recordAudit(
      {
        actorId: user.id,
        action: AUDIT_ACTION,
        subjectType: "order",
        subjectId: order.id,
        details: { before, after, version: order.version },
      },
      em,
    );
    return {
      version: order.version,
      promisedDate: order.promisedDate,
      shipTo: order.shipTo ?? null,
      fulfilment: order.fulfilment,
    };
  });
}
