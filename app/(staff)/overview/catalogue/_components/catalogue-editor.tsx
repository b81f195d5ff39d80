"use client";
import { memo, useEffect, useState } from "react";
import { useRouter } from "next/navigation";
import { FormProvider, useForm, useFormContext, useFormState, type FieldErrors } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { Alert } from "@/components/ui/alert";
import { describePath } from "@/lib/catalogue/describe";
import { diffConfig, type ConfigChange } from "@/lib/catalogue/diff";
import {
  shopConfigDocumentSchema,
  type ShopConfigDocument,
  type ShopConfigDocumentInput,
} from "@/lib/catalogue/schemas";
import { sendJson, useMutation } from "@/lib/browser/mutation";
import { FloorSection, LimitsSection, PolicySection } from "./editor-sections";
import {
  CentreBearingsSection,
  FittingsSection,
  JointsSection,
  MaterialsSection,
  SlipYokesSection,
  TubesSection,
} from "./catalogue-lists";
import { ChangesTable } from "./changes-table";
import type { Path } from "./editor-inputs";

/** Every field message in the form's error tree, with its dotted path. */
function flatten(errors: FieldErrors, prefix: string[] = []): { at: string[]; message: string }[] {
  const out: { at: string[]; message: string }[] = [];
  for (const [key, value] of Object.entries(errors ?? {})) {
    if (!value || typeof value !== "object" || key === "ref") continue;
    const at = key === "root" ? prefix : [...prefix, key];
    const v = value as { message?: unknown; type?: unknown };
    if (typeof v.message === "string" && (typeof v.type === "string" || key === "root"))
      out.push({ at, message: v.message });
    out.push(...flatten(value as FieldErrors, at));
  }
  return out;
}

const DIALOG_ID = "catalogue-confirm";
const SUMMARY_ID = "catalogue-problems";

type Problem = { tone: "error"; title: string; text: string } | null;

/**
 * The owner's editor: every section of the configuration in one form, checked with the schema
 * the server uses; "Save as new version" confirms the changes (before → after) with a note.
 */
export function CatalogueEditor({
  version,
  document: initial,
  currency,
}: {
  version: number;
  document: ShopConfigDocument;
  currency: string;
}) {
  const router = useRouter();
  const form = useForm<ShopConfigDocumentInput, unknown, ShopConfigDocument>({
    resolver: zodResolver(shopConfigDocumentSchema),
    defaultValues: initial,
    mode: "onSubmit",
    reValidateMode: "onChange",
  });
  const { handleSubmit, setError } = form;
  const [problem, setProblem] = useState<Problem>(null);
  const [pending, setPending] = useState<{ doc: ShopConfigDocument; changes: ConfigChange[] } | null>(null);
  const [note, setNote] = useState("");
  const [noteError, setNoteError] = useState<string | null>(null);
  // Looked up when used (in handlers only): the confirmation dialog and the error summary.
  const dialog = {
    open: () => (document.getElementById(DIALOG_ID) as HTMLDialogElement | null)?.showModal(),
    close: () => (document.getElementById(DIALOG_ID) as HTMLDialogElement | null)?.close(),
  };
  const focusSummary = () => setTimeout(() => document.getElementById(SUMMARY_ID)?.focus(), 0);

  const review = handleSubmit(
    (doc) => {
      setProblem(null);
      const changes = diffConfig(initial, doc);
      if (changes.length === 0) {
        setProblem({
          tone: "error",
          title: "Nothing to save",
          text: `Every value is the same as in version ${version}.`,
        });
        return;
      }
      setPending({ doc, changes });
      setNoteError(null);
      dialog.open();
    },
    // The error summary brings itself into view (see ErrorSummary).
    () => setProblem(null),
  );

  const send = useMutation((body: object) =>
    sendJson<{ version: number }>("/api/catalogue/versions", { body }),
  );
  const saving = send.pending;

  async function save() {
    if (!pending) return;
    if (!note.trim()) {
      setNoteError("Say in a few words what changed and why.");
      return;
    }
    const result = await send.run({ ...pending.doc, basedOnVersion: version, note: note.trim() });
    if (result.ok) {
      dialog.close();
      form.reset(pending.doc);
      router.replace(`/overview/catalogue?saved=${result.data.version}`, { scroll: true });
      router.refresh();
      return;
    }
    const { error } = result;
    if (error.code === "busy") return;
    const fields = Object.entries(error.fields ?? {});
    for (const [path, message] of fields) {
      if (path === "note") setNoteError(message);
      else setError(path as Path, { type: "server", message });
    }
    // A message about the note stays in the dialog; anything else is shown above the form.
    if (fields.length > 0 && fields.every(([path]) => path === "note")) return;
    dialog.close();
    setProblem({
      tone: "error",
      title: error.code === "conflict" ? "Someone saved a newer version" : "Not saved",
      text:
        error.code === "unreachable"
          ? "The shop's server could not be reached. Your changes are still here; try again in a moment."
          : error.message,
    });
    focusSummary();
  }

  return (
    <FormProvider {...form}>
      <form onSubmit={review} noValidate className="space-y-10">
        <div id={SUMMARY_ID} tabIndex={-1} className="space-y-3 outline-none">
          {problem && (
            <Alert tone="error" title={problem.title}>
              {problem.text}
            </Alert>
          )}
          <ErrorSummary />
        </div>

        <Sections currency={currency} />

        <SaveBar version={version} saving={saving} />
      </form>

      <dialog
        id={DIALOG_ID}
        aria-labelledby="confirm-title"
        className="m-auto w-[min(44rem,calc(100vw-2rem))] rounded-card border border-line bg-paper-raised p-0 shadow-card backdrop:bg-ink/40"
      >
        {pending && (
          <div className="space-y-4 p-5">
            <h2 id="confirm-title" className="text-lg font-semibold">
              Save as version {version + 1}?
            </h2>
            <p className="text-sm text-ink-muted">
              New quotes, the builder and new orders use it at once. Orders already placed keep the prices and
              checks they were placed with.
            </p>
            <div className="max-h-72 overflow-y-auto rounded-md border border-line">
              <ChangesTable
                changes={pending.changes}
                currency={currency}
                caption="Changes in this version"
                sticky
              />
            </div>
            <div>
              <label htmlFor="version-note" className="field-label">
                Note for the history
              </label>
              <input
                id="version-note"
                className="field-input"
                maxLength={500}
                value={note}
                placeholder="e.g. Steel tube prices from the March price list"
                aria-invalid={noteError ? true : undefined}
                aria-describedby={noteError ? "version-note-error" : undefined}
                onChange={(e) => setNote(e.target.value)}
                onKeyDown={(e) => {
                  if (e.key === "Enter") {
                    e.preventDefault();
                    void save();
                  }
                }}
              />
              {noteError && (
                <p id="version-note-error" className="field-error" role="alert">
                  {noteError}
                </p>
              )}
            </div>
            <div className="flex flex-wrap justify-end gap-2">
              <button type="button" className="btn-quiet" onClick={() => dialog.close()}>
                Keep editing
              </button>
              <button type="button" className="btn-primary" disabled={saving} onClick={() => void save()}>
                {saving ? "Saving…" : `Save version ${version + 1}`}
              </button>
            </div>
          </div>
        )}
      </dialog>
    </FormProvider>
  );
}

/** Every field to fix, each a button that takes the cursor there (its own component: it re-renders alone). */
function ErrorSummary() {
  const { control, getValues, setFocus } = useFormContext<ShopConfigDocumentInput>();
  const { errors, submitCount } = useFormState({ control });
  const list = flatten(errors as FieldErrors);
  const shown = list.length > 0;
  // After a refused save, move to the list for keyboard and screen-reader users.
  useEffect(() => {
    if (submitCount > 0 && shown) document.getElementById(SUMMARY_ID)?.focus();
  }, [submitCount, shown]);
  if (!shown) return null;
  const rowName = (listPath: string, index: number) => {
    const row = getValues(`${listPath}.${index}` as Path) as { id?: string; code?: string } | undefined;
    const name = row?.id || row?.code;
    return name ? String(name) : `row ${index + 1}`;
  };
  return (
    <Alert
      tone="error"
      title={`${list.length} ${list.length === 1 ? "field needs" : "fields need"} fixing before saving`}
    >
      <ul className="mt-1 max-h-48 list-disc space-y-0.5 overflow-y-auto pl-5">
        {list.slice(0, 50).map((e) => (
          <li key={e.at.join(".")}>
            <button
              type="button"
              className="text-left underline underline-offset-2"
              onClick={() => setFocus(e.at.join(".") as Path)}
            >
              {describePath(e.at, rowName)}
            </button>
            : {e.message}
          </li>
        ))}
      </ul>
    </Alert>
  );
}

/** The bar at the bottom: which version is being edited, whether anything changed, and Save. */
function SaveBar({ version, saving }: { version: number; saving: boolean }) {
  const { control } = useFormContext<ShopConfigDocumentInput>();
  const { isDirty } = useFormState({ control });
  // Leaving with unsaved changes asks first.
  useEffect(() => {
    if (!isDirty) return;
    const warn = (e: BeforeUnloadEvent) => e.preventDefault();
    window.addEventListener("beforeunload", warn);
    return () => window.removeEventListener("beforeunload", warn);
  }, [isDirty]);
  return (
    <div className="no-print fixed inset-x-0 bottom-0 z-20 border-t border-line bg-paper-raised/95 backdrop-blur">
      <div className="mx-auto flex max-w-7xl flex-wrap items-center justify-between gap-3 px-4 py-3">
        <p className="text-sm text-ink-muted" aria-live="polite">
          Editing version {version}.{" "}
          {isDirty ? <strong className="text-ink">Unsaved changes.</strong> : "No changes yet."}
        </p>
        <button type="submit" className="btn-primary" disabled={saving}>
          Save as new version…
        </button>
      </div>
    </div>
  );
}

/**
 * The sections, memoised: the editor's own state (the dialog, the note, a problem) changes without
 * re-rendering a thousand inputs; each input follows its own field through the form's context.
 */
const Sections = memo(function Sections({ currency }: { currency: string }) {
  return (
    <>
      <PolicySection currency={currency} />
      <MaterialsSection />
      <TubesSection />
      <FittingsSection />
      <JointsSection />
      <SlipYokesSection />
      <CentreBearingsSection />
      <LimitsSection />
      <FloorSection />
    </>
  );
});
