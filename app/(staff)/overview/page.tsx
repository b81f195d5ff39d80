import Link from "next/link";
import type { Metadata } from "next";
import { History } from "lucide-react";
import { requirePermission } from "@/lib/auth/guard";
import { overviewFigures } from "@/lib/shop/overview";
import { formatMoney } from "@/lib/pricing/price-book";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState } from "@/components/ui/empty-state";

export const metadata: Metadata = { title: "Overview" };

export default async function OverviewPage() {
  await requirePermission("shop.overview", "/overview");
  const figures = await overviewFigures();
  const money = (cents: number) => formatMoney(cents, "USD");
  const tiles = [
    {
      label: "Open orders",
      value: String(figures.openOrders),
      note: `${figures.awaitingPayment} awaiting payment`,
      href: "/desk",
    },
    { label: "Late", value: String(figures.lateOrders), note: "past their promised date", href: "/desk" },
    {
      label: "Taken, last 30 days",
      value: money(figures.takenLast30DaysCents),
      note: "payments less refunds",
    },
    { label: "Still owed", value: money(figures.outstandingCents), note: "on open orders" },
    {
      label: "Customers",
      value: String(figures.customers),
      note: "online and by phone",
      href: "/desk/customers",
    },
    {
      label: "Staff",
      value: String(figures.staff),
      note: "counter, floor and owners",
      href: "/overview/staff",
    },
  ];
  return (
    <>
      <PageHeader title="Overview" description="Status, lateness, throughput and money at a glance." />
      <dl className="grid grid-cols-2 gap-4 md:grid-cols-3 xl:grid-cols-6">
        {tiles.map((t) => (
          <div key={t.label} className="card p-4">
            <dt className="text-sm text-ink-muted">{t.label}</dt>
            <dd className="mt-1 text-2xl font-bold tabular-nums">{t.value}</dd>
            <dd className="text-xs text-ink-muted">
              {t.href ? (
                <Link href={t.href} className="text-steel-600 underline">
                  {t.note}
                </Link>
              ) : (
                t.note
              )}
            </dd>
          </div>
        ))}
      </dl>
      <section className="mt-8" aria-labelledby="recent">
        <h2 id="recent" className="mb-3 text-lg font-semibold">
          Recent activity
        </h2>
        {figures.recent.length === 0 ? (
          <EmptyState icon={History} title="Nothing recorded yet" />
        ) : (
          <ol className="divide-y divide-line card">
            {figures.recent.map((e) => (
              <li key={e.id} className="flex flex-wrap justify-between gap-2 px-4 py-2 text-sm">
                <span>
                  <span className="font-medium">{e.actor}</span> ·{" "}
                  <span className="font-mono text-xs">{e.action}</span> · {e.subject}
                </span>
                <time dateTime={e.at} className="text-ink-muted">
                  {e.at.slice(0, 16).replace("T", " ")} UTC
                </time>
              </li>
            ))}
          </ol>
        )}
      </section>
    </>
  );
}
