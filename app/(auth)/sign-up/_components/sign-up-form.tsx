"use client";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { authClient } from "@/lib/auth/client";
import { signUpBodySchema, type SignUpBody } from "@/lib/auth/schemas";
import { Field } from "@/components/ui/field";
import { Alert } from "@/components/ui/alert";

export function SignUpForm() {
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    formState: { errors, isSubmitting },
  } = useForm<SignUpBody>({ resolver: zodResolver(signUpBodySchema) });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    const { error } = await authClient.signUp.email(values);
    if (error) {
      setFormError(
        error.status === 422 || /exist/i.test(error.message ?? "")
          ? "An account with that e-mail already exists. Sign in instead."
          : (error.message ?? "Could not create the account. Try again."),
      );
      return;
    }
    // A full page load, so every server component reads the new session.
    // eslint-disable-next-line @next/next/no-location-assign-relative-destination
    window.location.assign("/orders?welcome=1");
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {formError && <Alert tone="error">{formError}</Alert>}
      <Field label="Your name" autoComplete="name" {...register("name")} error={errors.name?.message} />
      <Field
        label="E-mail"
        type="email"
        autoComplete="email"
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
