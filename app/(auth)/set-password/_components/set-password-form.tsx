"use client";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { authClient } from "@/lib/auth/client";
import { setPasswordBodySchema, type SetPasswordBody } from "@/lib/auth/schemas";
import { Field } from "@/components/ui/field";
import { Alert } from "@/components/ui/alert";

export function SetPasswordForm({ token }: { token: string }) {
  const [formError, setFormError] = useState<string | null>(null);
  const [done, setDone] = useState(false);
  const {
    register,
    handleSubmit,
    formState: { errors, isSubmitting },
  } = useForm<SetPasswordBody>({ resolver: zodResolver(setPasswordBodySchema) });

  const onSubmit = handleSubmit(async ({ password }) => {
    setFormError(null);
    const { error } = await authClient.resetPassword({ newPassword: password, token });
    if (error) {
      setFormError("This link has been used or has expired. Ask for a new one.");
      return;
    }
    setDone(true);
  });

  if (done) {
    return (
      <Alert tone="success" title="Password set">
        <a href="/sign-in" className="underline">
          Sign in
        </a>{" "}
        with your e-mail and the new password.
      </Alert>
    );
  }
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {formError && <Alert tone="error">{formError}</Alert>}
      <Field
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        {...register("password")}
        error={errors.password?.message}
      />
      <button type="submit" className="btn-primary w-full" disabled={isSubmitting || !token}>
        {isSubmitting ? "Saving…" : "Set password"}
      </button>
    </form>
  );
}
