"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import type { CustomerRow } from "@/lib/customers";
import { createCustomerBodySchema, type CreateCustomerBody } from "@/lib/customers-schemas";
import { createCustomerAction } from "@/lib/actions/create-customer";
import { Field } from "@/components/ui/field";
import { Alert } from "@/components/ui/alert";

/** Step 1 of a phone order: who is it for? An existing customer, or a new one entered here. */
export function CustomerPicker({ customers }: { customers: CustomerRow[] }) {
  const router = useRouter();
  const [query, setQuery] = useState("");
  const [error, setError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError: setFieldError,
    formState: { errors, isSubmitting },
  } = useForm<CreateCustomerBody>({ resolver: zodResolver(createCustomerBodySchema) });
  const q = query.trim().toLowerCase();
  const shown = customers.filter(
    (c) => !q || [c.name, c.email, c.company ?? "", c.phone ?? ""].some((v) => v.toLowerCase().includes(q)),
  );
  const choose = (id: string) => router.push(`/desk/new?customer=${id}`);

  return (
    <div className="grid gap-6 lg:grid-cols-2">
      <section className="card p-5" aria-labelledby="existing">
        <h2 id="existing" className="text-lg font-semibold">
          An existing customer
        </h2>
        <label htmlFor="customer-search" className="mt-3 field-label">
          Search by name, company, e-mail or phone
        </label>
        <input
          id="customer-search"
          type="search"
          className="field-input"
          value={query}
          onChange={(e) => setQuery(e.target.value)}
        />
        <ul className="mt-3 max-h-96 divide-y divide-line overflow-y-auto" aria-label="Customers">
          {shown.map((c) => (
            <li key={c.id} className="flex items-center justify-between gap-3 py-2">
              <span>
                <span className="block font-medium">{c.name}</span>
                <span className="text-sm text-ink-muted">
                  {[c.company, c.email, c.phone].filter(Boolean).join(" · ")}
                </span>
              </span>
              <button
                type="button"
                className="btn-quiet px-3 py-1.5"
                onClick={() => choose(c.id)}
                aria-label={`Choose ${c.name}`}
              >
                Choose
              </button>
            </li>
          ))}
          {shown.length === 0 && (
            <li className="py-3 text-sm text-ink-muted">No customer matches “{query}”.</li>
          )}
        </ul>
      </section>
      <section className="card p-5" aria-labelledby="new-customer">
        <h2 id="new-customer" className="text-lg font-semibold">
          A new customer
        </h2>
        <form
          className="mt-3 space-y-4"
          noValidate
          onSubmit={handleSubmit(async (values) => {
            setError(null);
            const res = await createCustomerAction(values);
            if (res.ok) return choose(res.data.id);
            for (const [field, message] of Object.entries(res.error.fields ?? {}))
              setFieldError(field as keyof CreateCustomerBody, { message });
            setError(res.error.message);
          })}
        >
          {error && <Alert tone="error">{error}</Alert>}
          <Field label="Name" {...register("name")} error={errors.name?.message} />
          <Field
            label="E-mail"
            type="email"
            hint="Receipts and order updates go here."
            {...register("email")}
            error={errors.email?.message}
          />
          <Field label="Phone" type="tel" {...register("phone")} error={errors.phone?.message} />
          <Field label="Company (optional)" {...register("company")} error={errors.company?.message} />
          <button type="submit" className="btn-primary" disabled={isSubmitting}>
            {isSubmitting ? "Saving…" : "Save and start the order"}
          </button>
        </form>
      </section>
    </div>
  );
}
