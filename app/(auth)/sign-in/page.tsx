import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { getCurrentUser } from "@/lib/auth/guard";
import { ROLE_HOME } from "@/lib/auth/permissions";
import { demoAccounts } from "@/lib/demo";
import { isDemo } from "@/lib/shop/shop";
import { Alert } from "@/components/ui/alert";
import { safeNextPath } from "@/lib/http/safe-next";
import { SignInForm } from "./_components/sign-in-form";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: PageProps<"/sign-in">) {
  const params = await searchParams;
  const next = safeNextPath(params.next) ?? undefined;
  const error = typeof params.error === "string" ? params.error : undefined;
  const email = typeof params.email === "string" ? params.email : undefined;
  const user = await getCurrentUser();
  if (user) redirect(next ?? ROLE_HOME[user.role]);
  return (
    <div className="card p-6 md:p-8">
      <h1 className="text-2xl font-bold">Sign in</h1>
      <p className="mt-1 mb-6 text-sm text-ink-muted">
        Follow your orders, or get to work if you are on the shop’s staff.
      </p>
      {params["signed-out"] && (
        <div className="mb-4">
          <Alert tone="success">You are signed out.</Alert>
        </div>
      )}
      <SignInForm next={next} error={error} email={email} demoAccounts={isDemo() ? demoAccounts() : []} />
      <p className="mt-6 text-sm">
        New here?{" "}
        <Link href="/sign-up" className="font-medium text-steel-600 underline">
          Create a customer account
        </Link>
      </p>
    </div>
  );
}
