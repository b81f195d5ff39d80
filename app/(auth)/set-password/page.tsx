import type { Metadata } from "next";
import { SetPasswordForm } from "./_components/set-password-form";

export const metadata: Metadata = { title: "Choose your password" };

// The one-time link printed by `npm run owner:create` (and any password reset) lands here.
export default async function SetPasswordPage({ searchParams }: PageProps<"/set-password">) {
  const params = await searchParams;
  const token = typeof params.token === "string" ? params.token.slice(0, 200) : "";
  return (
    <div className="card p-6 md:p-8">
      <h1 className="text-2xl font-bold">Choose your password</h1>
      <p className="mt-1 mb-6 text-sm text-ink-muted">
        The link works once. Afterwards, sign in with this password.
      </p>
      <SetPasswordForm token={token} />
    </div>
  );
}
