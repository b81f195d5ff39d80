import Link from "next/link";

const LINKS = [
  { href: "/desk/orders", label: "Orders", owner: false },
  { href: "/desk/customers", label: "Customers", owner: false },
  { href: "/overview/shafts", label: "Shafts", owner: true },
  { href: "/overview/steps", label: "Step records", owner: true },
];

/** The staff tables side by side (owners also see the floor's two). */
export function TableLinks({ current, owner }: { current: string; owner: boolean }) {
  return (
    <nav aria-label="Tables" className="no-print mb-4 flex flex-wrap gap-x-4 gap-y-1 text-sm">
      {LINKS.filter((l) => owner || !l.owner).map((l) => (
        <Link
          key={l.href}
          href={l.href}
          aria-current={l.href === current ? "page" : undefined}
          className={l.href === current ? "font-semibold text-ink no-underline" : "text-steel-700"}
        >
          {l.label}
        </Link>
      ))}
    </nav>
  );
}
