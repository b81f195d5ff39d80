import "server-only";
import { LockMode } from "@mikro-orm/core";
import type { EntityManager } from "@mikro-orm/postgresql";
import { Customer, Upload, type Order } from "@/entities";
import { AppError } from "@/lib/http/errors";
import {
  DAILY_FILES_LIMIT_MESSAGE,
  MAX_FILES_PER_CUSTOMER_PER_DAY,
  MAX_FILES_PER_ORDER,
  ORDER_FILES_LIMIT_MESSAGE,
} from "./rules";

const DAY_MS = 24 * 60 * 60 * 1000;

function customerIdOf(order: Order): string {
  const customer = order.customer as Customer | string;
  return typeof customer === "string" ? customer : customer.id;
}

/**
 * Refuses another file when the order already has MAX_FILES_PER_ORDER (409) or the customer's
 * orders got MAX_FILES_PER_CUSTOMER_PER_DAY in the last 24 hours (429). Counts the upload table.
 * With `lock`, inside a transaction, the customer row is locked first so two uploads at the same
 * moment cannot both take the last place.
 */
export async function assertRoomForUpload(
  em: EntityManager,
  order: Order,
  options: { lock?: boolean; now?: Date } = {},
): Promise<void> {
  const customerId = customerIdOf(order);
  if (options.lock) {
    await em.findOne(Customer, { id: customerId }, { lockMode: LockMode.PESSIMISTIC_WRITE });
  }
  const since = new Date((options.now ?? new Date()).getTime() - DAY_MS);
  const onOrder = await em.count(Upload, { order: order.id });
  const today = await em.count(Upload, { order: { customer: customerId }, createdAt: { $gt: since } });
  if (onOrder >= MAX_FILES_PER_ORDER)
    throw new AppError("conflict", ORDER_FILES_LIMIT_MESSAGE, { file: ORDER_FILES_LIMIT_MESSAGE });
  if (today >= MAX_FILES_PER_CUSTOMER_PER_DAY)
    throw new AppError("rate_limited", DAILY_FILES_LIMIT_MESSAGE, { file: DAILY_FILES_LIMIT_MESSAGE });
}
