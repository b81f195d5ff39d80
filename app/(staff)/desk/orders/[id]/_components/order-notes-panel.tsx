"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { Eye, Lock } from "lucide-react";
import type { OrderNoteView } from "@/lib/orders/views";
import type { NoteVisibility } from "@/lib/orders/states";
import { addOrderNoteAction } from "@/lib/actions/add-order-note";
import { useMutation } from "@/lib/browser/mutation";
import { Alert } from "@/components/ui/alert";
import { TextAreaField } from "@/components/ui/field";
import { ShopTime } from "@/components/shop-locale";

/** Notes on the order: every note for the shop, with who wrote it and when; add one, staff-only or for the customer. */
export function OrderNotesPanel({ orderId, notes }: { orderId: string; notes: OrderNoteView[] }) {
  const router = useRouter();
  const [body, setBody] = useState("");
  const [visibility, setVisibility] = useState<NoteVisibility>("staff");
  const add = useMutation(addOrderNoteAction);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<string | null>(null);

  return (
    <section className="no-print space-y-4 card p-5" aria-labelledby="order-notes">
      <h2 id="order-notes" className="text-lg font-semibold">
        Notes
      </h2>
      {notes.length === 0 ? (
        <p className="text-sm text-ink-muted">No notes yet.</p>
      ) : (
        <ul className="space-y-3">
          {notes.map((n) => (
            <li key={n.id} className="border-l-2 border-line pl-3 text-sm">
              <p className="whitespace-pre-wrap">{n.body}</p>
              <p className="mt-1 flex flex-wrap items-center gap-1.5 text-xs text-ink-muted">
                {n.visibility === "customer" ? (
                  <span className="inline-flex items-center gap-1 rounded-full bg-steel-50 px-2 py-0.5 font-semibold text-steel-900">
                    <Eye className="size-3" aria-hidden="true" /> Customer sees
                  </span>
                ) : (
                  <span className="inline-flex items-center gap-1 rounded-full bg-paper-sunk px-2 py-0.5 font-semibold">
                    <Lock className="size-3" aria-hidden="true" /> Staff only
                  </span>
                )}
                {n.byName} · <ShopTime at={n.at} />
              </p>
            </li>
          ))}
        </ul>
      )}
      <form
        className="space-y-3 border-t border-line pt-4"
        onSubmit={async (e) => {
          e.preventDefault();
          const res = await add.run({ orderId, body, visibility });
          if (res.ok) {
            setBody("");
            setErrors({});
            setMessage(
              visibility === "customer" ? "Note added; the customer sees it on their order." : "Note added.",
            );
            router.refresh();
          } else {
            setErrors(res.error.fields ?? { body: res.error.message });
            setMessage(null);
          }
        }}
      >
        {message && <Alert tone="success">{message}</Alert>}
        <TextAreaField
          id="note-body"
          label="Add a note"
          rows={3}
          value={body}
          maxLength={2000}
          onChange={(e) => setBody(e.target.value)}
          error={errors.body}
        />
        <fieldset className="space-y-1 text-sm">
          <legend className="field-label">Who sees it</legend>
          <label className="flex items-center gap-2">
            <input
              type="radio"
              name="visibility"
              checked={visibility === "staff"}
              onChange={() => setVisibility("staff")}
            />
            Staff only
          </label>
          <label className="flex items-center gap-2">
            <input
              type="radio"
              name="visibility"
              checked={visibility === "customer"}
              onChange={() => setVisibility("customer")}
            />
            The customer too (shown on their order page)
          </label>
          {errors.visibility && <p className="field-error">{errors.visibility}</p>}
        </fieldset>
        <button type="submit" className="btn-quiet w-full" disabled={add.pending || !body.trim()}>
          {add.pending ? "Adding…" : "Add note"}
        </button>
      </form>
    </section>
  );
}
