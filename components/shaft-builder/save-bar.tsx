"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { CheckCircle2, Loader2, Save, Send } from "lucide-react";
import type { ActionResult } from "@/lib/actions/define-action";
import { useMutation } from "@/lib/browser/mutation";
import type { EvaluationReport } from "@/lib/driveline";
import type { Drafts } from "./use-drafts";

/** "Save draft", what became of the last save, and "Start a new design" once a draft is open. */
export function SaveBar({ drafts, dirty }: { drafts: Drafts; dirty: boolean }) {
  const { status, draftId } = drafts;
  const line = drafts.saving ? (
    <span className="inline-flex items-center gap-1 text-ink-soft">
      <Loader2 className="size-4 animate-spin" aria-hidden="true" /> Saving…
    </span>
  ) : status.kind === "saved" ? (
    <span className="inline-flex items-center gap-1 font-medium text-pass">
      <CheckCircle2 className="size-4" aria-hidden="true" /> Saved ✓
    </span>
  ) : status.kind === "error" ? (
    <span className="font-medium text-fail">{status.message}</span>
  ) : draftId ? (
    <span className="text-ink-muted">{dirty ? "Unsaved changes" : "Draft open"}</span>
  ) : (
    <span className="text-ink-muted">Not saved yet</span>
  );
  return (
    <>
      <button type="submit" className="btn-primary" disabled={drafts.saving}>
        <Save className="size-4" aria-hidden="true" /> {draftId ? "Save draft" : "Save as draft"}
      </button>
      <span role="status" aria-live="polite" className="text-sm" data-testid="save-status">
        {line}
      </span>
      {draftId && (
        <button type="button" className="ml-auto btn-quiet" onClick={drafts.startNew}>
          Start a new design
        </button>
      )}
    </>
  );
}

/**
 * "Get a quote": saves the draft, then goes to its quote. Busy only while saving (a failed save
 * says why in the save status and frees the button) and while the quote page loads.
 */
export function QuoteButton({
  drafts,
  report,
  calculating = false,
  quoteHref,
  allowFailing,
}: {
  drafts: Drafts;
  /** The current (not stale) evaluation's report; null while the form has errors. */
  report: EvaluationReport | null;
  /** The form changed and its results are still being calculated (a moment). */
  calculating?: boolean;
  quoteHref: (draftId: string) => string;
  allowFailing: boolean;
}) {
  const router = useRouter();
  const [leaving, setLeaving] = useState(false);
  const quote = useMutation(async (): Promise<ActionResult<string>> => {
    const id = await drafts.save();
    return id ? { ok: true, data: id } : { ok: false, error: { code: "not_saved", message: "" } };
  });
  const fails = report?.overall === "fail";
  const blocked = calculating
    ? "Calculating your changes…"
    : !report
      ? "Fix the highlighted fields first."
      : fails && !allowFailing
        ? "A check fails: change the design (or take the suggested tube) until nothing fails."
        : null;
  const busy = quote.pending || leaving;
  return (
    <>
      <button
        type="button"
        className="btn-accent"
        onClick={async () => {
          const result = await quote.run();
          if (!result.ok) return;
          setLeaving(true);
          router.push(quoteHref(result.data));
        }}
        disabled={blocked !== null || busy}
        aria-describedby={blocked ? "quote-reason" : "quote-note"}
      >
        <Send className="size-4" aria-hidden="true" /> {busy ? "Saving…" : "Get a quote"}
      </button>
      {blocked ? (
        <p id="quote-reason" className="text-sm text-ink-soft">
          {blocked}
        </p>
      ) : (
        <p id="quote-note" className={`text-sm ${fails ? "font-semibold text-fail" : "text-ink-soft"}`}>
          {fails
            ? "A check FAILS. The quote shows the failure; an order placed from it waits for the owner's engineering sign-off."
            : "Saves the draft and takes you to the price and delivery date."}
        </p>
      )}
    </>
  );
}
