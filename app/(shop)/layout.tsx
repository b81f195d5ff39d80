import { AppShell } from "@/components/app-shell";
import { requirePermission } from "@/lib/auth/guard";
import { getShop } from "@/lib/shop/shop";
import { getShopLocale } from "@/lib/shop/locale";
import { ShopLocaleProvider } from "@/components/shop-locale";

/** Customers' screens. Each page checks its own permission; the layout only frames them. */
export default async function ShopLayout({ children }: { children: React.ReactNode }) {
  const [user, shop, locale] = await Promise.all([requirePermission(null), getShop(), getShopLocale()]);
  return (
    <AppShell user={user} shopName={shop.name}>
      <ShopLocaleProvider value={locale}>{children}</ShopLocaleProvider>
    </AppShell>
  );
}
