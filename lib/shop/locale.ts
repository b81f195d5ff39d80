// No "server-only" here: scripts run by tsx (owner:create, seed, bench) reach it through lib/users and lib/orders.
import { getShopEngineering } from "@/lib/shop/config";
import { shopIsoDate } from "@/lib/dates";

/** How the shop writes money and dates: its currency and time zone (both from its price book). */
export interface ShopLocale {
  currency: string;
  timeZone: string;
}

/** The shop's currency and time zone, from its current configuration (cached for a few seconds). */
export async function getShopLocale(): Promise<ShopLocale> {
  const { priceBook } = await getShopEngineering();
  return { currency: priceBook.currency, timeZone: priceBook.timeZone };
}

/**
 * Today's date in the shop, as an ISO date ("2026-12-04"): the day "late" is counted from. A shop
 * in Chicago is still on the 4th at 03:00 UTC on the 5th.
 */
export async function shopToday(now: Date = new Date()): Promise<string> {
  return shopIsoDate(now, (await getShopLocale()).timeZone);
}
