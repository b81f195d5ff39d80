"use client";
import { useState } from "react";
import { signInBodySchema } from "@/lib/auth/schemas";
import { zodIssues } from "@/lib/validation";
import { Field } from "@/components/ui/field";
import { Alert } from "@/components/ui/alert";

export interface DemoAccount {
  role: string;
  email: string;
  password: string;
}

const MESSAGES: Record<string, string> = {
  credentials: "That e-mail and password do not match an account.",
  "too-many": "Too many sign-in attempts. Wait a minute, then try again.",
  invalid: "Enter your e-mail address and password.",
  locked: "Too many wrong passwords for this account. Wait 15 minutes, then try again.",
  deactivated: "This account has been deactivated. Ask the shop’s owner if you need access again.",
};

/**
 * A plain form that posts to /api/sign-in, so it works before (or without) JavaScript; in the
 * browser it checks the fields first with the same schema the server uses.
 */
export function SignInForm({
  next,
  error,
  email = "",
  demoAccounts = [],
}: {
  next?: string;
  error?: string;
  email?: string;
  demoAccounts?: DemoAccount[];
}) {
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [submitting, setSubmitting] = useState(false);
  const formError = error ? (MESSAGES[error] ?? MESSAGES.credentials) : null;

  return (
    <form
      method="post"
      action="/api/sign-in"
      noValidate
      className="space-y-4"
      onSubmit={(e) => {
        const data = new FormData(e.currentTarget);
        const parsed = signInBodySchema.safeParse({
          email: data.get("email"),
          password: data.get("password"),
        });
        if (!parsed.success) {
          e.preventDefault();
          setErrors(Object.fromEntries(zodIssues(parsed.error).map((i) => [i.path, i.message])));
          return;
        }
        setErrors({});
        setSubmitting(true);
      }}
    >
      {formError && <Alert tone="error">{formError}</Alert>}
      {next && <input type="hidden" name="next" value={next} />}
      <Field
        label="E-mail"
        name="email"
        type="email"
        autoComplete="email"
        defaultValue={email}
        error={errors.email}
      />
      <Field
        label="Password"
        name="password"
        type="password"
        autoComplete="current-password"
        error={errors.password}
      />
      <button type="submit" className="btn-primary w-full" disabled={submitting}>
        {submitting ? "Signing in…" : "Sign in"}
      </button>
      {demoAccounts.length > 0 && (
        <section
          aria-labelledby="demo-accounts"
          className="rounded-md border border-dashed border-line-strong p-3"
        >
          <h2 id="demo-accounts" className="text-sm font-semibold">
            Demo accounts
          </h2>
          <p className="field-hint">
            This is a demo shop with invented people. Every account’s password is{" "}
            <code className="font-mono text-ink">{demoAccounts[0]?.password}</code>.
          </p>
          <ul className="mt-2 divide-y divide-line text-sm">
            {demoAccounts.map((a) => (
              <li key={a.email} className="flex items-center justify-between gap-2 py-1.5">
                <span>
                  <span className="font-medium">{a.role}</span>{" "}
                  <span className="font-mono text-xs text-ink-muted">{a.email}</span>
                </span>
                <button
                  type="button"
                  className="btn-quiet px-2 py-1 text-xs"
                  aria-label={`Use the ${a.role} demo account`}
                  onClick={(e) => {
                    const form = e.currentTarget.form;
                    if (!form) return;
                    (form.elements.namedItem("email") as HTMLInputElement).value = a.email;
                    (form.elements.namedItem("password") as HTMLInputElement).value = a.password;
                  }}
                >
                  Use
                </button>
              </li>
            ))}
          </ul>
        </section>
      )}
    </form>
  );
}
