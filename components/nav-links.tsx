"use client";
import Link from "next/link";
import { usePathname } from "next/navigation";
import type { NavItem } from "@/lib/navigation";

/** The role's links, the current one marked for screen readers and by a bar. */
export function NavLinks({ items, vertical = false }: { items: NavItem[]; vertical?: boolean }) {
  const pathname = usePathname();
  const active = items
    .filter((i) => pathname === i.href || pathname.startsWith(`${i.href}/`))
    .sort((a, b) => b.href.length - a.href.length)[0]?.href;
  return (
    <ul className={vertical ? "flex flex-col gap-1" : "flex items-center gap-1"}>
      {items.map((item) => {
        const current = item.href === active;
        return (
          <li key={item.href}>
            <Link
              href={item.href}
              aria-current={current ? "page" : undefined}
              className={`block rounded-md px-3 py-2 text-sm font-medium no-underline transition-colors ${
                current ? "bg-steel-700 text-white" : "text-steel-50 hover:bg-steel-600"
              }`}
            >
              {item.label}
            </Link>
          </li>
        );
      })}
    </ul>
  );
}
