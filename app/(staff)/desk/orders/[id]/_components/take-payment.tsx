"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { Banknote, Mail } from "lucide-react";
import { centsToDecimal, formatMoney, parseMoney } from "@/lib/money";
import { useMutation } from "@/lib/browser/mutation";
import { sendPaymentLinkAction } from "@/lib/actions/send-payment-link";
import { recordCounterPaymentAction } from "@/lib/actions/record-counter-payment";
import { Alert } from "@/components/ui/alert";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { Field } from "@/components/ui/field";
import type { PaymentKind, PaymentMethod } from "@/lib/orders/states";

/** The counter takes every method but the hosted checkout. */
type Method = Exclude<PaymentMethod, "checkout">;
const METHODS: { value: Method; label: string; reference: string }[] = [
  { value: "terminal", label: "Card terminal", reference: "Terminal receipt reference" },
  { value: "cash", label: "Cash", reference: "Reference (optional)" },
  { value: "cheque", label: "Cheque", reference: "Cheque number" },
];
const KIND = { deposit: "deposit", balance: "balance", full: "full payment" } as const;

/** The counter takes the money: e-mail the customer a payment link, or record a payment taken here. */
export function TakePayment({
  orderId,
  currency,
  customerEmail,
  due,
  owedCents,
  blocked,
}: {
  orderId: string;
  currency: string;
  customerEmail: string;
  due: { kind: PaymentKind; amountCents: number } | null;
  owedCents: number;
  /** Why no payment can be taken now (cancelled, engineering sign-off), or null. */
  blocked: string | null;
}) {
  const router = useRouter();
  const sendLinkMutation = useMutation(sendPaymentLinkAction);
  const recordMutation = useMutation(recordCounterPaymentAction);
  const busy = sendLinkMutation.pending || recordMutation.pending;
  const [message, setMessage] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const [confirm, setConfirm] = useState<"link" | "record" | null>(null);
  const [method, setMethod] = useState<Method>("terminal");
  const [amount, setAmount] = useState(due ? centsToDecimal(due.amountCents) : "");
  const [reference, setReference] = useState("");
  const [errors, setErrors] = useState<Record<string, string>>({});
  const money = (c: number) => formatMoney(c, currency);
  const methodInfo = METHODS.find((m) => m.value === method)!;
  const parsed = parseMoney(amount);
  const cents = parsed.ok ? parsed.cents : Number.NaN;

  if (blocked)
    return (
      <section className="no-print space-y-3 card p-5" aria-labelledby="take-payment">
        <h2 id="take-payment" className="text-lg font-semibold">
          Take payment
        </h2>
        <Alert tone="warning">{blocked}</Alert>
      </section>
    );
  if (!due || owedCents <= 0) return null;

  async function sendLink() {
    const res = await sendLinkMutation.run({ orderId });
    setConfirm(null);
    setMessage(
      res.ok
        ? {
            tone: "success",
            text: `Payment link for the ${KIND[res.data.kind]} of ${money(res.data.amountCents)} e-mailed to ${customerEmail}.`,
          }
        : { tone: "error", text: res.error.message },
    );
    router.refresh();
  }

  async function record() {
    const res = await recordMutation.run({
      orderId,
      method,
      amountCents: cents,
      reference: reference.trim() || undefined,
    });
    setConfirm(null);
    if (res.ok) {
      setErrors({});
      setReference("");
      setMessage({
        tone: "success",
        text: `${methodInfo.label} payment of ${money(res.data.amountCents)} recorded.`,
      });
      router.refresh();
    } else {
      setErrors(res.error.fields ?? {});
      setMessage({ tone: "error", text: res.error.message });
    }
  }

  return (
    <section className="no-print space-y-4 card p-5" aria-labelledby="take-payment">
      <h2 id="take-payment" className="text-lg font-semibold">
        Take payment
      </h2>
      <p className="text-sm text-ink-muted">
        Due now: {KIND[due.kind]} of <strong className="text-ink">{money(due.amountCents)}</strong>
        {owedCents > due.amountCents ? ` (${money(owedCents)} owed in all)` : ""}.
      </p>
      {message && <Alert tone={message.tone}>{message.text}</Alert>}
      <button type="button" className="btn-quiet w-full" disabled={busy} onClick={() => setConfirm("link")}>
        <Mail className="size-4" aria-hidden="true" />
        E-mail a payment link
      </button>
      <form
        className="space-y-3 border-t border-line pt-4"
        noValidate
        onSubmit={(e) => {
          e.preventDefault();
          const local: Record<string, string> = {};
          if (!parsed.ok) local.amountCents = parsed.message;
          else if (cents <= 0) local.amountCents = "Enter the amount taken, e.g. 125.00.";
          else if (cents > owedCents) local.amountCents = `At most ${money(owedCents)} (what is still owed).`;
          if (method !== "cash" && !reference.trim())
            local.reference = `${methodInfo.reference} is required.`;
          setErrors(local);
          if (Object.keys(local).length === 0) setConfirm("record");
        }}
      >
        <h3 className="font-semibold">Record a payment taken here</h3>
        <fieldset>
          <legend className="field-label">Method</legend>
          <div className="flex flex-wrap gap-2">
            {METHODS.map((m) => (
              <label
                key={m.value}
                className="flex cursor-pointer items-center gap-2 rounded-md border border-line-strong px-3 py-1.5 text-sm has-[:checked]:border-steel-600 has-[:checked]:bg-steel-50"
              >
                <input
                  type="radio"
                  name="method"
                  value={m.value}
                  checked={method === m.value}
                  onChange={() => setMethod(m.value)}
                />
                {m.label}
              </label>
            ))}
          </div>
        </fieldset>
        <Field
          id="counter-amount"
          label={`Amount taken (${currency})`}
          inputMode="decimal"
          className="field-input tabular-nums"
          value={amount}
          onChange={(e) => setAmount(e.target.value)}
          error={errors.amountCents}
        />
        <Field
          id="counter-reference"
          label={methodInfo.reference}
          value={reference}
          maxLength={120}
          onChange={(e) => setReference(e.target.value)}
          error={errors.reference}
        />
        <button type="submit" className="btn-primary w-full" disabled={busy}>
          <Banknote className="size-4" aria-hidden="true" />
          {recordMutation.pending ? "Recording…" : "Record payment"}
        </button>
      </form>
      <ConfirmDialog
        open={confirm === "link"}
        title="E-mail a payment link?"
        confirmLabel="Send the link"
        busy={busy}
        onClose={() => setConfirm(null)}
        onConfirm={sendLink}
      >
        <p>
          {customerEmail} gets a link to pay the {KIND[due.kind]} of <strong>{money(due.amountCents)}</strong>{" "}
          by card.
        </p>
      </ConfirmDialog>
      <ConfirmDialog
        open={confirm === "record"}
        title="Record this payment?"
        confirmLabel={`Record ${Number.isFinite(cents) ? money(cents) : ""}`}
        busy={busy}
        onClose={() => setConfirm(null)}
        onConfirm={record}
      >
        <p>
          <strong>{Number.isFinite(cents) ? money(cents) : "—"}</strong> by {methodInfo.label.toLowerCase()}
          {reference.trim() ? ` (${reference.trim()})` : ""}. The customer gets a receipt; it cannot be
          deleted, only refunded by an owner.
        </p>
      </ConfirmDialog>
    </section>
  );
}
