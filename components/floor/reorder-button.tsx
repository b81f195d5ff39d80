"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { RotateCcw } from "lucide-react";
import type { ActionResult } from "@/lib/actions/define-action";

/** "Reorder": a new draft with this shaft's design, opened in the builder. */
export function ReorderButton({
  serial,
  action,
}: {
  serial: string;
  action: (input: unknown) => Promise<ActionResult<{ draftId: string; href: string }>>;
}) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  return (
    <div>
      <button
        type="button"
        className="btn-primary min-h-12"
        disabled={busy}
        onClick={async () => {
          setBusy(true);
          setError(null);
          const res = await action({ serial });
          if (res.ok) router.push(res.data.href);
          else {
            setBusy(false);
            setError(res.error.message);
          }
        }}
      >
        <RotateCcw className="size-4" aria-hidden="true" />
        {busy ? "Making the draft…" : "Reorder this shaft"}
      </button>
      {error && (
        <p role="alert" className="field-error">
          {error}
        </p>
      )}
    </div>
  );
}
