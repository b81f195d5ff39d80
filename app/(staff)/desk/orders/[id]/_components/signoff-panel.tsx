"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { ShieldAlert, ShieldCheck } from "lucide-react";
import type { SignoffShaftView } from "@/lib/orders/engineering-signoff";
import { acceptFailedCheckAction } from "@/lib/actions/accept-failed-check";
import { ACCEPTANCE_REASON_MIN_CHARS } from "@/lib/orders/desk-schemas";
import { useMutation } from "@/lib/browser/mutation";
import { Alert } from "@/components/ui/alert";
import { TextAreaField } from "@/components/ui/field";
import { ShopTime } from "@/components/shop-locale";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";

/**
 * The shafts whose frozen evaluation fails a check. Until an owner accepts each one for this
 * order, no payment is taken and the order is not released. Acceptance never changes the shop's
 * limits; the check still reads "fail" and the traveller prints the exception.
 */
export function SignoffPanel({
  orderId,
  shafts,
  canAccept,
}: {
  orderId: string;
  shafts: SignoffShaftView[];
  canAccept: boolean;
}) {
  const pending = shafts.some((s) => s.failed.some((c) => !c.acceptance));
  return (
    <section className="space-y-4 card border-fail/40 p-5" aria-labelledby="signoff">
      <h2 id="signoff" className="flex items-center gap-2 text-lg font-semibold">
        {pending ? (
          <ShieldAlert className="size-5 text-fail" aria-hidden="true" />
        ) : (
          <ShieldCheck className="size-5 text-pass" aria-hidden="true" />
        )}
        Engineering sign-off
      </h2>
      {pending ? (
        <Alert tone="error" title="Needs an owner's review">
          A shaft on this order fails an engineering check. No payment is taken and the order is not released
          until an owner accepts each failed check for this order with a written reason.
        </Alert>
      ) : (
        <p className="text-sm text-ink-muted">
          Every failed check is accepted for this order only. The checks still read &ldquo;fail&rdquo;; the
          shop&apos;s limits are unchanged, and the traveller prints each accepted exception.
        </p>
      )}
      <ul className="space-y-4">
        {shafts.flatMap((s) =>
          s.failed.map((c) => (
            <li key={`${s.shaftId}-${c.checkId}`} className="border-t border-line pt-3 text-sm">
              <p className="font-semibold">
                Shaft {s.position}, {s.name}: <span className="text-fail">FAILED</span> {c.message}
              </p>
              {c.acceptance ? (
                <p className="mt-1">
                  <span className="font-semibold">Accepted exception</span> by {c.acceptance.byName} on{" "}
                  <ShopTime at={c.acceptance.at} format="date" />: {c.acceptance.reason}
                </p>
              ) : canAccept ? (
                <AcceptForm orderId={orderId} shaftId={s.shaftId} checkId={c.checkId} message={c.message} />
              ) : (
                <p className="mt-1 text-ink-muted">Waiting for an owner to review this check.</p>
              )}
            </li>
          )),
        )}
      </ul>
    </section>
  );
}

function AcceptForm({
  orderId,
  shaftId,
  checkId,
  message,
}: {
  orderId: string;
  shaftId: string;
  checkId: string;
  message: string;
}) {
  const router = useRouter();
  const [reason, setReason] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [open, setOpen] = useState(false);
  const accept = useMutation(acceptFailedCheckAction);
  const id = `accept-${shaftId}-${checkId}`;
  return (
    <form
      className="mt-2 space-y-2"
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        if (reason.trim().length < ACCEPTANCE_REASON_MIN_CHARS) {
          setError(
            `Write why this check does not apply to this order (at least ${ACCEPTANCE_REASON_MIN_CHARS} characters).`,
          );
          return;
        }
        setError(null);
        setOpen(true);
      }}
    >
      <TextAreaField
        id={id}
        label="Why this check does not apply to this order"
        rows={2}
        value={reason}
        maxLength={1000}
        onChange={(e) => setReason(e.target.value)}
        error={error}
      />
      <button type="submit" className="btn-quiet" disabled={accept.pending}>
        Accept for this order…
      </button>
      <ConfirmDialog
        open={open}
        title="Accept this failed check?"
        confirmLabel="Accept for this order"
        tone="danger"
        busy={accept.pending}
        onClose={() => setOpen(false)}
        onConfirm={async () => {
          const res = await accept.run({ orderId, shaftId, checkId, reason });
          setOpen(false);
          if (res.ok) router.refresh();
          else setError(res.error.fields?.reason ?? res.error.message);
        }}
      >
        <p>
          <strong>{message}</strong>
        </p>
        <p>
          You accept this failed check for this one order, in your name. It is audited and printed on the
          traveller as an accepted exception. The shop&apos;s limits do not change. These results do not
          replace a qualified engineer.
        </p>
      </ConfirmDialog>
    </form>
  );
}
