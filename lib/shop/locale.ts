// No "server-only" here: scripts run by tsx (owner:create, seed, bench) reach it through lib/users and lib/orders.
import { getShopEngineering } from "@/lib/shop/config";

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
