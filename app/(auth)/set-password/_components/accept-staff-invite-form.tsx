"use client";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { acceptStaffInviteFormSchema, type AcceptStaffInviteForm as FormValues } from "@/lib/users/schemas";
import { Field } from "@/components/ui/field";
import { Alert } from "@/components/ui/alert";

interface ServerError {
  message?: string;
  fields?: Record<string, string>;
}

/** The invitee confirms their name and chooses a password; on success they land on their role's home. */
export function AcceptStaffInviteForm({
  token,
  name,
  email,
}: {
  token: string;
  name: string;
  email: string;
}) {
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<FormValues>({ resolver: zodResolver(acceptStaffInviteFormSchema), defaultValues: { name } });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    const res = await fetch("/api/auth/staff-invite", {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ token, ...values }),
    });
    const body = (await res.json().catch(() => ({}))) as { home?: string; error?: ServerError };
    if (!res.ok) {
      for (const [field, message] of Object.entries(body.error?.fields ?? {})) {
        if (field === "name" || field === "password") setError(field, { message });
      }
      setFormError(body.error?.message ?? "Could not set up the account. Try again.");
      return;
    }
    // A full page load, so every server component reads the new session.
    window.location.assign(body.home ?? "/");
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {formError && <Alert tone="error">{formError}</Alert>}
      <Field label="E-mail" type="email" value={email} readOnly hint="You sign in with this address." />
      <Field label="Your name" autoComplete="name" {...register("name")} error={errors.name?.message} />
      <Field
        label="Password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        {...register("password")}
        error={errors.password?.message}
      />
      <button type="submit" className="btn-primary w-full" disabled={isSubmitting}>
        {isSubmitting ? "Setting up…" : "Set password and sign in"}
      </button>
    </form>
  );
}
