import { AlertTriangle, ShieldAlert } from "lucide-react";
import type { ShaftView } from "@/lib/orders/views";
import { shaftUseLabel } from "@/lib/driveline/uses";
import { formatMoney } from "@/lib/money";
import { ShopTime } from "@/components/shop-locale";
import { CheckBadge } from "./status-badge";
import { RetubeBadge, RetubeSummary } from "./retube-summary";

/** One ordered shaft: what it goes in, its key engineering numbers, its checks and its price lines. */
export function ShaftSummary({
  shaft,
  currency,
  showChecks = true,
}: {
  shaft: ShaftView;
  currency: string;
  showChecks?: boolean;
}) {
  return (
    <article className="card p-5" aria-labelledby={`shaft-${shaft.id}`}>
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div>
          <h3 id={`shaft-${shaft.id}`} className="text-lg font-semibold">
            {shaft.position}. {shaft.name} {shaft.retube && <RetubeBadge />}
          </h3>
          {shaft.application && (
            <p className="text-sm text-ink-muted">
              {shaftUseLabel(shaft.application.use)} · {shaft.application.description}
            </p>
          )}
        </div>
        <CheckBadge status={shaft.overall} />
      </div>
      {shaft.needsSignoff && (
        <p
          className="mt-3 flex gap-2 rounded-md border border-fail bg-fail-soft p-3 text-sm font-semibold text-fail"
          data-testid="needs-signoff"
        >
          <ShieldAlert className="mt-0.5 size-4 shrink-0" aria-hidden="true" />
          Needs the owner&apos;s engineering sign-off: a check fails, and the shaft is not built until the
          owner has reviewed it.
        </p>
      )}
      {shaft.retube && <RetubeSummary retube={shaft.retube} shaftName={shaft.name} />}
      <dl className="mt-4 grid grid-cols-1 gap-x-6 gap-y-2 text-sm sm:grid-cols-2">
        {shaft.facts.map((f) => (
          <div key={f.label} className="flex justify-between gap-3 border-b border-dashed border-line py-1">
            <dt className="text-ink-muted">{f.label}</dt>
            <dd className="font-medium tabular-nums">{f.value}</dd>
          </div>
        ))}
      </dl>
      {showChecks && shaft.checks.some((c) => c.status !== "pass") && (
        <ul className="mt-4 space-y-1 text-sm">
          {shaft.checks
            .filter((c) => c.status !== "pass")
            .map((c) => (
              <li key={c.id} className="flex gap-2">
                <CheckBadge status={c.status} /> <span>{c.message}</span>
              </li>
            ))}
        </ul>
      )}
      {shaft.overall !== "pass" && shaft.cautions.length > 0 && (
        <p className="mt-3 flex gap-2 rounded-md bg-warn-soft p-3 text-sm text-warn">
          <AlertTriangle className="mt-0.5 size-4 shrink-0" aria-hidden="true" />
          {shaft.cautions[shaft.cautions.length - 1]}
        </p>
      )}
      {shaft.warningAcknowledgements.length > 0 && (
        <section className="mt-4 text-sm" aria-label={`Warnings acknowledged for ${shaft.name}`}>
          <h4 className="font-semibold">Warnings acknowledged when ordering</h4>
          <ul className="mt-1 space-y-1">
            {shaft.warningAcknowledgements.map((a) => (
              <li key={a.checkId} className="border-l-2 border-warn pl-2">
                <span className="block">{a.message}</span>
                <span className="text-xs text-ink-muted">
                  Acknowledged by {a.byName} {a.channel === "counter" ? "(counter, by phone)" : "(online)"} on{" "}
                  <ShopTime at={a.at} />
                </span>
              </li>
            ))}
          </ul>
        </section>
      )}
      <table className="mt-4 w-full text-sm">
        <caption className="sr-only">Price of {shaft.name}</caption>
        <tbody className="divide-y divide-line">
          {shaft.priceLines.map((l, i) => (
            <tr key={i}>
              <td className="py-1.5 pr-2">{l.label}</td>
              <td className="py-1.5 text-right whitespace-nowrap tabular-nums">
                {formatMoney(l.totalCents, currency)}
              </td>
            </tr>
          ))}
          <tr className="font-semibold">
            <td className="py-1.5">Shaft total</td>
            <td className="py-1.5 text-right tabular-nums">{formatMoney(shaft.priceCents, currency)}</td>
          </tr>
        </tbody>
      </table>
    </article>
  );
}

/** Subtotal, shipping, tax and total of an order or quote. */
export function Totals({
  currency,
  subtotalCents,
  shippingCents,
  taxCents,
  totalCents,
  children,
}: {
  currency: string;
  subtotalCents: number;
  shippingCents: number;
  taxCents: number;
  totalCents: number;
  children?: React.ReactNode;
}) {
  const row = (label: string, cents: number, strong = false) => (
    <div className={`flex justify-between py-1 ${strong ? "text-lg font-bold" : ""}`}>
      <dt>{label}</dt>
      <dd className="tabular-nums">{formatMoney(cents, currency)}</dd>
    </div>
  );
  return (
    <dl className="divide-y divide-line text-sm">
      {row("Shafts", subtotalCents)}
      {row("Shipping", shippingCents)}
      {row("Tax", taxCents)}
      {row("Total", totalCents, true)}
      {children}
    </dl>
  );
}
