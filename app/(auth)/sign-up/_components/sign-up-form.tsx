"use client";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { authClient } from "@/lib/auth/client";
import { signUpBodySchema, type SignUpBody } from "@/lib/auth/schemas";
import { Field } from "@/components/ui/field";
import { Alert } from "@/components/ui/alert";

interface ServerError {
  status?: number;
  message?: string;
  code?: string;
  fields?: Record<string, string>;
}

/**
 * Sign-up. With an invitation from the counter the address is fixed and the account is made at
 * once (the invitation proved the address); otherwise the server sends a verification link and
 * the page says to check the inbox.
 */
export function SignUpForm({ invite }: { invite?: { token: string; name: string; email: string } }) {
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<SignUpBody>({
    resolver: zodResolver(signUpBodySchema),
    defaultValues: invite ? { name: invite.name, email: invite.email } : undefined,
  });

  const showServerError = (error: ServerError) => {
    for (const [field, message] of Object.entries(error.fields ?? {})) {
      if (field === "name" || field === "email" || field === "password") setError(field, { message });
    }
    setFormError(
      error.code === "USER_ALREADY_EXISTS_USE_ANOTHER_EMAIL" || /exist/i.test(error.message ?? "")
        ? "An account with that e-mail already exists. Sign in instead."
        : (error.message ?? "Could not create the account. Try again."),
    );
  };

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    if (invite) {
      const res = await fetch("/api/auth/invite", {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({ token: invite.token, name: values.name, password: values.password }),
      });
      if (!res.ok) {
        const body = (await res.json().catch(() => ({}))) as { error?: ServerError };
        showServerError(body.error ?? {});
        return;
      }
      // A full page load, so every server component reads the new session.
      // eslint-disable-next-line @next/next/no-location-assign-relative-destination
      window.location.assign("/orders?welcome=1");
      return;
    }
    const { error } = await authClient.signUp.email({ ...values, callbackURL: "/orders?welcome=1" });
    if (error) {
      showServerError(error as ServerError);
      return;
    }
    // eslint-disable-next-line @next/next/no-location-assign-relative-destination
    window.location.assign(`/check-email?${new URLSearchParams({ email: values.email, from: "sign-up" })}`);
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {formError && <Alert tone="error">{formError}</Alert>}
      <Field label="Your name" autoComplete="name" {...register("name")} error={errors.name?.message} />
      <Field
        label="E-mail"
        type="email"
        autoComplete="email"
        readOnly={Boolean(invite)}
        hint={invite ? "The address the shop has on record for you." : undefined}
        {...register("email")}
        error={errors.email?.message}
      />
      <Field
        label="Password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        {...register("password")}
        error={errors.password?.message}
      />
      <button type="submit" className="btn-primary w-full" disabled={isSubmitting}>
        {isSubmitting ? "Creating your account…" : "Create account"}
      </button>
    </form>
  );
}
