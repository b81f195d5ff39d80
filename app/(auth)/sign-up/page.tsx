import type { Metadata } from "next";
import Link from "next/link";
import { findInvite } from "@/lib/auth/invite";
import { Alert } from "@/components/ui/alert";
import { SignUpForm } from "./_components/sign-up-form";

export const metadata: Metadata = { title: "Create an account" };

export default async function SignUpPage({ searchParams }: PageProps<"/sign-up">) {
  const params = await searchParams;
  const token = typeof params.invite === "string" ? params.invite : null;
  const invite = token ? await findInvite(token) : null;
  return (
    <div className="card p-6 md:p-8">
      <h1 className="text-2xl font-bold">Create a customer account</h1>
      <p className="mt-1 mb-6 text-sm text-ink-muted">
        Design a shaft, see whether it is safe and what it costs, and follow it through the shop.
      </p>
      {token && !invite && (
        <div className="mb-4">
          <Alert tone="warning" title="This invitation no longer works">
            It has been used or has expired. You can still create an account below; we will e-mail you a link
            to confirm your address.
          </Alert>
        </div>
      )}
      {invite && (
        <div className="mb-4">
          <Alert tone="info">
            The shop invited you: once you choose a password, your orders with us are in your account.
          </Alert>
        </div>
      )}
      <SignUpForm invite={invite && token ? { token, name: invite.name, email: invite.email } : undefined} />
      <p className="mt-6 text-sm">
        Already have an account?{" "}
        <Link href="/sign-in" className="font-medium text-steel-600 underline">
          Sign in
        </Link>
      </p>
      <p className="mt-4 text-xs text-ink-muted">Shop staff: ask your shop’s owner for an account.</p>
    </div>
  );
}
