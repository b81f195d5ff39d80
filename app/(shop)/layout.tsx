import { AppShell } from "@/components/app-shell";
import { requirePermission } from "@/lib/auth/guard";
import { getShop } from "@/lib/shop/shop";

/** Customers' screens. Each page checks its own permission; the layout only frames them. */
export default async function ShopLayout({ children }: { children: React.ReactNode }) {
  const [user, shop] = await Promise.all([requirePermission(null), getShop()]);
  return (
    <AppShell user={user} shopName={shop.name}>
      {children}
    </AppShell>
  );
}
