import Link from "next/link";
import type { Metadata } from "next";
import { History } from "lucide-react";
import { requirePermission } from "@/lib/auth/guard";
import { ORDER_STATUS_LABEL } from "@/lib/orders/labels";
import { CHART_WEEKS, DEFAULT_STEP_HOURS, overviewActivity, overviewFigures } from "@/lib/shop/overview";
import { AVERAGE_WINDOW_DAYS, type OrderListItem } from "@/lib/shop/overview";
import { formatMoney } from "@/lib/money";
import { getShopLocale } from "@/lib/shop/locale";
import { formatTimestamp, shopIsoDate } from "@/lib/dates";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState } from "@/components/ui/empty-state";
import { CELL, TableCard } from "@/components/ui/table-card";
import { ChartCard } from "./_components/chart-card";
import { DaysToShipChart, FinishedChart, MoneyChart, StepTimeChart } from "./_components/charts";

export const metadata: Metadata = { title: "Overview" };

/** The orders table's filters (app/(staff)/desk/orders). */
const ordersHref = (query: string) => `/desk/orders?${query}`;
const hours = (h: number) => (h >= 24 ? `${(h / 24).toFixed(1)} days` : `${h.toFixed(1)} h`);

export default async function OverviewPage() {
  await requirePermission("shop.overview", "/overview");
  const [f, activity, { currency, timeZone }] = await Promise.all([
    overviewFigures(),
    overviewActivity(),
    getShopLocale(),
  ]);
  const money = (cents: number) => formatMoney(cents, currency);
  const openValue = f.byState
    .filter((s) => s.status !== "shipped" && s.status !== "cancelled")
    .reduce((sum, s) => sum + s.valueCents, 0);
  const tiles = [
    {
      label: "Open orders",
      value: String(f.open),
      note: `${money(openValue)} in hand`,
      href: ordersHref("open=1"),
    },
    {
      label: "Late",
      value: String(f.late.count),
      note: "past their promised date",
      href: ordersHref("late=1"),
      alert: f.late.count > 0,
    },
    {
      label: "At risk",
      value: String(f.atRisk.count),
      note: "will miss the promise at today's pace",
      href: ordersHref("atRisk=1"),
      alert: f.atRisk.count > 0,
    },
    {
      label: "On hold",
      value: String(f.onHold.count),
      note: "shafts stopped at a step",
      href: ordersHref("onHold=1"),
    },
    {
      label: "Deposits held",
      value: money(f.money.depositsHeldCents),
      note: "paid on orders not yet shipped",
    },
    {
      label: "Balances due",
      value: money(f.money.balancesDueCents),
      note: `on ${f.money.balancesDueOrders} accepted orders`,
    },
  ];
  const measured = f.stepAverages.filter((s) => !s.isDefault);
  const totalFinished = f.finishedByWeek.reduce((s, w) => s + w.shafts, 0);
  const weeksLabel = `the last ${CHART_WEEKS} weeks`;

  return (
    <>
      <PageHeader title="Overview" description="Status, lateness, throughput and money at a glance." />
      <dl className="grid grid-cols-2 gap-3 sm:gap-4 md:grid-cols-3 xl:grid-cols-6">
        {tiles.map((t) => (
          <div key={t.label} className={`card p-4 ${t.alert ? "border-fail/60" : ""}`}>
            <dt className="text-sm text-ink-muted">{t.label}</dt>
            <dd className={`mt-1 text-2xl font-bold tabular-nums ${t.alert ? "text-fail" : ""}`}>
              {t.value}
            </dd>
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

      <div className="mt-8 grid gap-6 lg:grid-cols-2">
        <section aria-labelledby="by-state">
          <h2 id="by-state" className="mb-3 text-lg font-semibold">
            Orders by state
          </h2>
          <TableCard
            caption="Orders by state, with their count and value"
            headings={["State", { label: "Orders", align: "right" }, { label: "Value", align: "right" }]}
          >
            {f.byState.map((s) => (
              <tr key={s.status}>
                <td className={CELL}>{ORDER_STATUS_LABEL[s.status]}</td>
                <td className={`${CELL} text-right tabular-nums`}>
                  <Link href={ordersHref(`status=${s.status}`)} className="text-steel-600 underline">
                    {s.count}
                  </Link>
                </td>
                <td className={`${CELL} text-right tabular-nums`}>{money(s.valueCents)}</td>
              </tr>
            ))}
          </TableCard>
          <p className="mt-2 text-xs text-ink-muted">
            Awaiting a first payment: {money(f.money.awaitingCents)}. Balances due count orders received
            onwards, shipped ones still owing included.
          </p>
        </section>

        <section aria-labelledby="on-hold">
          <h2 id="on-hold" className="mb-3 text-lg font-semibold">
            On hold and why
          </h2>
          {f.onHold.items.length === 0 ? (
            <p className="card px-4 py-6 text-sm text-ink-muted">No shaft is on hold.</p>
          ) : (
            <ul className="divide-y divide-line card">
              {f.onHold.items.map((h) => (
                <li key={h.workOrderId} className="px-4 py-3 text-sm">
                  <div className="flex flex-wrap justify-between gap-x-3">
                    <span>
                      <Link href={`/desk/orders/${h.orderId}`} className="font-mono font-semibold">
                        {h.number}
                      </Link>{" "}
                      · <span className="font-mono">{h.serial}</span> · {h.customerName}
                    </span>
                    <span className="text-ink-muted">promised {h.promisedDate}</span>
                  </div>
                  <p className="mt-1">
                    <span className="font-medium">At {h.step}</span>
                    {h.since && (
                      <span className="text-ink-muted"> since {shopIsoDate(h.since, timeZone)}</span>
                    )}
                  </p>
                  {h.reasons.length > 0 ? (
                    <ul className="mt-1 list-disc pl-5 text-ink-soft">
                      {h.reasons.map((r) => (
                        <li key={r}>{r}</li>
                      ))}
                    </ul>
                  ) : (
                    <p className="text-ink-muted">No reason recorded.</p>
                  )}
                </li>
              ))}
            </ul>
          )}
        </section>
      </div>

      <section aria-labelledby="lateness" className="mt-8">
        <h2 id="lateness" className="mb-1 text-lg font-semibold">
          Late and at risk
        </h2>
        <p className="mb-3 text-sm text-ink-muted">
          Late: promised before today ({f.today}) and not yet shipped. At risk: not late yet, but the steps
          still ahead, at the shop&apos;s average time per step, end after the promised date.
        </p>
        {f.late.items.length === 0 && f.atRisk.items.length === 0 ? (
          <p className="card px-4 py-6 text-sm text-ink-muted">
            Every open order is on course for its promise.
          </p>
        ) : (
          <TableCard
            caption="Late and at-risk orders"
            headings={[
              "Order",
              "Customer",
              "State",
              "Promised",
              "Expected",
              { label: "Value", align: "right" },
            ]}
          >
            {f.late.items.map((o) => (
              <RiskRow
                key={o.id}
                order={o}
                value={money(o.totalCents)}
                mark={<span className="font-semibold text-fail">late</span>}
              >
                —
              </RiskRow>
            ))}
            {f.atRisk.items.map((o) => (
              <RiskRow
                key={o.id}
                order={o}
                value={money(o.totalCents)}
                mark={<span className="font-semibold text-warn">at risk</span>}
              >
                {o.expectedDate}{" "}
                <span className="text-ink-muted">
                  ({o.stepsLeft ? `${o.stepsLeft} step${o.stepsLeft === 1 ? "" : "s"}` : "not started"},{" "}
                  {hours(o.remainingHours)})
                </span>
              </RiskRow>
            ))}
          </TableCard>
        )}
      </section>

      <section aria-labelledby="money" className="mt-8">
        <h2 id="money" className="mb-3 text-lg font-semibold">
          Money by week
        </h2>
        <ChartCard
          id="money-chart"
          title={`Taken and refunded, ${weeksLabel}`}
          summary={`Taken ${money(f.money.takenCents)} (deposits and balances), refunded ${money(f.money.refundsCents)}. Weeks start on Monday (UTC).`}
          empty={
            f.money.takenCents + f.money.refundsCents === 0
              ? `No payments or refunds in ${weeksLabel}.`
              : null
          }
          chart={<MoneyChart data={f.money.weeks} />}
          table={{
            caption: "Money by week",
            headings: ["Week of", "Deposits", "Balances", "Refunds"],
            rows: f.money.weeks.map((w) => [
              w.week,
              money(w.depositsCents),
              money(w.balancesCents),
              money(w.refundsCents),
            ]),
          }}
        />
      </section>

      <section aria-labelledby="throughput" className="mt-8">
        <h2 id="throughput" className="mb-3 text-lg font-semibold">
          Throughput
        </h2>
        <div className="grid gap-4 lg:grid-cols-3">
          <ChartCard
            id="finished-chart"
            title="Shafts finished per week"
            summary={`${totalFinished} shafts passed final inspection in ${weeksLabel}.`}
            empty={totalFinished === 0 ? `No shaft passed final inspection in ${weeksLabel}.` : null}
            chart={<FinishedChart data={f.finishedByWeek} />}
            table={{
              caption: "Shafts finished per week",
              headings: ["Week of", "Shafts"],
              rows: f.finishedByWeek.map((w) => [w.week, w.shafts]),
            }}
          />
          <ChartCard
            id="ship-chart"
            title="Days from order to ship"
            summary={
              f.orderToShip.orders
                ? `${f.orderToShip.orders} orders left the shop in ${weeksLabel}; median ${f.orderToShip.medianDays} days from order.`
                : `No order left the shop in ${weeksLabel}.`
            }
            empty={f.orderToShip.orders === 0 ? `No order left the shop in ${weeksLabel}.` : null}
            chart={<DaysToShipChart data={f.orderToShip.histogram} />}
            table={{
              caption: "Orders by days from order to ship",
              headings: ["Days", "Orders"],
              rows: f.orderToShip.histogram.map((b) => [b.days, b.orders]),
            }}
          />
          <ChartCard
            id="step-chart"
            title="Time per step"
            summary={
              measured.length
                ? `Average from the previous sign-off, over the last ${AVERAGE_WINDOW_DAYS} days.${measured.length < f.stepAverages.length ? ` Steps without history assume ${DEFAULT_STEP_HOURS} h.` : ""}`
                : `No signed-off steps in the last ${AVERAGE_WINDOW_DAYS} days: each step assumes ${DEFAULT_STEP_HOURS} h (Yokeline default) until the shop has history.`
            }
            empty={null}
            chart={
              <StepTimeChart
                data={f.stepAverages.map((s) => ({ name: s.name, hours: Math.round(s.hours * 10) / 10 }))}
              />
            }
            table={{
              caption: "Average time per routing step",
              headings: ["Step", "Average", "Sign-offs measured"],
              rows: f.stepAverages.map((s) => [s.name, hours(s.hours), s.isDefault ? "default" : s.samples]),
            }}
          />
        </div>
      </section>

      <section className="mt-8" aria-labelledby="recent">
        <h2 id="recent" className="mb-3 text-lg font-semibold">
          Recent activity
        </h2>
        <p className="mb-3 text-sm text-ink-muted">
          <Link href="/desk/customers" className="text-steel-600 underline">
            {activity.customers} customers
          </Link>{" "}
          ·{" "}
          <Link href="/overview/staff" className="text-steel-600 underline">
            {activity.staff} staff
          </Link>
        </p>
        {activity.recent.length === 0 ? (
          <EmptyState icon={History} title="Nothing recorded yet" />
        ) : (
          <ol className="divide-y divide-line card">
            {activity.recent.map((e) => (
              <li key={e.id} className="flex flex-wrap justify-between gap-2 px-4 py-2 text-sm">
                <span>
                  <span className="font-medium">{e.actor}</span> ·{" "}
                  <span className="font-mono text-xs">{e.action}</span> · {e.subject}
                </span>
                <time dateTime={e.at} className="text-ink-muted">
                  {formatTimestamp(e.at, timeZone)}
                </time>
              </li>
            ))}
          </ol>
        )}
      </section>
    </>
  );
}

/** A late or at-risk order: number, customer, state, promised date with its mark, when expected (`children`), value. */
function RiskRow({
  order: o,
  value,
  mark,
  children,
}: {
  order: OrderListItem;
  /** The order's total in the shop's currency. */
  value: string;
  mark: React.ReactNode;
  children: React.ReactNode;
}) {
  return (
    <tr>
      <td className={`${CELL} font-mono font-semibold whitespace-nowrap`}>
        <Link href={`/desk/orders/${o.id}`}>{o.number}</Link>
      </td>
      <td className={CELL}>{o.customerName}</td>
      <td className={CELL}>{ORDER_STATUS_LABEL[o.status as keyof typeof ORDER_STATUS_LABEL] ?? o.status}</td>
      <td className={`${CELL} whitespace-nowrap`}>
        {o.promisedDate} {mark}
      </td>
      <td className={`${CELL} whitespace-nowrap`}>{children}</td>
      <td className={`${CELL} text-right tabular-nums`}>{value}</td>
    </tr>
  );
}
