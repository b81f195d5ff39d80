"use client";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { placeOrderBodySchema, type PlaceOrderBody } from "@/lib/orders/schemas";
import { formatMoney, type OrderQuote } from "@/lib/pricing/price-book";
import { Totals } from "./shaft-summary";
import { Alert } from "@/components/ui/alert";

interface Props {
  designIds: string[];
  customerId?: string;
  quotes: { pickup: OrderQuote; ship: OrderQuote };
  depositPercent: number;
  /** Counter: give the checkout link to the customer instead of going there. */
  counter?: boolean;
}

/** Pickup or shipping, then place the order and go to the payment page. */
export function PlaceOrderForm({ designIds, customerId, quotes, depositPercent, counter }: Props) {
  const [error, setError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    control,
    formState: { errors, isSubmitting },
  } = useForm<PlaceOrderBody>({
    resolver: zodResolver(placeOrderBodySchema),
    defaultValues: { designIds, customerId, fulfilment: "pickup", shipTo: "", notes: "" },
  });
  const fulfilment = useWatch({ control, name: "fulfilment" });

  const onSubmit = handleSubmit(async (values) => {
    setError(null);
    const res = await fetch("/api/orders", {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify(values),
    });
    const body = await res.json().catch(() => null);
    if (!res.ok) {
      setError(body?.error?.message ?? "The order could not be placed. Nothing was charged.");
      return;
    }
    window.location.assign(
      counter
        ? `/desk/orders/${body.id}?placed=1`
        : (body.checkoutUrl ?? `/orders/${body.id}?checkout-unavailable=1`),
    );
  });

  const quote = quotes[fulfilment];
  const { currency } = quote;
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5">
      <Totals
        currency={currency}
        subtotalCents={quote.subtotalCents}
        shippingCents={quote.shippingCents}
        taxCents={quote.taxCents}
        totalCents={quote.totalCents}
      />
      {error && <Alert tone="error">{error}</Alert>}
      <fieldset>
        <legend className="field-label">Pickup or shipping</legend>
        <div className="grid gap-2 sm:grid-cols-2">
          <label className="flex cursor-pointer items-start gap-3 rounded-md border border-line-strong bg-white p-3 has-[:checked]:border-steel-600 has-[:checked]:ring-2 has-[:checked]:ring-brass-400">
            <input type="radio" value="pickup" {...register("fulfilment")} className="mt-1" />
            <span>
              <span className="block font-medium">Pick up at the shop</span>
              <span className="text-sm text-ink-muted">No charge</span>
            </span>
          </label>
          <label className="flex cursor-pointer items-start gap-3 rounded-md border border-line-strong bg-white p-3 has-[:checked]:border-steel-600 has-[:checked]:ring-2 has-[:checked]:ring-brass-400">
            <input type="radio" value="ship" {...register("fulfilment")} className="mt-1" />
            <span>
              <span className="block font-medium">Ship it</span>
              <span className="text-sm text-ink-muted">
                {formatMoney(quotes.ship.shippingCents / Math.max(1, designIds.length), currency)} per shaft,
                plus tax
              </span>
            </span>
          </label>
        </div>
      </fieldset>
      {fulfilment === "ship" && (
        <div>
          <label htmlFor="shipTo" className="field-label">
            Shipping address
          </label>
          <textarea
            id="shipTo"
            rows={3}
            className="field-input"
            autoComplete="shipping street-address"
            aria-invalid={errors.shipTo ? true : undefined}
            aria-describedby={errors.shipTo ? "shipTo-error" : undefined}
            {...register("shipTo")}
          />
          {errors.shipTo && (
            <p id="shipTo-error" className="field-error">
              {errors.shipTo.message}
            </p>
          )}
        </div>
      )}
      <div>
        <label htmlFor="notes" className="field-label">
          Notes for the shop <span className="font-normal text-ink-muted">(optional)</span>
        </label>
        <textarea id="notes" rows={2} className="field-input" {...register("notes")} />
      </div>
      <div className="rounded-md bg-paper-sunk p-3 text-sm">
        <p>
          Total <strong className="tabular-nums">{formatMoney(quote.totalCents, currency)}</strong>.{" "}
          {depositPercent >= 100
            ? "The shop asks for the full amount now."
            : `The shop asks for a ${depositPercent} % deposit now; the balance is due when the shaft passes final inspection.`}
        </p>
      </div>
      <button type="submit" className="btn-accent w-full sm:w-auto" disabled={isSubmitting}>
        {isSubmitting
          ? "Placing the order…"
          : counter
            ? `Place order (${formatMoney(quote.dueNowCents, currency)} due now)`
            : `Place order and pay ${formatMoney(quote.dueNowCents, currency)}`}
      </button>
    </form>
  );
}
