import type { Metadata } from "next";
import Link from "next/link";
import { signInBodySchema } from "@/lib/auth/schemas";
import { ResendLink } from "./_components/resend-link";

export const metadata: Metadata = { title: "Check your e-mail" };

// After sign-up, and on signing in before the address is confirmed: no session until it is.
export default async function CheckEmailPage({ searchParams }: PageProps<"/check-email">) {
  const params = await searchParams;
  const parsed = signInBodySchema.shape.email.safeParse(params.email);
  const email = parsed.success ? parsed.data : null;
  const fromSignIn = params.from === "sign-in";
  return (
    <div className="card p-6 md:p-8">
      <h1 className="text-2xl font-bold">Check your e-mail</h1>
      <p className="mt-3 text-sm">
        {fromSignIn ? "Your address is not confirmed yet. " : "Your account is made. "}
        We sent a link to {email ? <strong>{email}</strong> : "your address"}. Open it to confirm the address
        and sign in — until then the account cannot be used.
      </p>
      <p className="mt-3 text-sm text-ink-muted">
        The link works for one hour. Nothing arrived? Look in the spam folder, or send a new link.
      </p>
      {email && (
        <div className="mt-6">
          <ResendLink email={email} />
        </div>
      )}
      <p className="mt-6 text-sm">
        <Link href="/sign-in" className="font-medium text-steel-600 underline">
          Back to sign-in
        </Link>
      </p>
    </div>
  );
}
