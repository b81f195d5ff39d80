import { AppShell } from "@/components/app-shell";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { getShop } from "@/lib/shop/shop";
import { getShopLocale } from "@/lib/shop/locale";
import { ShopLocaleProvider } from "@/components/shop-locale";

/** Staff screens (counter, floor, owner); customers get 403 here and on every page below. */
export default async function StaffLayout({ children }: { children: React.ReactNode }) {
  const [user, shop, locale] = await Promise.all([requireRole(STAFF_ROLES), getShop(), getShopLocale()]);
  return (
    <AppShell user={user} shopName={shop.name}>
      <ShopLocaleProvider value={locale}>{children}</ShopLocaleProvider>
    </AppShell>
  );
}
