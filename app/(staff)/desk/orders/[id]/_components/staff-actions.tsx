"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { formatMoney, parseMoney } from "@/lib/money";
import { useMutation } from "@/lib/browser/mutation";
import { refundPaymentAction } from "@/lib/actions/refund-payment";
import { requestBalanceAction } from "@/lib/actions/request-balance";
import { Alert } from "@/components/ui/alert";

interface PaymentRow {
  id: string;
  kind: string;
  amountCents: number;
  refundedCents: number;
  status: string;
  method: string;
}

const METHOD: Record<string, string> = {
  checkout: "card online",
  cash: "cash",
  cheque: "cheque",
  terminal: "card terminal",
};

/** What the counter and the owner can do to an order's money. */
export function StaffActions({
  orderId,
  currency,
  canRequestBalance,
  canRefund,
  payments,
}: {
  orderId: string;
  currency: string;
  canRequestBalance: boolean;
  canRefund: boolean;
  payments: PaymentRow[];
}) {
  const router = useRouter();
  const [message, setMessage] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const requestBalance = useMutation(requestBalanceAction);
  const refund = useMutation(refundPaymentAction);
  const busy = requestBalance.pending || refund.pending;
  const refundable = payments.filter((p) => p.status === "succeeded" && p.amountCents > p.refundedCents);
  if (!canRequestBalance && !(canRefund && refundable.length > 0) && !message) return null;

  return (
    <section className="no-print space-y-4 card p-5" aria-labelledby="staff-actions">
      <h2 id="staff-actions" className="text-lg font-semibold">
        Shop actions
      </h2>
      {message && <Alert tone={message.tone}>{message.text}</Alert>}
      {canRequestBalance && (
        <button
          type="button"
          className="btn-quiet w-full"
          disabled={busy}
          onClick={async () => {
            if (!window.confirm("E-mail the customer a link to pay the balance?")) return;
            const res = await requestBalance.run({ orderId });
            setMessage(
              res.ok
                ? {
                    tone: "success",
                    text: `Balance of ${formatMoney(res.data.amountCents, currency)} requested; the customer has the link by e-mail.`,
                  }
                : { tone: "error", text: res.error.message },
            );
            router.refresh();
          }}
        >
          {requestBalance.pending ? "Requesting…" : "Request the balance"}
        </button>
      )}
      {canRefund && refundable.length > 0 && (
        <form
          className="space-y-3 border-t border-line pt-4"
          onSubmit={async (e) => {
            e.preventDefault();
            const form = e.currentTarget;
            const data = new FormData(form);
            const parsed = parseMoney(String(data.get("amount") ?? ""));
            if (!parsed.ok) {
              setMessage({ tone: "error", text: parsed.message });
              return;
            }
            const amount = parsed.cents;
            const paymentId = String(data.get("paymentId"));
            const reason = String(data.get("reason") ?? "");
            const method = refundable.find((p) => p.id === paymentId)?.method ?? "checkout";
            if (
              !window.confirm(
                method === "checkout"
                  ? `Refund ${formatMoney(amount, currency)}? This sends money back to the customer's card.`
                  : `Record a refund of ${formatMoney(amount, currency)} given back by ${METHOD[method]}? Give the money back by hand.`,
              )
            )
              return;
            const res = await refund.run({ paymentId, amountCents: amount, reason });
            if (res.ok) {
              setMessage({
                tone: "success",
                text: `Refunded ${formatMoney(res.data.amountCents, currency)}.`,
              });
              form.reset();
            } else {
              setMessage({
                tone: "error",
                text: Object.values(res.error.fields ?? {})[0] ?? res.error.message,
              });
            }
            router.refresh();
          }}
        >
          <h3 className="font-semibold">Refund</h3>
          <div>
            <label htmlFor="refund-payment" className="field-label">
              Payment
            </label>
            <select id="refund-payment" name="paymentId" className="field-input">
              {refundable.map((p) => (
                <option key={p.id} value={p.id}>
                  {p.kind} ({METHOD[p.method] ?? p.method}) —{" "}
                  {formatMoney(p.amountCents - p.refundedCents, currency)} refundable
                </option>
              ))}
            </select>
          </div>
          <div>
            <label htmlFor="refund-amount" className="field-label">
              Amount ({currency})
            </label>
            <input
              id="refund-amount"
              name="amount"
              inputMode="decimal"
              autoComplete="off"
              required
              className="field-input"
            />
          </div>
          <div>
            <label htmlFor="refund-reason" className="field-label">
              Reason (the customer sees it)
            </label>
            <input id="refund-reason" name="reason" required minLength={3} className="field-input" />
          </div>
          <button type="submit" className="btn-quiet w-full" disabled={busy}>
            {refund.pending ? "Refunding…" : "Refund"}
          </button>
        </form>
      )}
    </section>
  );
}
