"use client";
import { useState } from "react";
import { CreditCard } from "lucide-react";

/** Opens the hosted checkout for the order's next payment. */
export function PayButton({ orderId, label }: { orderId: string; label: string }) {
  const [state, setState] = useState<{ pending: boolean; error: string | null }>({
    pending: false,
    error: null,
  });
  return (
    <div>
      <button
        type="button"
        className="btn-accent"
        disabled={state.pending}
        onClick={async () => {
          setState({ pending: true, error: null });
          const res = await fetch(`/api/orders/${orderId}/checkout`, { method: "POST" });
          const body = await res.json().catch(() => null);
          if (res.ok && body?.checkoutUrl) {
            window.location.assign(body.checkoutUrl);
            return;
          }
          setState({
            pending: false,
            error: body?.error?.message ?? "Could not open the payment page. Try again.",
          });
        }}
      >
        <CreditCard className="size-4" aria-hidden="true" />
        {state.pending ? "Opening the payment page…" : label}
      </button>
      {state.error && (
        <p role="alert" className="field-error">
          {state.error}
        </p>
      )}
    </div>
  );
}
