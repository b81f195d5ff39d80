"use client";
import { CreditCard } from "lucide-react";
import { sendJson, useMutation } from "@/lib/browser/mutation";

/** Opens the hosted checkout for the order's next payment. */
export function PayButton({ orderId, label }: { orderId: string; label: string }) {
  const checkout = useMutation(() => sendJson<{ checkoutUrl?: string }>(`/api/orders/${orderId}/checkout`));
  return (
    <div>
      <button
        type="button"
        className="btn-accent"
        disabled={checkout.pending}
        onClick={async () => {
          const res = await checkout.run();
          if (res.ok && res.data.checkoutUrl) window.location.assign(res.data.checkoutUrl);
        }}
      >
        <CreditCard className="size-4" aria-hidden="true" />
        {checkout.pending ? "Opening the payment page…" : label}
      </button>
      {checkout.error && (
        <p role="alert" className="field-error">
          {checkout.error.message}
        </p>
      )}
    </div>
  );
}
