"use client";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { placeOrderBodySchema, type PlaceOrderBody } from "@/lib/orders/schemas";
import { formatMoney } from "@/lib/money";
import { sendJson, useMutation } from "@/lib/browser/mutation";
import type { OrderQuote } from "@/lib/pricing/price-book";
import { Totals } from "./shaft-summary";
import { Alert } from "@/components/ui/alert";
import type { AckItem } from "@/lib/orders/acknowledgements";

interface Props {
  designIds: string[];
  customerId?: string;
  quotes: { pickup: OrderQuote; ship: OrderQuote };
  depositPercent: number;
  /** Counter: give the checkout link to the customer instead of going there. */
  counter?: boolean;
  /** Per design (in order): the warnings (and, at the counter, failed checks) to acknowledge. */
  acknowledge?: { name: string; items: AckItem[] }[];
}

const ackField = (i: number) => `shafts[${i}].acknowledgements`;

/** Pickup or shipping, then place the order and go to the payment page. */
export function PlaceOrderForm({
  designIds,
  customerId,
  quotes,
  depositPercent,
  counter,
  acknowledge = [],
}: Props) {
  const [error, setError] = useState<string | null>(null);
  const place = useMutation((body: unknown) =>
    sendJson<{ id: string; checkoutUrl?: string | null }>("/api/orders", { body }),
  );
  // Ticked check ids per design (by id: removing a shaft from the quote never moves a tick to
  // another); the server re-evaluates and refuses any warning left out.
  const [ackedById, setAcked] = useState<Record<string, string[]>>({});
  const acked = designIds.map((id) => ackedById[id] ?? []);
  const [ackErrors, setAckErrors] = useState<Record<string, string>>({});
  const toggle = (i: number, checkId: string, on: boolean) => {
    const id = designIds[i]!;
    setAcked((all) => {
      const ids = (all[id] ?? []).filter((x) => x !== checkId);
      return { ...all, [id]: on ? [...ids, checkId] : ids };
    });
    setAckErrors((errs) => {
      const { [ackField(i)]: _drop, ...rest } = errs;
      return rest;
    });
  };
  const focusFirstUnticked = () =>
    document
      .querySelector<HTMLInputElement>(
        '[data-testid="acknowledgements"] input[type="checkbox"]:not(:checked)',
      )
      ?.focus();
  const {
    register,
    handleSubmit,
    control,
    formState: { errors },
  } = useForm<PlaceOrderBody>({
    resolver: zodResolver(placeOrderBodySchema),
    defaultValues: { designIds, customerId, fulfilment: "pickup", shipTo: "", notes: "" },
  });
  const fulfilment = useWatch({ control, name: "fulfilment" });

  const onSubmit = handleSubmit(async (values) => {
    setError(null);
    const missing: Record<string, string> = {};
    acknowledge.forEach((shaft, i) => {
      const left = shaft.items.filter((item) => !acked[i]?.includes(item.checkId));
      if (left.length > 0)
        missing[ackField(i)] =
          `Tick each ${left.length === 1 ? "item" : `of the ${left.length} items`} for ${shaft.name} to place the order.`;
    });
    setAckErrors(missing);
    if (Object.keys(missing).length > 0) {
      focusFirstUnticked();
      return;
    }
    const res = await place.run({
      ...values,
      shafts: designIds.map((_, i) => ({ acknowledgements: acked[i] ?? [] })),
    });
    if (!res.ok) {
      const fields = res.error.fields ?? {};
      const fromServer = Object.fromEntries(Object.entries(fields).filter(([k]) => k.startsWith("shafts[")));
      setAckErrors(fromServer);
      setError(res.error.message);
      if (Object.keys(fromServer).length > 0) focusFirstUnticked();
      return;
    }
    const placed = res.data;
    window.location.assign(
      counter
        ? `/desk/orders/${placed.id}?placed=1`
        : (placed.checkoutUrl ?? `/orders/${placed.id}?checkout-unavailable=1`),
    );
  });

  const quote = quotes[fulfilment];
  const { currency } = quote;
  return (
    <form
      onSubmit={onSubmit}
      // Enter on a choice or a checkbox never places the order by surprise: only the button does.
      onKeyDown={(e) => {
        if (e.key === "Enter" && e.target instanceof HTMLInputElement) e.preventDefault();
      }}
      noValidate
      className="space-y-5"
    >
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
      {acknowledge.some((a) => a.items.length > 0) && (
        <div className="space-y-3" data-testid="acknowledgements">
          {acknowledge.map((shaft, i) =>
            shaft.items.length === 0 ? null : (
              <fieldset
                key={i}
                className="space-y-2 rounded-md border border-warn bg-warn-soft/60 p-3"
                aria-describedby={ackErrors[ackField(i)] ? `ack-${i}-error` : undefined}
              >
                <legend className="px-1 text-sm font-semibold">
                  {counter ? "Read to the customer and acknowledge" : "Acknowledge before ordering"}:{" "}
                  {shaft.name}
                </legend>
                {shaft.items.map((item) => (
                  <label key={item.checkId} className="flex cursor-pointer items-start gap-2 text-sm">
                    <input
                      type="checkbox"
                      className="mt-0.5 size-4 shrink-0 accent-steel-700"
                      name={ackField(i)}
                      value={item.checkId}
                      checked={acked[i]?.includes(item.checkId) ?? false}
                      onChange={(e) => toggle(i, item.checkId, e.target.checked)}
                    />
                    <span>
                      {item.status === "fail" ? (
                        <>
                          <strong className="text-fail">Fails:</strong> {item.message}.{" "}
                          <em>
                            I have told the customer this shaft fails the check and the order waits for the
                            owner&apos;s engineering sign-off.
                          </em>
                        </>
                      ) : (
                        <>
                          <strong className="text-warn">Warning:</strong> {item.message}.{" "}
                          <em>
                            {counter
                              ? "I have read this warning to the customer and they want the shaft as designed."
                              : "I have read this warning and want the shaft as designed."}
                          </em>
                        </>
                      )}
                    </span>
                  </label>
                ))}
                {ackErrors[ackField(i)] && (
                  <p id={`ack-${i}-error`} className="field-error" role="alert">
                    {ackErrors[ackField(i)]}
                  </p>
                )}
              </fieldset>
            ),
          )}
        </div>
      )}
      <div className="rounded-md bg-paper-sunk p-3 text-sm">
        <p>
          Total <strong className="tabular-nums">{formatMoney(quote.totalCents, currency)}</strong>.{" "}
          {depositPercent >= 100
            ? "The shop asks for the full amount now."
            : `The shop asks for a ${depositPercent} % deposit now; the balance is due when the shaft passes final inspection.`}
        </p>
      </div>
      <button type="submit" className="btn-accent w-full sm:w-auto" disabled={place.pending}>
        {place.pending
          ? "Placing the order…"
          : counter
            ? `Place order (${formatMoney(quote.dueNowCents, currency)} due now)`
            : `Place order and pay ${formatMoney(quote.dueNowCents, currency)}`}
      </button>
    </form>
  );
}
