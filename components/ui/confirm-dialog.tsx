"use client";
import { useEffect, useId, useRef } from "react";

/**
 * A modal confirmation on the browser's own <dialog>: focus moves into it, Escape cancels (unless
 * the action is under way), and focus returns to the button that opened it. Used before every action
 * that moves money, changes someone's access or cannot be undone.
 */
export function ConfirmDialog({
  open,
  title,
  children,
  confirmLabel,
  tone = "primary",
  busy = false,
  error,
  onConfirm,
  onClose,
}: {
  open: boolean;
  title: string;
  children?: React.ReactNode;
  confirmLabel: string;
  tone?: "primary" | "danger";
  busy?: boolean;
  error?: string | null;
  onConfirm: () => void;
  onClose: () => void;
}) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) dialog.showModal();
    if (!open && dialog.open) dialog.close();
  }, [open]);

  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onCancel={(e) => {
        if (busy) e.preventDefault();
      }}
      onClose={onClose}
      className="m-auto w-[min(28rem,calc(100vw-2rem))] rounded-card border border-line bg-paper-raised p-0 text-ink shadow-card backdrop:bg-ink/40"
    >
      {/* No <form> here: the dialog is often opened from inside another form (a nested form's
          submit would reach that one too). */}
      <div className="space-y-4 p-5">
        <h2 id={titleId} className="text-lg font-semibold">
          {title}
        </h2>
        {children && <div className="space-y-3 text-sm">{children}</div>}
        {error && (
          <p role="alert" className="rounded-md border border-fail/30 bg-fail-soft p-3 text-sm text-fail">
            {error}
          </p>
        )}
        <div className="flex flex-wrap justify-end gap-2">
          <button type="button" className="btn-quiet" onClick={onClose} disabled={busy}>
            Go back
          </button>
          <button
            type="button"
            className={tone === "danger" ? "btn bg-fail text-white hover:opacity-90" : "btn-primary"}
            disabled={busy}
            onClick={onConfirm}
          >
            {busy ? "Working…" : confirmLabel}
          </button>
        </div>
      </div>
    </dialog>
  );
}
