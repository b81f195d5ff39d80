"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { resendStaffInvitationAction, revokeStaffInvitationAction } from "@/lib/actions/invite-staff";
import { useConfirmedMutation } from "@/lib/browser/mutation";
import { Alert } from "@/components/ui/alert";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";

/** One open invitation as the list shows it (dates already in words). */
export interface InvitationView {
  id: string;
  name: string;
  email: string;
  roleLabel: string;
  sent: string;
  sendCount: number;
  expires: string;
  expired: boolean;
  invitedBy: string | null;
}

type Choice = { kind: "resend" | "revoke"; invitation: InvitationView };

/** Invitations not yet accepted, each with Resend and Withdraw (both confirmed). */
export function PendingInvitations({ invitations }: { invitations: InvitationView[] }) {
  const router = useRouter();
  const [notice, setNotice] = useState<string | null>(null);
  const act = useConfirmedMutation(
    ({ kind, invitation }: Choice) =>
      kind === "resend"
        ? resendStaffInvitationAction({ invitationId: invitation.id })
        : revokeStaffInvitationAction({ invitationId: invitation.id }),
    ({ kind, invitation }) => {
      setNotice(
        kind === "resend"
          ? `A new link went to ${invitation.email}; the earlier one no longer works.`
          : `The invitation to ${invitation.email} is withdrawn.`,
      );
      router.refresh();
    },
  );
  const pending = act.choice;

  if (invitations.length === 0 && !notice) {
    return (
      <p className="card p-4 text-sm text-ink-muted">
        No invitations waiting. People you invite appear here until they choose their password.
      </p>
    );
  }

  return (
    <div className="space-y-3">
      {notice && <Alert tone="success">{notice}</Alert>}
      <ul className="divide-y divide-line card" aria-label="Pending invitations">
        {invitations.map((i) => (
          <li key={i.id} className="flex flex-wrap items-center justify-between gap-3 p-4">
            <div className="min-w-0">
              <p className="font-medium">
                {i.name} <span className="text-sm font-normal text-ink-muted">· {i.roleLabel}</span>
              </p>
              <p className="truncate text-sm text-ink-muted">{i.email}</p>
              <p className="text-xs text-ink-muted">
                Sent {i.sent}
                {i.sendCount > 1 ? ` (${i.sendCount} times)` : ""}
                {i.invitedBy ? ` by ${i.invitedBy}` : ""} ·{" "}
                {i.expired ? (
                  <span className="font-semibold text-warn">expired {i.expires}</span>
                ) : (
                  <>link valid until {i.expires}</>
                )}
              </p>
            </div>
            <div className="flex gap-2">
              <button
                type="button"
                className="btn-quiet px-3 py-1.5 text-xs"
                aria-label={`Resend the invitation to ${i.email}`}
                onClick={() => {
                  setNotice(null);
                  act.ask({ kind: "resend", invitation: i });
                }}
              >
                Resend
              </button>
              <button
                type="button"
                className="btn-quiet px-3 py-1.5 text-xs"
                aria-label={`Withdraw the invitation to ${i.email}`}
                onClick={() => {
                  setNotice(null);
                  act.ask({ kind: "revoke", invitation: i });
                }}
              >
                Withdraw
              </button>
            </div>
          </li>
        ))}
      </ul>
      <ConfirmDialog
        {...act.dialog}
        tone={pending?.kind === "revoke" ? "danger" : "primary"}
        title={
          pending?.kind === "revoke"
            ? `Withdraw the invitation to ${pending.invitation.name}?`
            : `Send ${pending?.invitation.name ?? ""} a new link?`
        }
        confirmLabel={pending?.kind === "revoke" ? "Withdraw" : "Send new link"}
      >
        {pending?.kind === "revoke" ? (
          <p>The link in their e-mail stops working at once. You can invite them again later.</p>
        ) : (
          <p>
            A new link, valid for seven days, goes to {pending?.invitation.email}. The link sent before stops
            working.
          </p>
        )}
      </ConfirmDialog>
    </div>
  );
}
