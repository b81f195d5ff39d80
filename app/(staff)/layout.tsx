import { AppShell } from "@/components/app-shell";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { getShop } from "@/lib/shop/shop";

/** Staff screens (counter, floor, owner); customers get 403 here and on every page below. */
export default async function StaffLayout({ children }: { children: React.ReactNode }) {
  const [user, shop] = await Promise.all([requireRole(STAFF_ROLES), getShop()]);
  return (
    <AppShell user={user} shopName={shop.name}>
      {children}
    </AppShell>
  );
}
