"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { updateOrderDetailsAction } from "@/lib/actions/update-order-details";
import type { OrderDetailsView } from "@/lib/orders/details";
import { useMutation } from "@/lib/browser/mutation";
import { Alert } from "@/components/ui/alert";
import { Field, TextAreaField } from "@/components/ui/field";

/**
 * The order's details the counter may change: the promised date and, for an order that ships, the
 * address. The save carries the version the page was opened with; if someone saved since, the
 * server refuses and says who, and this form keeps what was typed.
 */
export function OrderDetailsPanel({ orderId, details }: { orderId: string; details: OrderDetailsView }) {
  const router = useRouter();
  const [promisedDate, setPromisedDate] = useState(details.promisedDate);
  const [shipTo, setShipTo] = useState(details.shipTo ?? "");
  const save = useMutation(updateOrderDetailsAction);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const changed = promisedDate !== details.promisedDate || (shipTo || null) !== details.shipTo;

  return (
    <section className="no-print space-y-3 card p-5" aria-labelledby="order-details">
      <h2 id="order-details" className="text-lg font-semibold">
        Order details
      </h2>
      <form
        className="space-y-3"
        noValidate
        onSubmit={async (e) => {
          e.preventDefault();
          setMessage(null);
          // A failed call (even a dropped connection) keeps what was typed and frees the button.
          const res = await save.run({
            orderId,
            version: details.version,
            promisedDate,
            shipTo: details.fulfilment === "ship" ? shipTo : null,
          });
          if (res.ok) {
            setErrors({});
            setMessage({ tone: "success", text: "Saved." });
            router.refresh();
          } else {
            setErrors(res.error.fields ?? {});
            setMessage({ tone: "error", text: res.error.message });
          }
        }}
      >
        <Field
          id="details-promised"
          label="Promised date"
          type="date"
          value={promisedDate}
          onChange={(e) => setPromisedDate(e.target.value)}
          error={errors.promisedDate}
        />
        {details.fulfilment === "ship" && (
          <TextAreaField
            id="details-ship-to"
            label="Ship to"
            className="min-h-20"
            value={shipTo}
            onChange={(e) => setShipTo(e.target.value)}
            error={errors.shipTo}
          />
        )}
        {message && <Alert tone={message.tone === "success" ? "success" : "error"} title={message.text} />}
        <button type="submit" className="btn-quiet" disabled={save.pending || !changed}>
          {save.pending ? "Saving…" : "Save details"}
        </button>
      </form>
    </section>
  );
}
