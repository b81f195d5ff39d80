"use client";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { inviteStaffBodySchema, type InviteStaffBody } from "@/lib/users/schemas";
import { inviteStaffAction } from "@/lib/actions/invite-staff";
import { useMutation } from "@/lib/browser/mutation";
import { Field } from "@/components/ui/field";
import { Alert } from "@/components/ui/alert";

export function InviteStaffForm({ roles }: { roles: { value: InviteStaffBody["role"]; label: string }[] }) {
  const [result, setResult] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const invite = useMutation(inviteStaffAction);
  const {
    register,
    handleSubmit,
    reset,
    setError,
    formState: { errors },
  } = useForm<InviteStaffBody>({
    resolver: zodResolver(inviteStaffBodySchema),
    defaultValues: { role: "counter" },
  });

  const onSubmit = handleSubmit(async (values) => {
    setResult(null);
    const res = await invite.run(values);
    if (res.ok) {
      setResult({
        tone: "success",
        text: `Invitation sent to ${res.data.email}. The link works once, for seven days.`,
      });
      reset({ name: "", email: "", role: values.role });
      return;
    }
    for (const [field, message] of Object.entries(res.error.fields ?? {})) {
      setError(field as keyof InviteStaffBody, { message });
    }
    setResult({ tone: "error", text: res.error.message });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {result && <Alert tone={result.tone}>{result.text}</Alert>}
      <Field label="Name" autoComplete="off" {...register("name")} error={errors.name?.message} />
      <Field
        label="E-mail"
        type="email"
        autoComplete="off"
        {...register("email")}
        error={errors.email?.message}
      />
      <div>
        <label htmlFor="invite-role" className="field-label">
          Role
        </label>
        <select
          id="invite-role"
          className="field-input"
          {...register("role")}
          aria-invalid={errors.role ? true : undefined}
        >
          {roles.map((r) => (
            <option key={r.value} value={r.value}>
              {r.label}
            </option>
          ))}
        </select>
        {errors.role && <p className="field-error">{errors.role.message}</p>}
      </div>
      <button type="submit" className="btn-primary w-full" disabled={invite.pending}>
        {invite.pending ? "Sending…" : "Send invitation"}
      </button>
    </form>
  );
}
