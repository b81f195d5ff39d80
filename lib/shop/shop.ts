import "server-only";
import { cache } from "react";
import { Shop } from "@/entities";
import { getEm } from "@/lib/db/orm";

export interface ShopInfo {
  name: string;
  addressLines: string;
  phone: string;
  email: string;
  currency: string;
}

const FALLBACK: ShopInfo = { name: "Yokeline shop", addressLines: "", phone: "", email: "", currency: "USD" };

/** The shop's details (one row), read once per request. */
export const getShop = cache(async (): Promise<ShopInfo> => {
  const em = await getEm();
  const shop = await em.findOne(Shop, { id: 1 });
  if (!shop) return FALLBACK;
  const { name, addressLines, phone, email, currency } = shop;
  return { name, addressLines, phone, email, currency };
});

/** Demo mode shows the demo accounts on the sign-in page and the sent-mail page. */
export function isDemo(): boolean {
  return process.env.YOKELINE_DEMO === "1";
}
