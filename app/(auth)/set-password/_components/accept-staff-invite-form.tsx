"use client";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { acceptStaffInviteFormSchema, type AcceptStaffInviteForm as FormValues } from "@/lib/users/schemas";
import { sendJson, showFieldErrors, useMutation } from "@/lib/browser/mutation";
import { Field } from "@/components/ui/field";
import { Alert } from "@/components/ui/alert";
import { SubmitButton } from "@/components/ui/submit-button";
import { NewPasswordField } from "../../_components/new-password-field";

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
  const accept = useMutation((values: FormValues) =>
    sendJson<{ home?: string }>("/api/auth/staff-invite", { body: { token, ...values } }),
  );
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<FormValues>({ resolver: zodResolver(acceptStaffInviteFormSchema), defaultValues: { name } });

  const onSubmit = handleSubmit(async (values) => {
    const res = await accept.run(values);
    if (!res.ok) {
      showFieldErrors(setError, res.error, ["name", "password"]);
      return;
    }
    // A full page load, so every server component reads the new session.
    window.location.assign(res.data.home ?? "/");
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {accept.error && <Alert tone="error">{accept.error.message}</Alert>}
      <Field label="E-mail" type="email" value={email} readOnly hint="You sign in with this address." />
      <Field label="Your name" autoComplete="name" {...register("name")} error={errors.name?.message} />
      <NewPasswordField {...register("password")} error={errors.password?.message} />
      <SubmitButton className="btn-primary w-full" pending={accept.pending} busyLabel="Setting up…">
        Set password and sign in
      </SubmitButton>
    </form>
  );
}
