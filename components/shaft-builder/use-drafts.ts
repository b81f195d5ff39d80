"use client";

import { useState } from "react";
import type { UseFormReturn } from "react-hook-form";
import type { Catalogue } from "@/lib/driveline";
import type { DraftSummary, DraftView } from "@/lib/designs/drafts";
import type { ActionResult } from "@/lib/actions/define-action";
import { UNREACHABLE, sendJson, useMutation, type MutationError } from "@/lib/browser/mutation";
import { tryLoadBuilderCore } from "./load-builder-core";
import { defaultBuilderForm, type BuilderForm } from "./model";

/** What the save status line says (a request in flight is the mutation's `pending`). */
export type DraftStatus = { kind: "idle" } | { kind: "saved" } | { kind: "error"; message: string };

/** Drops `draft` from the address bar, keeping the rest (the counter's `customer`, for one). */
function forgetDraftInAddress() {
  const url = new URL(window.location.href);
  url.searchParams.delete("draft");
  window.history.replaceState(null, "", url.pathname + url.search);
}

const putDraft = (id: string | null, body: unknown) =>
  sendJson<DraftView>(id ? `/api/designs/${id}` : "/api/designs", { method: id ? "PUT" : "POST", body });
const removeDraft = (id: string) => sendJson<null>(`/api/designs/${id}`, { method: "DELETE" });

/** Reads one draft (a GET, so not `sendJson`); never throws: a dropped connection is `UNREACHABLE`. */
async function readDraft(id: string): Promise<ActionResult<DraftView>> {
  try {
    const res = await fetch(`/api/designs/${id}`);
    const body = (await res.json().catch(() => null)) as DraftView | null;
    if (res.ok && body?.id) return { ok: true, data: body };
    return { ok: false, error: { code: `http_${res.status}`, message: "That draft could not be opened." } };
  } catch {
    return { ok: false, error: UNREACHABLE };
  }
}

/** The builder's words for a failed draft request: the entries on screen are never lost. */
const failure = (error: MutationError, fallback: string) =>
  error.code === "unreachable"
    ? "No connection to the shop. Your entries are still here; try again."
    : error.message || fallback;

const summaryOf = (d: DraftView): DraftSummary => ({
  id: d.id,
  name: d.name,
  lengthMm: d.design.lengthMm,
  use: d.application.use,
  customerId: d.customerId,
  updatedAt: d.updatedAt,
});

/**
 * The drafts: the open draft's id, the list to load from, and save / open / delete / start anew,
 * each through `useMutation` (a failed call ends its busy state and says why in the status line).
 */
export function useDrafts({
  methods,
  catalogue,
  initialDraft,
  initialDrafts,
  customerId,
  draftHref,
}: {
  methods: UseFormReturn<BuilderForm>;
  catalogue: Catalogue;
  initialDraft?: DraftView | null;
  initialDrafts: readonly DraftSummary[];
  customerId?: string;
  draftHref: (draftId: string) => string;
}) {
  const [draftId, setDraftId] = useState<string | null>(initialDraft?.id ?? null);
  const [drafts, setDrafts] = useState<readonly DraftSummary[]>(initialDrafts);
  const [status, setStatus] = useState<DraftStatus>({ kind: "idle" });
  const saving = useMutation(putDraft);
  const opening = useMutation(readDraft);
  const deleting = useMutation(removeDraft);

  /** Saves the form as the open draft (or a new one); the draft's id, or null when it was not saved. */
  async function save(): Promise<string | null> {
    const current = methods.getValues();
    const core = await tryLoadBuilderCore();
    if (!core) {
      setStatus({ kind: "error", message: failure(UNREACHABLE, "") });
      return null;
    }
    const checked = core.validateBuilderForm(current, catalogue);
    if (!checked.design || !(await methods.trigger())) {
      setStatus({ kind: "error", message: "Fix the highlighted fields before saving." });
      return null;
    }
    setStatus({ kind: "idle" });
    const result = await saving.run(draftId, {
      name: current.name,
      design: checked.design,
      application: current.application,
      ...(customerId ? { customerId } : {}),
    });
    if (!result.ok || !result.data?.id) {
      if (!result.ok && result.error.code === "busy") return null;
      const message = result.ok
        ? "The draft could not be saved. Try again."
        : failure(result.error, "The draft could not be saved. Try again.");
      setStatus({ kind: "error", message });
      return null;
    }
    const saved = result.data;
    setDraftId(saved.id);
    setDrafts((list) => [summaryOf(saved), ...list.filter((d) => d.id !== saved.id)]);
    window.history.replaceState(null, "", draftHref(saved.id));
    setStatus({ kind: "saved" });
    return saved.id;
  }

  /** Opens a saved draft into the form; true once it is open. */
  async function open(id: string): Promise<boolean> {
    setStatus({ kind: "idle" });
    const result = await opening.run(id);
    if (!result.ok) {
      if (result.error.code !== "busy")
        setStatus({ kind: "error", message: failure(result.error, "That draft could not be opened.") });
      return false;
    }
    const core = await tryLoadBuilderCore();
    if (!core) {
      setStatus({ kind: "error", message: failure(UNREACHABLE, "") });
      return false;
    }
    methods.reset(core.initialForm(result.data));
    setDraftId(result.data.id);
    window.history.replaceState(null, "", draftHref(result.data.id));
    return true;
  }

  async function remove(id: string, name: string) {
    if (!window.confirm(`Delete the saved design “${name}”? Orders already placed keep their own copy.`))
      return;
    const result = await deleting.run(id);
    const gone = result.ok || result.error.code === "not_found" || result.error.code === "http_404";
    if (!gone) {
      if (result.error.code !== "busy")
        setStatus({ kind: "error", message: failure(result.error, "That draft could not be deleted.") });
      return;
    }
    setDrafts((list) => list.filter((d) => d.id !== id));
    // The form keeps what is on screen; it is simply no longer saved.
    if (id === draftId) {
      setDraftId(null);
      setStatus({ kind: "idle" });
      forgetDraftInAddress();
    }
  }

  function startNew() {
    methods.reset(defaultBuilderForm());
    setDraftId(null);
    setStatus({ kind: "idle" });
    forgetDraftInAddress();
  }

  /** A change to the form: "Saved ✓" no longer holds. */
  const markChanged = () => {
    if (status.kind === "saved") setStatus({ kind: "idle" });
  };

  return {
    draftId,
    drafts,
    status,
    saving: saving.pending,
    busy: opening.pending || deleting.pending,
    save,
    open,
    remove,
    startNew,
    markChanged,
  };
}

export type Drafts = ReturnType<typeof useDrafts>;
