"use client";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { authClient } from "@/lib/auth/client";
import { signUpBodySchema, type SignUpBody } from "@/lib/auth/schemas";
import { Field } from "@/components/ui/field";
import { Alert } from "@/components/ui/alert";
import { SubmitButton } from "@/components/ui/submit-button";
import { sendJson, showFieldErrors, useMutation } from "@/lib/browser/mutation";
import type { ActionResult } from "@/lib/actions/define-action";
import { NewPasswordField } from "../../_components/new-password-field";

const ALREADY = "An account with that e-mail already exists. Sign in instead.";

/**
 * Sign-up. With an invitation from the counter the address is fixed and the account is made at
 * once (the invitation proved the address); otherwise the server sends a verification link and
 * the page says to check the inbox.
 */
export function SignUpForm({ invite }: { invite?: { token: string; name: string; email: string } }) {
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<SignUpBody>({
    resolver: zodResolver(signUpBodySchema),
    defaultValues: invite ? { name: invite.name, email: invite.email } : undefined,
  });
  const signUp = useMutation(async (values: SignUpBody): Promise<ActionResult<{ next: string }>> => {
    if (invite) {
      const res = await sendJson("/api/auth/invite", {
        body: { token: invite.token, name: values.name, password: values.password },
      });
      return res.ok ? { ok: true, data: { next: "/orders?welcome=1" } } : res;
    }
    // better-auth's client: its error comes back as a value; a dropped connection rejects, and
    // useMutation turns that into "could not be reached" (the button is usable again).
    const { error } = await authClient.signUp.email({ ...values, callbackURL: "/orders?welcome=1" });
    if (error)
      return {
        ok: false,
        error: {
          code: error.code ?? `http_${error.status}`,
          message:
            error.code === "USER_ALREADY_EXISTS_USE_ANOTHER_EMAIL" || /exist/i.test(error.message ?? "")
              ? ALREADY
              : (error.message ?? "Could not create the account. Try again."),
        },
      };
    return {
      ok: true,
      data: { next: `/check-email?${new URLSearchParams({ email: values.email, from: "sign-up" })}` },
    };
  });

  const onSubmit = handleSubmit(async (values) => {
    const res = await signUp.run(values);
    if (!res.ok) {
      showFieldErrors(setError, res.error, ["name", "email", "password"]);
      return;
    }
    // A full page load, so every server component reads the new session.
    window.location.assign(res.data.next);
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {signUp.error && (
        <Alert tone="error">{/exist/i.test(signUp.error.message) ? ALREADY : signUp.error.message}</Alert>
      )}
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
      <NewPasswordField {...register("password")} error={errors.password?.message} />
      <SubmitButton
        className="btn-primary w-full"
        pending={signUp.pending}
        busyLabel="Creating your account…"
      >
        Create account
      </SubmitButton>
    </form>
  );
}
