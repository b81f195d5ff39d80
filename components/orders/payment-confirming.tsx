"use client";
import { useEffect, useState } from "react";
import { useRouter } from "next/navigation";
import { Loader2 } from "lucide-react";

/**
 * Shown after the checkout page sends the customer back: the payment is confirmed by the
 * provider's webhook, which may arrive a moment later, so refresh until it has.
 */
export function PaymentConfirming() {
  const router = useRouter();
  const [tries, setTries] = useState(0);
  useEffect(() => {
    if (tries >= 20) return;
    const t = setTimeout(() => {
      router.refresh();
      setTries((n) => n + 1);
    }, 1500);
    return () => clearTimeout(t);
  }, [tries, router]);
  return (
    <div
      role="status"
      className="flex items-center gap-2 rounded-md border border-steel-100 bg-steel-50 p-3 text-sm text-steel-900"
    >
      <Loader2 className="size-4 animate-spin" aria-hidden="true" />
      {tries < 20
        ? "Thank you — we are confirming your payment with the bank…"
        : "Your payment is taking longer than usual to confirm. It will show here as soon as it does; there is no need to pay again."}
    </div>
  );
}
