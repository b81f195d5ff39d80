"use client";
import { useState } from "react";
import { useRouter } from "next/navigation";
import { useMutation } from "@/lib/browser/mutation";
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
  const reorder = useMutation(action);
  // Stays busy after success while the builder opens.
  const [opening, setOpening] = useState(false);
  const busy = reorder.pending || opening;
  return (
    <div>
      <button
        type="button"
        className="btn-primary min-h-12"
        disabled={busy}
        onClick={async () => {
          const res = await reorder.run({ serial });
          if (res.ok) {
            setOpening(true);
            router.push(res.data.href);
          }
        }}
      >
        <RotateCcw className="size-4" aria-hidden="true" />
        {busy ? "Making the draft…" : "Reorder this shaft"}
      </button>
      {reorder.error && (
        <p role="alert" className="field-error">
          {reorder.error.message}
        </p>
      )}
    </div>
  );
}
