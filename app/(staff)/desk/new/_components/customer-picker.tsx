"use client";
import { useEffect, useId, useRef, useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { Loader2, Search, UserPlus } from "lucide-react";
import type { CustomerRow } from "@/lib/customers";
import { createCustomerBodySchema, type CreateCustomerBody } from "@/lib/customers-schemas";
import { createCustomerAction } from "@/lib/actions/create-customer";
import { Field } from "@/components/ui/field";
import { Alert } from "@/components/ui/alert";
import { SubmitButton } from "@/components/ui/submit-button";
import { showFieldErrors, useMutation } from "@/lib/browser/mutation";

const CUSTOMER_FIELDS = Object.keys(createCustomerBodySchema.shape) as (keyof CreateCustomerBody)[];

type SearchState =
  | { kind: "idle" }
  | { kind: "loading" }
  | { kind: "done"; query: string; customers: CustomerRow[] }
  | { kind: "error"; message: string };

/** Asks the server for the customers matching `q` (at most `limit`). */
async function fetchCustomers(q: string, signal?: AbortSignal, limit = 8): Promise<CustomerRow[]> {
  const res = await fetch(`/api/customers/search?${new URLSearchParams({ q, limit: String(limit) })}`, {
    signal,
  });
  const body = (await res.json().catch(() => null)) as {
    customers?: CustomerRow[];
    error?: { message: string };
  } | null;
  if (!res.ok || !body?.customers) throw new Error(body?.error?.message ?? "The search did not answer.");
  return body.customers;
}

const describe = (c: CustomerRow) => [c.company, c.email, c.phone].filter(Boolean).join(" · ");

/** What a typed query most likely is, to start the new-customer form with it. */
function guessField(q: string): keyof CreateCustomerBody {
  if (q.includes("@")) return "email";
  if (/^[0-9+()\-.\s]+$/.test(q) && q.replace(/\D/g, "").length >= 3) return "phone";
  return "name";
}

/**
 * Step 1 of a phone order: who is it for? A keyboard-first search on the server (type, arrows,
 * Enter; Esc closes the list, then clears), or a new customer entered on the spot.
 */
export function CustomerPicker() {
  const router = useRouter();
  const listId = useId();
  const input = useRef<HTMLInputElement>(null);
  const [query, setQuery] = useState("");
  const [open, setOpen] = useState(false);
  const [active, setActive] = useState(0);
  const [search, setSearch] = useState<SearchState>({ kind: "idle" });
  const [choosing, setChoosing] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [existing, setExisting] = useState<CustomerRow | null>(null);
  const create = useMutation(createCustomerAction);
  const {
    register,
    handleSubmit,
    setValue,
    setFocus,
    setError: setFieldError,
    formState: { errors },
  } = useForm<CreateCustomerBody>({
    resolver: zodResolver(createCustomerBodySchema),
    defaultValues: { name: "", email: "", phone: "", company: "" },
  });

  // The counter picks up the phone and types: the search has the focus when the page opens.
  useEffect(() => input.current?.focus(), []);

  // Ask the server as the counter types (a short pause first; a newer query cancels the older).
  const q = query.trim();
  useEffect(() => {
    if (!q) return;
    const abort = new AbortController();
    const timer = setTimeout(() => {
      setSearch({ kind: "loading" });
      fetchCustomers(q, abort.signal).then(
        (customers) => {
          setSearch({ kind: "done", query: q, customers });
          setActive(0);
        },
        (e: unknown) => {
          if (!abort.signal.aborted)
            setSearch({ kind: "error", message: e instanceof Error ? e.message : "The search failed." });
        },
      );
    }, 150);
    return () => {
      clearTimeout(timer);
      abort.abort();
    };
  }, [q]);

  const customers = q && search.kind === "done" ? search.customers : [];
  // The options: the matches, then "new customer" with what was typed.
  const optionCount = q ? customers.length + 1 : 0;
  const expanded = open && optionCount > 0;
  const optionId = (i: number) => `${listId}-option-${i}`;

  const choose = (c: CustomerRow) => {
    setChoosing(c.name);
    router.push(`/desk/new?customer=${c.id}`);
  };
  const startNew = () => {
    setOpen(false);
    const field = guessField(q);
    if (q) setValue(field, q);
    setFocus("name");
  };
  const pick = (i: number) => {
    const c = customers[i];
    if (c) choose(c);
    else startNew();
  };

  const onKeyDown = (e: React.KeyboardEvent<HTMLInputElement>) => {
    if (e.key === "ArrowDown" || e.key === "ArrowUp") {
      if (optionCount === 0) return;
      e.preventDefault();
      if (!open) {
        setOpen(true);
        return;
      }
      setActive((i) => (i + (e.key === "ArrowDown" ? 1 : optionCount - 1)) % optionCount);
    } else if (e.key === "Home" && expanded) {
      e.preventDefault();
      setActive(0);
    } else if (e.key === "End" && expanded) {
      e.preventDefault();
      setActive(optionCount - 1);
    } else if (e.key === "Enter") {
      e.preventDefault();
      if (expanded) pick(Math.min(active, optionCount - 1));
    } else if (e.key === "Escape") {
      e.preventDefault();
      if (expanded) setOpen(false);
      else setQuery("");
    }
  };

  const onCreate = handleSubmit(async (values) => {
    setError(null);
    setExisting(null);
    const res = await create.run(values);
    if (res.ok) return choose(res.data);
    showFieldErrors(setFieldError, res.error, CUSTOMER_FIELDS);
    setError(res.error.message);
    // The e-mail is already a customer's: offer that customer instead.
    if (res.error.code === "conflict") {
      const match = await fetchCustomers(values.email, undefined, 5)
        .then((rows) => rows.find((c) => c.email.toLowerCase() === values.email.toLowerCase()) ?? null)
        .catch(() => null);
      setExisting(match);
    }
  });

  const status = !q
    ? "Type part of a name, phone, e-mail or company."
    : search.kind === "loading"
      ? "Searching…"
      : search.kind === "error"
        ? search.message
        : search.kind === "done"
          ? customers.length === 0
            ? `No customer matches “${search.query}”. Press Enter to enter a new customer.`
            : `${customers.length} ${customers.length === 1 ? "match" : "matches"}${customers.length >= 8 ? " (the first 8; type more to narrow)" : ""}. Arrows to move, Enter to choose.`
          : "";

  return (
    <div className="grid gap-6 lg:grid-cols-2">
      <section className="min-w-0 card p-5" aria-labelledby="existing">
        <h2 id="existing" className="text-lg font-semibold">
          An existing customer
        </h2>
        <label htmlFor="customer-search" className="mt-3 field-label">
          Find a customer by name, phone, e-mail or company
        </label>
        <div className="relative">
          <Search
            className="pointer-events-none absolute top-1/2 left-3 size-4 -translate-y-1/2 text-ink-muted"
            aria-hidden="true"
          />
          <input
            ref={input}
            id="customer-search"
            type="text"
            role="combobox"
            autoComplete="off"
            spellCheck={false}
            aria-autocomplete="list"
            aria-expanded={expanded}
            aria-controls={listId}
            aria-activedescendant={expanded ? optionId(Math.min(active, optionCount - 1)) : undefined}
            aria-describedby="customer-search-status"
            className="field-input pl-9"
            value={query}
            onChange={(e) => {
              setQuery(e.target.value);
              setOpen(true);
              setActive(0);
            }}
            onFocus={() => setOpen(true)}
            onBlur={() => setOpen(false)}
            onKeyDown={onKeyDown}
          />
          {search.kind === "loading" && q && (
            <Loader2
              className="absolute top-1/2 right-3 size-4 -translate-y-1/2 animate-spin text-ink-muted"
              aria-hidden="true"
            />
          )}
        </div>
        <p id="customer-search-status" role="status" aria-live="polite" className="field-hint">
          {choosing ? `Opening ${choosing}…` : status}
        </p>
        <ul
          id={listId}
          role="listbox"
          aria-label="Matching customers"
          hidden={!expanded}
          className="mt-2 max-h-96 divide-y divide-line overflow-y-auto rounded-md border border-line bg-white"
        >
          {customers.map((c, i) => (
            <li
              key={c.id}
              id={optionId(i)}
              role="option"
              aria-selected={i === active}
              className={`flex cursor-pointer items-center justify-between gap-3 px-3 py-2 ${i === active ? "bg-steel-50 outline-2 -outline-offset-2 outline-brass-500" : ""}`}
              // Keep the focus in the search box while the mouse picks.
              onMouseDown={(e) => e.preventDefault()}
              onMouseMove={() => setActive(i)}
              onClick={() => choose(c)}
            >
              <span className="min-w-0">
                <span className="block font-medium">{c.name}</span>
                <span className="block truncate text-sm text-ink-muted">{describe(c)}</span>
              </span>
              {!c.hasAccount && (
                <span className="shrink-0 rounded bg-paper-sunk px-1.5 py-0.5 text-xs text-ink-soft">
                  by phone
                </span>
              )}
            </li>
          ))}
          {q && (
            <li
              id={optionId(customers.length)}
              role="option"
              aria-selected={active === customers.length}
              className={`flex cursor-pointer items-center gap-2 px-3 py-2 text-steel-700 ${active === customers.length ? "bg-steel-50 outline-2 -outline-offset-2 outline-brass-500" : ""}`}
              onMouseDown={(e) => e.preventDefault()}
              onMouseMove={() => setActive(customers.length)}
              onClick={startNew}
            >
              <UserPlus className="size-4" aria-hidden="true" /> New customer “{q}”
            </li>
          )}
        </ul>
      </section>
      <section className="min-w-0 card p-5" aria-labelledby="new-customer">
        <h2 id="new-customer" className="text-lg font-semibold">
          A new customer
        </h2>
        <form className="mt-3 space-y-4" noValidate onSubmit={onCreate}>
          {error && <Alert tone="error">{error}</Alert>}
          {existing && (
            <div className="flex flex-wrap items-center gap-3 rounded-md border border-line bg-paper-sunk p-3 text-sm">
              <span>
                <strong>{existing.name}</strong> already has this e-mail ({describe(existing)}).
              </span>
              <button type="button" className="btn-quiet px-3 py-1.5" onClick={() => choose(existing)}>
                Use {existing.name}
              </button>
            </div>
          )}
          <Field label="Name" autoComplete="off" {...register("name")} error={errors.name?.message} />
          <Field
            label="E-mail"
            type="email"
            autoComplete="off"
            hint="Receipts and order updates go here."
            {...register("email")}
            error={errors.email?.message}
          />
          <Field
            label="Phone"
            type="tel"
            autoComplete="off"
            {...register("phone")}
            error={errors.phone?.message}
          />
          <Field
            label="Company (optional)"
            autoComplete="off"
            {...register("company")}
            error={errors.company?.message}
          />
          <SubmitButton pending={create.pending} busyLabel="Saving…">
            Save and start the order
          </SubmitButton>
        </form>
      </section>
    </div>
  );
}
