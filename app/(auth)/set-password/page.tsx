import type { Metadata } from "next";
import Link from "next/link";
import { Alert } from "@/components/ui/alert";
import { ROLE_LABEL } from "@/lib/navigation";
import { closedInvitationMessage, lookupStaffInvitation, ROLE_DUTIES } from "@/lib/users/invitations";
import { AcceptStaffInviteForm } from "./_components/accept-staff-invite-form";

export const metadata: Metadata = { title: "Choose your password" };

const CLOSED_TITLE = {
  used: "This invitation has been used",
  withdrawn: "This invitation was withdrawn",
  expired: "This invitation has expired",
  unknown: "This link does not work",
} as const;

// A staff invitation's one-time link (an owner's e-mail, or the first owner's from
// `npm run owner:create`) lands here: choose a password, be signed in on the role's home.
export default async function SetPasswordPage({ searchParams }: PageProps<"/set-password">) {
  const params = await searchParams;
  const token = typeof params.token === "string" ? params.token.slice(0, 200) : "";
  const invitation = await lookupStaffInvitation(token);

  if (invitation.state !== "open") {
    return (
      <div className="card p-6 md:p-8">
        <h1 className="text-2xl font-bold">{CLOSED_TITLE[invitation.state]}</h1>
        <div className="mt-4">
          <Alert tone={invitation.state === "used" ? "info" : "warning"}>
            {closedInvitationMessage(invitation.state)}
          </Alert>
        </div>
        <p className="mt-6 text-sm">
          <Link href="/sign-in" className="font-medium text-steel-600 underline">
            Go to sign-in
          </Link>
        </p>
      </div>
    );
  }

  return (
    <div className="card p-6 md:p-8">
      <h1 className="text-2xl font-bold">Choose your password</h1>
      <p className="mt-1 mb-6 text-sm text-ink-muted">
        You are invited to the staff as <strong className="text-ink">{ROLE_LABEL[invitation.role]}</strong> (
        {ROLE_DUTIES[invitation.role]}). The link works once.
      </p>
      <AcceptStaffInviteForm token={token} name={invitation.name} email={invitation.email} />
    </div>
  );
}
