import Link from "next/link";
import { Menu } from "lucide-react";
import type { CurrentUser } from "@/lib/auth/guard";
import { navigationFor, ROLE_LABEL } from "@/lib/navigation";
import { isDemo } from "@/lib/shop/shop";
import { BrandMark } from "./brand-mark";
import { NavLinks } from "./nav-links";
import { SignOutButton } from "./sign-out-button";
import { SiteFooter } from "./site-footer";

/** The frame of every signed-in screen: brand, the role's navigation, who is signed in. */
export function AppShell({
  user,
  shopName,
  children,
}: {
  user: CurrentUser;
  shopName: string;
  children: React.ReactNode;
}) {
  const items = navigationFor(user.role, isDemo());
  return (
    <div className="flex min-h-dvh flex-col">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:z-50 focus:rounded focus:bg-white focus:px-3 focus:py-2"
      >
        Skip to content
      </a>
      <header data-shell className="bg-ink text-white">
        <div className="mx-auto flex max-w-7xl items-center gap-4 px-4 py-3">
          <Link href="/" className="flex items-center gap-2 text-white no-underline">
            <BrandMark className="size-8" />
            <span className="leading-tight">
              <span className="block text-base font-bold tracking-tight">Yokeline</span>
              <span className="block text-xs text-steel-100">{shopName}</span>
            </span>
          </Link>
          <nav aria-label="Main" className="ml-4 hidden md:block">
            <NavLinks items={items} />
          </nav>
          <div className="ml-auto hidden items-center gap-3 md:flex">
            <span className="text-right text-sm leading-tight">
              <span className="block font-medium">{user.name}</span>
              <span className="block text-xs text-steel-100">{ROLE_LABEL[user.role]}</span>
            </span>
            <SignOutButton />
          </div>
          <details className="group relative ml-auto md:hidden">
            <summary className="btn cursor-pointer list-none border border-steel-500 text-white [&::-webkit-details-marker]:hidden">
              <Menu className="size-5" aria-hidden="true" />
              <span>Menu</span>
            </summary>
            <div className="absolute right-0 z-40 mt-2 w-64 rounded-card bg-ink p-3 shadow-card ring-1 ring-steel-600">
              <nav aria-label="Main">
                <NavLinks items={items} vertical />
              </nav>
              <div className="mt-3 border-t border-steel-600 pt-3 text-sm">
                <p className="mb-2">
                  {user.name} · <span className="text-steel-100">{ROLE_LABEL[user.role]}</span>
                </p>
                <SignOutButton />
              </div>
            </div>
          </details>
        </div>
      </header>
      <p className="hidden border-b border-black pb-2 text-sm print:block">
        {shopName} · printed from Yokeline
      </p>
      <main id="main" className="mx-auto w-full max-w-7xl flex-1 px-4 py-6 md:py-8">
        {children}
      </main>
      <SiteFooter />
    </div>
  );
}
