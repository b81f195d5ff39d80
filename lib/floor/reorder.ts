import "server-only";
import { WorkOrder } from "@/entities";
import type { CurrentUser } from "@/lib/auth/guard";
import { can } from "@/lib/auth/permissions";
import { getEm } from "@/lib/db/orm";
import { createDraft } from "@/lib/designs/drafts";
import { SHAFT_USES, type ShaftUse } from "@/lib/designs/schemas";
import { AppError } from "@/lib/http/errors";
import { parseSerial } from "@/lib/traveller/codes";

/**
 * The work order a user may see by its serial: staff any, a customer only a shaft of their own
 * orders; anything else (absent, someone else's, not a serial) is 404.
 */
export async function loadShaftForUser(user: CurrentUser, serial: string): Promise<WorkOrder> {
  const parsed = parseSerial(serial);
  const em = await getEm();
  const staff = can(user.role, "orders.desk") || can(user.role, "floor.scan");
  const wo = parsed.ok
    ? await em.findOne(
        WorkOrder,
        staff ? { serial: parsed.serial } : { serial: parsed.serial, order: { customer: { user: user.id } } },
        { populate: ["order", "order.customer", "orderShaft"] },
      )
    : null;
  if (!wo) throw new AppError("not_found", "No such shaft.");
  return wo;
}

/** Reorder from an as-built record: a new draft, for the same customer, with the shaft's frozen design. */
export async function reorderShaft(user: CurrentUser, serial: string) {
  const wo = await loadShaftForUser(user, serial);
  const shaft = wo.orderShaft;
  const use = shaft.application?.use;
  const draft = await createDraft(user, {
    name: `${shaft.name} (again, as ${wo.serial})`.slice(0, 200),
    design: shaft.design,
    application: {
      description: shaft.application?.description ?? "",
      use: (SHAFT_USES as readonly string[]).includes(use ?? "") ? (use as ShaftUse) : "street",
    },
    customerId: can(user.role, "orders.desk") ? wo.order.customer.id : undefined,
  });
  return {
    draftId: draft.id,
    href: can(user.role, "orders.desk")
      ? `/desk/new?customer=${wo.order.customer.id}&draft=${draft.id}`
      : `/build?draft=${draft.id}`,
  };
}
