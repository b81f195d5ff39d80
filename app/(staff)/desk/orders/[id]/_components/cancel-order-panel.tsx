"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { Ban } from "lucide-react";
import type { CancellationQuote } from "@/lib/orders/cancel";
import { formatMoney } from "@/lib/money";
import { cancelOrderAction } from "@/lib/actions/cancel-order";
import { useMutation } from "@/lib/browser/mutation";
import { Alert } from "@/components/ui/alert";
import { TextAreaField } from "@/components/ui/field";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";

/**
 * Cancel with a reason. Before release the counter or an owner may; after release only an owner.
 * The confirmation shows what is refunded and what the shop keeps under its policy.
 */
export function CancelOrderPanel({
  orderId,
  orderNumber,
  currency,
  quote,
  mayCancel,
}: {
  orderId: string;
  orderNumber: string;
  currency: string;
  quote: CancellationQuote;
  /** False for the counter once the order is released (an owner must cancel). */
  mayCancel: boolean;
}) {
  const router = useRouter();
  const [reason, setReason] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [open, setOpen] = useState(false);
  const cancel = useMutation(cancelOrderAction);
  const money = (c: number) => formatMoney(c, currency);

  return (
    <section className="no-print space-y-3 card p-5" aria-labelledby="cancel-order">
      <h2 id="cancel-order" className="text-lg font-semibold">
        Cancel order
      </h2>
      {!mayCancel ? (
        <p className="text-sm text-ink-muted">
          This order is released to the shop: only an owner can cancel it now.
        </p>
      ) : (
        <form
          className="space-y-3"
          noValidate
          onSubmit={(e) => {
            e.preventDefault();
            if (reason.trim().length < 5) {
              setError("Say why the order is cancelled (at least 5 characters).");
              return;
            }
            setError(null);
            setOpen(true);
          }}
        >
          {quote.released && (
            <Alert tone="warning">
              Released to the shop: cancelling voids its travellers; the floor&apos;s scans are refused.
            </Alert>
          )}
          <TextAreaField
            id="cancel-reason"
            label="Reason (the customer reads it)"
            rows={2}
            value={reason}
            maxLength={500}
            onChange={(e) => setReason(e.target.value)}
            error={error}
          />
          <button type="submit" className="btn-quiet w-full text-fail" disabled={cancel.pending}>
            <Ban className="size-4" aria-hidden="true" />
            Cancel order…
          </button>
        </form>
      )}
      <ConfirmDialog
        open={open}
        title={`Cancel order ${orderNumber}?`}
        confirmLabel={
          quote.refundCents > 0 ? `Cancel and refund ${money(quote.refundCents)}` : "Cancel order"
        }
        tone="danger"
        busy={cancel.pending}
        onClose={() => setOpen(false)}
        onConfirm={async () => {
          const res = await cancel.run({ orderId, reason });
          setOpen(false);
          if (res.ok) router.refresh();
          else setError(res.error.fields?.reason ?? res.error.message);
        }}
      >
        <dl className="divide-y divide-line">
          <div className="flex justify-between py-1">
            <dt>Paid</dt>
            <dd className="tabular-nums">{money(quote.paidCents)}</dd>
          </div>
          <div className="flex justify-between py-1">
            <dt>Kept ({quote.feePercent} % of the deposit)</dt>
            <dd className="tabular-nums">{money(quote.feeCents)}</dd>
          </div>
          <div className="flex justify-between py-1 font-semibold">
            <dt>Refund</dt>
            <dd className="tabular-nums" data-testid="cancel-refund">
              {money(quote.refundCents)}
            </dd>
          </div>
        </dl>
        <p className="text-ink-muted">
          Card payments are refunded to the card; cash, cheque and terminal payments are recorded as refunded
          and given back by hand. The customer is e-mailed. This cannot be undone.
        </p>
      </ConfirmDialog>
    </section>
  );
}
