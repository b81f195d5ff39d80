"use client";
import { useState } from "react";
import { inviteCustomerAction } from "@/lib/actions/invite-customer";
import { useMutation } from "@/lib/browser/mutation";

/**
 * "Invite to an account": e-mails a phone customer a one-time sign-up link (desk screens). The
 * button is named by its row or sentence (the customer's name is beside it on every screen).
 */
export function InviteButton({ customerId }: { customerId: string }) {
  const invite = useMutation(inviteCustomerAction);
  const [outcome, setOutcome] = useState<{ ok: boolean; text: string } | null>(null);
  return (
    <span className="inline-flex flex-wrap items-center gap-2">
      <button
        type="button"
        className="btn-quiet px-2 py-1 text-xs"
        disabled={invite.pending}
        onClick={async () => {
          const result = await invite.run({ customerId });
          setOutcome(
            result.ok
              ? { ok: true, text: `Invitation sent to ${result.data.email}.` }
              : { ok: false, text: result.error.message },
          );
        }}
      >
        {invite.pending ? "Sending…" : "Invite to an account"}
      </button>
      {outcome && (
        <span role="status" className={`text-xs ${outcome.ok ? "text-ink-muted" : "text-fail"}`}>
          {outcome.text}
        </span>
      )}
    </span>
  );
}
