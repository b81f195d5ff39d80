"use client";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { createStaffBodySchema, type CreateStaffBody } from "@/lib/auth/schemas";
import { createStaffAction } from "@/lib/actions/create-staff";
import { Field } from "@/components/ui/field";
import { Alert } from "@/components/ui/alert";

export function CreateStaffForm() {
  const [result, setResult] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const {
    register,
    handleSubmit,
    reset,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<CreateStaffBody>({
    resolver: zodResolver(createStaffBodySchema),
    defaultValues: { role: "counter" },
  });

  const onSubmit = handleSubmit(async (values) => {
    setResult(null);
    const res = await createStaffAction(values);
    if (res.ok) {
      setResult({ tone: "success", text: `${res.data.name} can now sign in as ${res.data.role}.` });
      reset({ name: "", email: "", password: "", role: values.role });
      return;
    }
    for (const [field, message] of Object.entries(res.error.fields ?? {})) {
      setError(field as keyof CreateStaffBody, { message });
    }
    setResult({ tone: "error", text: res.error.message });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {result && <Alert tone={result.tone}>{result.text}</Alert>}
      <Field label="Name" {...register("name")} error={errors.name?.message} />
      <Field label="E-mail" type="email" {...register("email")} error={errors.email?.message} />
      <div>
        <label htmlFor="staff-role" className="field-label">
          Role
        </label>
        <select
          id="staff-role"
          className="field-input"
          {...register("role")}
          aria-invalid={errors.role ? true : undefined}
        >
          <option value="counter">Counter — orders and payments</option>
          <option value="floor">Floor — scans travellers, records measurements</option>
          <option value="owner">Owner — everything</option>
        </select>
        {errors.role && <p className="field-error">{errors.role.message}</p>}
      </div>
      <Field
        label="First password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        {...register("password")}
        error={errors.password?.message}
      />
      <button type="submit" className="btn-primary w-full" disabled={isSubmitting}>
        {isSubmitting ? "Adding…" : "Add staff member"}
      </button>
    </form>
  );
}
