import "server-only";
import { freshEm } from "@/lib/db/orm";
import { logger } from "@/lib/logger";
import { releaseOrderOnDeposit, UnroutableOrderError } from "./work-orders";

/** How long a paid order waits for its own release (the webhook's, right after the commit) before the sweep takes it. */
export const RELEASE_SWEEP_AFTER_SECONDS = 60;

/**
 * Releases orders whose deposit is paid but that never reached the shop (the release after the
 * payment failed, e.g. the database went away between the payment's commit and the release).
 * Orders waiting for an owner's engineering sign-off stay as they are (releaseOrderOnDeposit
 * refuses them quietly). An order whose stored evaluation the routing cannot read (no `shopFloor`,
 * say) is skipped with a warning naming the order and what is missing; the rest go on. Returns the
 * ids of the orders released.
 */
export async function releasePaidOrders(options: { olderThanSeconds?: number } = {}): Promise<string[]> {
  const em = await freshEm();
  const rows = await em.getConnection().execute<{ id: string }[]>(
    `select o.id from shop_order o
      where o.status = 'received' and o.paid_cents > 0 and o.paid_cents >= o.deposit_cents
        and o.updated_at < now() - make_interval(secs => ?)
        and not exists (select 1 from work_order w where w.order_id = o.id)
      order by o.created_at limit 50`,
    [options.olderThanSeconds ?? RELEASE_SWEEP_AFTER_SECONDS],
  );
  const released: string[] = [];
  for (const { id } of rows) {
    try {
      const result = await releaseOrderOnDeposit(id);
      if (result) released.push(id);
    } catch (err) {
      if (err instanceof UnroutableOrderError)
        logger.warn(
          { orderId: id, orderNumber: err.orderNumber, missing: err.missing },
          `release sweep skipped order ${err.orderNumber}: ${err.detail}`,
        );
      else logger.warn({ err, orderId: id }, "release sweep could not release a paid order");
    }
  }
  if (released.length) logger.info({ released }, "release sweep released paid orders");
  return released;
}
