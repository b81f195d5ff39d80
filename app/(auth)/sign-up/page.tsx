import type { Metadata } from "next";
import Link from "next/link";
import { SignUpForm } from "./_components/sign-up-form";

export const metadata: Metadata = { title: "Create an account" };

export default function SignUpPage() {
  return (
    <div className="card p-6 md:p-8">
      <h1 className="text-2xl font-bold">Create a customer account</h1>
      <p className="mt-1 mb-6 text-sm text-ink-muted">
        Design a shaft, see whether it is safe and what it costs, and follow it through the shop.
      </p>
      <SignUpForm />
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
