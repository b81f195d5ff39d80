"use client";

import { useDeferredValue, useEffect, useMemo, useRef, useState, useSyncExternalStore } from "react";
import { useRouter } from "next/navigation";
import { Controller, useForm, useWatch, type Path, type Resolver } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { CheckCircle2, Download, FileUp, FolderOpen, Loader2, Save, Send } from "lucide-react";
import {
  DesignInputError,
  evaluateDesign,
  parseDesign,
  type Catalogue,
  type DesignFile,
  type EvaluationReport,
  type ShopSettings,
  type TubePreference,
} from "@/lib/driveline";
import { SHAFT_USES } from "@/lib/designs/schemas";
import type { DraftSummary, DraftView } from "@/lib/designs/drafts";
import { Alert } from "@/components/ui/alert";
import { MeasuringGuide, type GuideTopic } from "./measuring-guide";
import { NumberField } from "./number-field";
import type { FieldKit } from "./field-kit";
import { EngineSpeedField, RunningTorqueGroup, TopGearField } from "./service-fields";
import { SlipFields } from "./slip-fields";
import { InterfaceFields } from "./interface-fields";
import { FrontJointField, LayoutFields } from "./layout-fields";
import { reportAdditions, speedPathText } from "./report-additions";
import { ResultsPanel, StatusWord, tubeLabel, type TubeChoice } from "./results-panel";
import {
  builderFormSchema,
  defaultBuilderForm,
  designFileJson,
  designFileName,
  designFileToForm,
  formatNumber,
  validateBuilderForm,
  withUnit,
  type BuilderForm,
  type DisplayQuantity,
  type SiNumber,
  type UnitSystem,
} from "./model";

export interface ShaftBuilderProps {
  /** The shop's catalogue and limits (plain objects from getShopEngineering()). */
  catalogue: Catalogue;
  settings: ShopSettings;
  /** A saved draft to open, or null for a new design. */
  initialDraft?: DraftView | null;
  /** Drafts listed for loading (the customer's own; at the counter, the customer's). */
  drafts?: readonly DraftSummary[];
  /** Where "Get a quote" goes once the draft is saved. */
  quoteHref: (draftId: string) => string;
  /** Counter use: the customer the draft is saved for (sent as customerId). */
  customerId?: string;
  /** The page address of a draft, put in the location bar after saving or loading (default `?draft=<id>`). */
  draftHref?: (draftId: string) => string;
  /** Unit system to start in (default inches). */
  initialUnits?: UnitSystem;
  /** How the shop picks a tube the customer leaves to Yokeline (its price book's setting). */
  tubePreference?: TubePreference;
  /**
   * The counter's compact, keyboard-first layout: the fields in the order of a paper measuring
   * sheet (use and vehicle, length, angles, torque, speed, tube; then the optional slip, layout
   * and vehicle-end groups, folded until wanted; then the order details with the quote button),
   * the first field focused, no measuring guides in the tab order, and Enter in a field never
   * submitting by surprise.
   */
  compact?: boolean;
  /** Counter: a design that fails a check may still be quoted (the order then needs the owner's sign-off). */
  allowFailing?: boolean;
}

type SaveState =
  { kind: "idle" } | { kind: "saving" } | { kind: "saved"; at: Date } | { kind: "error"; message: string };
type UploadState =
  | { kind: "idle" }
  | { kind: "ok"; fileName: string }
  | { kind: "error"; fileName: string; messages: string[] };

const USE_LABEL: Record<(typeof SHAFT_USES)[number], string> = {
  street: "Street",
  towing: "Towing",
  "off-road": "Off-road",
  race: "Race",
  industrial: "Industrial",
};

const noSubscribe = () => () => {};

/** Drops `draft` from the address bar, keeping the rest (the counter's `customer`, for one). */
function forgetDraftInAddress() {
  const url = new URL(window.location.href);
  url.searchParams.delete("draft");
  window.history.replaceState(null, "", url.pathname + url.search);
}

const NAN = "\u0000NaN";
/** A stable text key of the form values (NaN kept, so an unparseable entry stays invalid). */
const keyOf = (v: unknown) =>
  JSON.stringify(v, (_k, x) => (typeof x === "number" && Number.isNaN(x) ? NAN : x));
const fromKey = (key: string) => JSON.parse(key, (_k, x) => (x === NAN ? NaN : x)) as BuilderForm;

/** Compact layout: Enter in a one-line field does not submit the form (only its buttons do). */
function keepEnterFromSubmitting(e: React.KeyboardEvent<HTMLFormElement>) {
  const t = e.target;
  if (e.key === "Enter" && t instanceof HTMLInputElement && !["submit", "button"].includes(t.type))
    e.preventDefault();
}

const near = (a: number, b: number, tol = 0.01) => Math.abs(a - b) < tol;
const nearest = (values: number[], to: SiNumber) =>
  values.reduce(
    (best, v) => (to != null && Math.abs(v - to) < Math.abs(best - to) ? v : best),
    values[0] ?? 0,
  );

function initialForm(draft: DraftView | null | undefined): BuilderForm {
  if (!draft) return defaultBuilderForm();
  const parsed = parseDesign(draft.design);
  const form = parsed.ok
    ? designFileToForm(parsed.design, { application: draft.application })
    : { ...defaultBuilderForm(), application: draft.application };
  return { ...form, name: draft.name };
}

/**
 * The shaft builder: a guided form with measuring guides, live results from the engineering
 * core (in the browser, on every change), pictures, drafts, and design-file download/upload.
 * Used by the customer's /build page and by the counter for phone orders.
 */
export function ShaftBuilder({
  catalogue,
  settings,
  initialDraft,
  drafts: initialDrafts = [],
  quoteHref,
  customerId,
  draftHref = (id) => `?draft=${id}`,
  initialUnits = "imperial",
  tubePreference = "lightest",
  compact = false,
  allowFailing = false,
}: ShaftBuilderProps) {
  const router = useRouter();
  const [system, setSystem] = useState<UnitSystem>(initialUnits);
  const [draftId, setDraftId] = useState<string | null>(initialDraft?.id ?? null);
  const [drafts, setDrafts] = useState<readonly DraftSummary[]>(initialDrafts);
  const [saveState, setSaveState] = useState<SaveState>({ kind: "idle" });
  const [upload, setUpload] = useState<UploadState>({ kind: "idle" });
  const [quoting, setQuoting] = useState(false);
  const fileInput = useRef<HTMLInputElement>(null);
  // True once hydrated (tests wait for it); false in the server render.
  const ready = useSyncExternalStore(
    noSubscribe,
    () => true,
    () => false,
  );

  const resolver = useMemo(
    () => zodResolver(builderFormSchema(catalogue)) as unknown as Resolver<BuilderForm>,
    [catalogue],
  );
  const { control, register, handleSubmit, reset, setValue, getValues, trigger, formState } =
    useForm<BuilderForm>({
      defaultValues: initialForm(initialDraft),
      resolver,
      mode: "onTouched",
    });

  // Live evaluation: the same core as the server, on every change (deferred while typing).
  const values = useWatch({ control }) as BuilderForm;
  const key = keyOf(values);
  const deferredKey = useDeferredValue(key);
  const form = useMemo(() => fromKey(deferredKey), [deferredKey]);
  const validation = useMemo(() => validateBuilderForm(form, catalogue), [form, catalogue]);
  const evaluation = useMemo((): { design: DesignFile; report: EvaluationReport } | null => {
    if (!validation.design) return null;
    try {
      return {
        design: validation.design,
        report: evaluateDesign(validation.design, {
          catalogue,
          settings,
          tubePreference,
          curves: { points: 181 },
          alternatives: true,
        }),
      };
    } catch (error) {
      if (error instanceof DesignInputError) return null;
      throw error;
    }
  }, [validation.design, catalogue, settings, tubePreference]);
  // While the form has errors, keep showing the last valid results (greyed).
  const [lastGood, setLastGood] = useState(evaluation);
  if (evaluation && evaluation !== lastGood) setLastGood(evaluation);
  const shown = evaluation ?? lastGood;
  const stale = evaluation === null;
  const errs = validation.fieldErrors;

  // At the counter the staff know how to measure; the guides stay out of the tab order there.
  const guide = (topic: GuideTopic) => (compact ? null : <MeasuringGuide topic={topic} />);

  const section = compact ? "space-y-3 card p-3" : "space-y-4 card p-4";

  // The counter starts typing straight away: focus the first field of the measuring sheet.
  useEffect(() => {
    if (compact) document.querySelector<HTMLElement>("[data-autofocus]")?.focus();
  }, [compact]);

  const markChanged = () => saveState.kind === "saved" && setSaveState({ kind: "idle" });

  const num = (
    name: Path<BuilderForm>,
    label: string,
    quantity: DisplayQuantity | null,
    opts: { unit?: string; hint?: string; guide?: GuideTopic; error?: string } = {},
  ) => (
    <Controller
      control={control}
      name={name}
      render={({ field }) => (
        <NumberField
          name={field.name}
          label={label}
          value={field.value as SiNumber}
          onChange={(v) => {
            field.onChange(v);
            markChanged();
          }}
          onBlur={field.onBlur}
          quantity={quantity}
          system={system}
          unit={opts.unit}
          hint={opts.hint}
          error={opts.error ?? errs[name]}
        >
          {opts.guide && guide(opts.guide)}
        </NumberField>
      )}
    />
  );

  const kit: FieldKit = {
    num,
    values,
    errs,
    register,
    setValue,
    control,
    guide,
    markChanged,
    catalogue,
    system,
    compact,
  };

  const useTube = (t: TubeChoice) => {
    setValue("tubeMode", "chosen", { shouldDirty: true });
    setValue("tube", { materialId: t.materialId, odMm: t.odMm, wallMm: t.wallMm }, { shouldDirty: true });
    markChanged();
  };

  async function save(): Promise<string | null> {
    const current = getValues();
    const checked = validateBuilderForm(current, catalogue);
    if (!checked.design || !(await trigger())) {
      setSaveState({ kind: "error", message: "Fix the highlighted fields before saving." });
      return null;
    }
    setSaveState({ kind: "saving" });
    try {
      const body = {
        name: current.name,
        design: checked.design,
        application: current.application,
        ...(customerId ? { customerId } : {}),
      };
      const res = await fetch(draftId ? `/api/designs/${draftId}` : "/api/designs", {
        method: draftId ? "PUT" : "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify(body),
      });
      const data = (await res.json().catch(() => null)) as
        (DraftView & { error?: { message: string } }) | null;
      if (!res.ok || !data?.id) {
        setSaveState({
          kind: "error",
          message: data?.error?.message ?? "The draft could not be saved. Try again.",
        });
        return null;
      }
      setDraftId(data.id);
      setDrafts((list) => [
        {
          id: data.id,
          name: data.name,
          lengthMm: data.design.lengthMm,
          use: data.application.use,
          customerId: data.customerId,
          updatedAt: data.updatedAt,
        },
        ...list.filter((d) => d.id !== data.id),
      ]);
      window.history.replaceState(null, "", draftHref(data.id));
      setSaveState({ kind: "saved", at: new Date() });
      return data.id;
    } catch {
      setSaveState({
        kind: "error",
        message: "No connection to the shop. Your entries are still here; try again.",
      });
      return null;
    }
  }

  async function loadDraft(id: string) {
    setSaveState({ kind: "idle" });
    const res = await fetch(`/api/designs/${id}`);
    if (!res.ok) {
      setSaveState({ kind: "error", message: "That draft could not be opened." });
      return;
    }
    const draft = (await res.json()) as DraftView;
    reset(initialForm(draft));
    setDraftId(draft.id);
    setUpload({ kind: "idle" });
    window.history.replaceState(null, "", draftHref(draft.id));
  }

  async function deleteDraft(id: string, name: string) {
    if (!window.confirm(`Delete the saved design “${name}”? Orders already placed keep their own copy.`))
      return;
    const res = await fetch(`/api/designs/${id}`, { method: "DELETE" });
    if (!res.ok && res.status !== 404) {
      setSaveState({ kind: "error", message: "That draft could not be deleted." });
      return;
    }
    setDrafts((list) => list.filter((d) => d.id !== id));
    // The form keeps what is on screen; it is simply no longer saved.
    if (id === draftId) {
      setDraftId(null);
      setSaveState({ kind: "idle" });
      forgetDraftInAddress();
    }
  }

  function newDesign() {
    reset(defaultBuilderForm());
    setDraftId(null);
    setSaveState({ kind: "idle" });
    forgetDraftInAddress();
  }

  function download() {
    if (!validation.design) return;
    const blob = new Blob([designFileJson(validation.design)], { type: "application/json" });
    const url = URL.createObjectURL(blob);
    const a = document.createElement("a");
    a.href = url;
    a.download = designFileName(getValues("name"));
    document.body.appendChild(a);
    a.click();
    a.remove();
    setTimeout(() => URL.revokeObjectURL(url), 1000);
  }

  async function onFile(file: File) {
    let input: unknown;
    try {
      input = JSON.parse(await file.text());
    } catch {
      setUpload({
        kind: "error",
        fileName: file.name,
        messages: ["design: the file is not JSON (expected a Yokeline design file)"],
      });
      return;
    }
    const parsed = parseDesign(input, { catalogue });
    if (!parsed.ok) {
      setUpload({ kind: "error", fileName: file.name, messages: parsed.issues.map((i) => i.message) });
      return;
    }
    const next = designFileToForm(parsed.design, { application: getValues("application") });
    reset({ ...next, name: parsed.design.name ?? getValues("name") });
    setUpload({ kind: "ok", fileName: file.name });
    markChanged();
  }

  async function getQuote() {
    setQuoting(true);
    const id = await save();
    if (id) router.push(quoteHref(id));
    else setQuoting(false);
  }

  const tubeMode = values.tubeMode;
  const speedMode = values.speedMode;
  const offset = values.offset;
  const report = shown?.report ?? null;
  const quoteBlocked = !evaluation
    ? "Fix the highlighted fields first."
    : evaluation.report.overall === "fail" && !allowFailing
      ? "A check fails: change the design (or take the suggested tube) until nothing fails."
      : null;
  const quoteNote =
    evaluation?.report.overall === "fail"
      ? "A check FAILS. The quote shows the failure; an order placed from it waits for the owner's engineering sign-off."
      : "Saves the draft and takes you to the price and delivery date.";
  const quoteButton = (
    <>
      <button
        type="button"
        className="btn-accent"
        onClick={() => void getQuote()}
        disabled={quoteBlocked !== null || quoting}
        aria-describedby={quoteBlocked ? "quote-reason" : "quote-note"}
      >
        <Send className="size-4" aria-hidden="true" /> {quoting ? "Saving…" : "Get a quote"}
      </button>
      {quoteBlocked ? (
        <p id="quote-reason" className="text-sm text-ink-soft">
          {quoteBlocked}
        </p>
      ) : (
        <p
          id="quote-note"
          className={`text-sm ${evaluation?.report.overall === "fail" ? "font-semibold text-fail" : "text-ink-soft"}`}
        >
          {quoteNote}
        </p>
      )}
    </>
  );

  // Tube choice from the catalogue: material, then outside diameter, then wall.
  const materials = catalogue.materials.filter((m) => catalogue.tubes.some((t) => t.materialId === m.id));
  const ofMaterial = catalogue.tubes.filter((t) => t.materialId === values.tube?.materialId);
  const ods = [...new Set(ofMaterial.map((t) => t.odMm))].sort((a, b) => a - b);
  const walls = ofMaterial
    .filter((t) => values.tube?.odMm != null && near(t.odMm, values.tube.odMm, 0.05))
    .map((t) => t.wallMm)
    .sort((a, b) => a - b);
  const currentOd = ods.find((o) => values.tube?.odMm != null && near(o, values.tube.odMm, 0.05));
  const currentWall = walls.find((w) => values.tube?.wallMm != null && near(w, values.tube.wallMm));
  const setMaterial = (materialId: string) => {
    const list = catalogue.tubes.filter((t) => t.materialId === materialId);
    const od = nearest([...new Set(list.map((t) => t.odMm))], getValues("tube.odMm"));
    const wall = nearest(
      list.filter((t) => near(t.odMm, od, 0.05)).map((t) => t.wallMm),
      getValues("tube.wallMm"),
    );
    setValue("tube", { materialId, odMm: od, wallMm: wall }, { shouldDirty: true });
    markChanged();
  };
  const setOd = (od: number) => {
    const wall = nearest(
      ofMaterial.filter((t) => near(t.odMm, od, 0.05)).map((t) => t.wallMm),
      getValues("tube.wallMm"),
    );
    setValue(
      "tube",
      { materialId: getValues("tube.materialId"), odMm: od, wallMm: wall },
      { shouldDirty: true },
    );
    markChanged();
  };

  const shownPaths = new Set([
    "lengthMm",
    "ends.front",
    "ends.rear",
    ...["transmission", "driveshaft", "pinion"].flatMap((s) => [
      `geometry.${s}.verticalDeg`,
      `geometry.${s}.horizontalDeg`,
    ]),
    "torque.engineTorqueNm",
    "torque.firstGearRatio",
    "torque.transferCaseLowRatio",
    "torque.converterStallRatio",
    "speed.topSpeedKmh",
    "speed.tireDiameterMm",
    "speed.axleRatio",
    "speed.maxShaftRpm",
    "speed.maxEngineRpm",
    "speed.topGearRatio",
    "torque.topGearRatio",
    "torque.ratedShaftTorqueNm",
    "centreBearing.bearingId",
    ...(tubeMode === "chosen" ? ["tube.materialId", "tube.odMm", "tube.wallMm"] : []),
  ]);
  // The optional groups show every error of theirs beside its field.
  const groupPrefixes = ["traction.", "slip.", "interface.", "centreBearing."];
  const otherIssues = validation.issues.filter(
    (i) =>
      !shownPaths.has(i.path.startsWith("ends.") ? i.path.replace(/\.fittingId$/, "") : i.path) &&
      !groupPrefixes.some((p) => i.path.startsWith(p)),
  );
  const additions = report ? reportAdditions(report) : null;

  const endSelect = (end: "front" | "rear") => {
    const label = end === "front" ? "Front end fitting" : "Rear end fitting";
    const id = `end-${end}`;
    const error = errs[`ends.${end}`];
    return (
      <div>
        <label htmlFor={id} className="field-label">
          {label}
        </label>
        <select
          id={id}
          className="field-input"
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : undefined}
          {...register(`ends.${end}`, { onChange: markChanged })}
        >
          <option value="">Let the shop choose</option>
          {catalogue.endFittings.map((f) => (
            <option key={f.id} value={f.id}>
              {f.name} ({f.id})
            </option>
          ))}
        </select>
        {error && (
          <p id={`${id}-error`} className="field-error">
            {error}
          </p>
        )}
      </div>
    );
  };

  const statusLine =
    saveState.kind === "saving" ? (
      <span className="inline-flex items-center gap-1 text-ink-soft">
        <Loader2 className="size-4 animate-spin" aria-hidden="true" /> Saving…
      </span>
    ) : saveState.kind === "saved" ? (
      <span className="inline-flex items-center gap-1 font-medium text-pass">
        <CheckCircle2 className="size-4" aria-hidden="true" /> Saved ✓
      </span>
    ) : saveState.kind === "error" ? (
      <span className="font-medium text-fail">{saveState.message}</span>
    ) : draftId ? (
      <span className="text-ink-muted">{formState.isDirty ? "Unsaved changes" : "Draft open"}</span>
    ) : (
      <span className="text-ink-muted">Not saved yet</span>
    );

  const saveBar = (
    <>
      <button type="submit" className="btn-primary" disabled={saveState.kind === "saving"}>
        <Save className="size-4" aria-hidden="true" /> {draftId ? "Save draft" : "Save as draft"}
      </button>
      <span role="status" aria-live="polite" className="text-sm" data-testid="save-status">
        {statusLine}
      </span>
      {draftId && (
        <button type="button" className="ml-auto btn-quiet" onClick={newDesign}>
          Start a new design
        </button>
      )}
    </>
  );

  const nameField = (
    <div>
      <label htmlFor="design-name" className="field-label">
        Design name
      </label>
      <input
        id="design-name"
        className="field-input"
        aria-invalid={formState.errors.name ? true : undefined}
        {...register("name", { onChange: markChanged })}
      />
      {formState.errors.name && <p className="field-error">name: {formState.errors.name.message}</p>}
    </div>
  );

  return (
    <div className="space-y-6 pb-16 lg:pb-0 print:pb-0" data-builder-ready={ready || undefined}>
      <div className="no-print flex flex-wrap items-center justify-between gap-4 card p-4">
        <fieldset>
          <legend className="field-label">Units</legend>
          <div className="flex flex-wrap gap-2" role="radiogroup" aria-label="Units">
            {(
              [
                ["imperial", "Inches, lb·ft, mph"],
                ["metric", "Millimetres, N·m, km/h"],
              ] as const
            ).map(([value, label]) => (
              <label
                key={value}
                className={`inline-flex cursor-pointer items-center gap-2 rounded-md border px-3 py-1.5 text-sm ${system === value ? "border-steel-700 bg-steel-700 text-white" : "border-line-strong bg-paper-raised"}`}
              >
                <input
                  type="radio"
                  name="units"
                  value={value}
                  checked={system === value}
                  onChange={() => setSystem(value)}
                  className="size-4 accent-brass-500"
                />
                {label}
              </label>
            ))}
          </div>
        </fieldset>
        <div className="flex flex-wrap items-center gap-2">
          <button
            type="button"
            className="btn-quiet"
            onClick={download}
            disabled={!validation.design}
            title={validation.design ? undefined : "Fix the highlighted fields first"}
          >
            <Download className="size-4" aria-hidden="true" /> Download design file
          </button>
          <button type="button" className="btn-quiet" onClick={() => fileInput.current?.click()}>
            <FileUp className="size-4" aria-hidden="true" /> Upload design file
          </button>
          <input
            ref={fileInput}
            type="file"
            accept="application/json,.json"
            className="sr-only"
            tabIndex={-1}
            aria-label="Upload a design file"
            data-testid="design-upload"
            onChange={(e) => {
              const file = e.target.files?.[0];
              if (file) void onFile(file);
              e.target.value = "";
            }}
          />
        </div>
      </div>

      {upload.kind === "error" && (
        <Alert tone="error" title={`${upload.fileName} was not loaded — nothing you entered has changed.`}>
          <ul className="list-disc pl-4" data-testid="upload-errors">
            {upload.messages.map((m) => (
              <li key={m}>{m}</li>
            ))}
          </ul>
        </Alert>
      )}
      {upload.kind === "ok" && (
        <Alert tone="success" title={`Loaded ${upload.fileName}.`}>
          Check the values, then save the draft.
        </Alert>
      )}

      <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,5fr)_minmax(0,7fr)] lg:items-start print:block">
        <form
          className="no-print min-w-0 space-y-5"
          noValidate
          aria-label="Shaft design"
          onSubmit={handleSubmit(() => void save())}
          onKeyDown={compact ? keepEnterFromSubmitting : undefined}
        >
          <section className={section} aria-labelledby="s-app">
            <h2 id="s-app" className="text-lg font-semibold">
              1. What the shaft is for
            </h2>
            {!compact && nameField}
            <div>
              <label htmlFor="app-use" className="field-label">
                Use
              </label>
              <select
                id="app-use"
                className="field-input"
                data-autofocus={compact || undefined}
                {...register("application.use", { onChange: markChanged })}
              >
                {SHAFT_USES.map((u) => (
                  <option key={u} value={u}>
                    {USE_LABEL[u]}
                  </option>
                ))}
              </select>
            </div>
            <div>
              <label htmlFor="app-desc" className="field-label">
                Vehicle or machine
              </label>
              <textarea
                id="app-desc"
                rows={2}
                className="field-input"
                placeholder="e.g. 1978 pickup, 4-speed automatic, rear shaft"
                {...register("application.description", { onChange: markChanged })}
              />
              {formState.errors.application?.description && (
                <p className="field-error">{formState.errors.application.description.message}</p>
              )}
            </div>
          </section>

          <section className={section} aria-labelledby="s-len">
            <h2 id="s-len" className="text-lg font-semibold">
              2. Length and ends
            </h2>
            {num("lengthMm", "Installed length", "length", {
              hint: "Joint centre to joint centre, at loaded ride height.",
              guide: "length",
            })}
            {guide("no-shaft")}
            {guide("weld-to-weld")}
            <div className="grid gap-4 sm:grid-cols-2">
              {endSelect("front")}
              {endSelect("rear")}
            </div>
            {guide("ends")}
          </section>

          <section className={section} aria-labelledby="s-ang">
            <h2 id="s-ang" className="text-lg font-semibold">
              3. Angles, side view
            </h2>
            <p className="text-sm text-ink-soft">
              Degrees, positive when the part points down toward the rear (the pinion: nose up toward the
              front).
            </p>
            <div className={compact ? "grid gap-3 sm:grid-cols-3" : "space-y-4"}>
              {num("geometry.transmission.verticalDeg", "Transmission angle", null, {
                unit: "°",
                guide: "transmission",
              })}
              {num("geometry.driveshaft.verticalDeg", "Driveshaft angle", null, {
                unit: "°",
                guide: "driveshaft",
              })}
              {num("geometry.pinion.verticalDeg", "Pinion angle", null, { unit: "°", guide: "pinion" })}
            </div>
            {guide("wrap")}
            <label className="flex items-center gap-2 text-sm font-medium">
              <input
                type="checkbox"
                className="size-4 accent-steel-700"
                {...register("offset", { onChange: markChanged })}
              />
              My driveline is offset sideways
            </label>
            {offset && (
              <div className="space-y-4 border-l-2 border-brass-400 pl-3">
                <p className="text-sm text-ink-soft">
                  Top view, degrees, positive when the part turns to the right going rearward.
                </p>
                {num("geometry.transmission.horizontalDeg", "Transmission angle, top view", null, {
                  unit: "°",
                })}
                {num("geometry.driveshaft.horizontalDeg", "Driveshaft angle, top view", null, { unit: "°" })}
                {num("geometry.pinion.horizontalDeg", "Pinion angle, top view", null, { unit: "°" })}
                {guide("offset")}
              </div>
            )}
            <FrontJointField kit={kit} rearWorkingAngleDeg={report?.joints.at(-1)?.workingAngleDeg} />
          </section>

          <section className={section} aria-labelledby="s-tq">
            <h2 id="s-tq" className="text-lg font-semibold">
              4. Torque and gearing
            </h2>
            {num("torque.engineTorqueNm", "Engine peak torque", "torque")}
            <div className="grid gap-4 sm:grid-cols-2">
              {num("torque.firstGearRatio", "First gear ratio", null, { unit: ": 1" })}
              {num("torque.transferCaseLowRatio", "Transfer-case low", null, {
                unit: ": 1",
                hint: "1 without one",
              })}
              {num("torque.converterStallRatio", "Converter stall ratio", null, {
                unit: ": 1",
                hint: "1 for a manual",
              })}
              <TopGearField kit={kit} />
            </div>
            {values.torque && validation.design && (
              <p className="text-sm text-ink-soft" data-testid="design-torque">
                {additions?.service?.serviceFactor != null
                  ? "Design torque at the shaft"
                  : "Torque at the shaft in first gear"}
                :{" "}
                <strong className="text-ink">
                  {report ? withUnit(report.service.peakShaftTorqueNm, "torque", system, 0) : "—"}
                </strong>
                {additions?.service?.serviceFactor != null && (
                  <>
                    {" "}
                    (service factor {additions.service.serviceFactor.toFixed(2)} for {values.application.use})
                  </>
                )}
              </p>
            )}
            {guide("torque")}
            <RunningTorqueGroup kit={kit} />
          </section>

          <section className={section} aria-labelledby="s-sp">
            <h2 id="s-sp" className="text-lg font-semibold">
              5. Shaft speed
            </h2>
            <fieldset className="space-y-1">
              <legend className="field-label">How fast does the shaft turn?</legend>
              <label className="flex items-center gap-2 text-sm">
                <input
                  type="radio"
                  value="vehicle"
                  className="size-4 accent-steel-700"
                  {...register("speedMode", { onChange: markChanged })}
                />
                From top speed, tire size and axle ratio
              </label>
              <label className="flex items-center gap-2 text-sm">
                <input
                  type="radio"
                  value="rpm"
                  className="size-4 accent-steel-700"
                  {...register("speedMode", { onChange: markChanged })}
                />
                I know the maximum shaft rpm
              </label>
            </fieldset>
            {speedMode === "rpm" ? (
              <>
                {num("speed.maxShaftRpm", "Maximum shaft speed", null, { unit: "rpm", guide: "rpm" })}
                <EngineSpeedField kit={kit} />
              </>
            ) : (
              <>
                {num("speed.topSpeedKmh", "Top speed", "speed", { guide: "speed" })}
                <div className="grid gap-4 sm:grid-cols-2">
                  {num("speed.tireDiameterMm", "Tire diameter", "length", { guide: "tire" })}
                  {num("speed.axleRatio", "Axle ratio", null, { unit: ": 1" })}
                </div>
                {errs["speed.maxShaftRpm"] && <p className="field-error">{errs["speed.maxShaftRpm"]}</p>}
                <EngineSpeedField kit={kit} />
              </>
            )}
            {report && (report.service.engineRpm != null || speedMode === "vehicle") && (
              <p className="text-sm text-ink-soft" data-testid="speed-path">
                {speedPathText(report.service, system)}
              </p>
            )}
          </section>

          <section className={section} aria-labelledby="s-tube">
            <h2 id="s-tube" className="text-lg font-semibold">
              6. Tube
            </h2>
            <fieldset className="space-y-1">
              <legend className="sr-only">Tube</legend>
              <label className="flex items-center gap-2 text-sm">
                <input
                  type="radio"
                  value="auto"
                  className="size-4 accent-steel-700"
                  {...register("tubeMode", { onChange: markChanged })}
                />
                Let Yokeline pick (recommended)
              </label>
              <label className="flex items-center gap-2 text-sm">
                <input
                  type="radio"
                  value="chosen"
                  className="size-4 accent-steel-700"
                  {...register("tubeMode", { onChange: markChanged })}
                />
                I want a specific tube
              </label>
            </fieldset>
            {tubeMode === "chosen" && (
              <div className="grid gap-4 sm:grid-cols-3">
                <div>
                  <label htmlFor="tube-material" className="field-label">
                    Tube material
                  </label>
                  <select
                    id="tube-material"
                    className="field-input"
                    value={values.tube?.materialId ?? ""}
                    onChange={(e) => setMaterial(e.target.value)}
                    aria-invalid={errs["tube.materialId"] ? true : undefined}
                  >
                    {!materials.some((m) => m.id === values.tube?.materialId) && (
                      <option value={values.tube?.materialId ?? ""}>
                        {values.tube?.materialId} (from file)
                      </option>
                    )}
                    {materials.map((m) => (
                      <option key={m.id} value={m.id}>
                        {m.name.split(" (")[0]}
                      </option>
                    ))}
                  </select>
                  {errs["tube.materialId"] && <p className="field-error">{errs["tube.materialId"]}</p>}
                </div>
                <div>
                  <label htmlFor="tube-od" className="field-label">
                    Outside diameter
                  </label>
                  <select
                    id="tube-od"
                    className="field-input"
                    value={currentOd != null ? String(currentOd) : "custom"}
                    onChange={(e) => setOd(Number(e.target.value))}
                  >
                    {currentOd == null && (
                      <option value="custom">
                        {values.tube?.odMm != null ? withUnit(values.tube.odMm, "diameter", system) : "—"}{" "}
                        (from file)
                      </option>
                    )}
                    {ods.map((od) => (
                      <option key={od} value={String(od)}>
                        {withUnit(od, "diameter", system)}
                      </option>
                    ))}
                  </select>
                  {errs["tube.odMm"] && <p className="field-error">{errs["tube.odMm"]}</p>}
                </div>
                <div>
                  <label htmlFor="tube-wall" className="field-label">
                    Wall
                  </label>
                  <select
                    id="tube-wall"
                    className="field-input"
                    value={currentWall != null ? String(currentWall) : "custom"}
                    onChange={(e) => {
                      setValue("tube.wallMm", Number(e.target.value), { shouldDirty: true });
                      markChanged();
                    }}
                  >
                    {currentWall == null && (
                      <option value="custom">
                        {values.tube?.wallMm != null ? withUnit(values.tube.wallMm, "diameter", system) : "—"}{" "}
                        (from file)
                      </option>
                    )}
                    {walls.map((w) => (
                      <option key={w} value={String(w)}>
                        {withUnit(w, "diameter", system)}
                      </option>
                    ))}
                  </select>
                  {errs["tube.wallMm"] && <p className="field-error">{errs["tube.wallMm"]}</p>}
                </div>
              </div>
            )}
            {guide("tube")}
          </section>

          <section className={section} aria-labelledby="s-slip">
            <h2 id="s-slip" className="text-lg font-semibold">
              7. Slip and layout
            </h2>
            <SlipFields kit={kit} />
            <LayoutFields kit={kit} />
          </section>

          <section className={section} aria-labelledby="s-if">
            <h2 id="s-if" className="text-lg font-semibold">
              8. Where the shaft meets the vehicle
            </h2>
            <InterfaceFields kit={kit} />
          </section>

          {otherIssues.length > 0 && (
            <Alert tone="error" title="Other fields to fix">
              <ul className="list-disc pl-4">
                {otherIssues.map((i) => (
                  <li key={i.message}>{i.message}</li>
                ))}
              </ul>
            </Alert>
          )}

          {compact ? (
            <section className={section} aria-labelledby="s-order">
              <h2 id="s-order" className="text-lg font-semibold">
                9. Order details
              </h2>
              {nameField}
              <div className="flex flex-wrap items-center gap-3">{quoteButton}</div>
              <div className="flex flex-wrap items-center gap-3 border-t border-line pt-3">{saveBar}</div>
            </section>
          ) : (
            <div className="flex flex-wrap items-center gap-3 card p-4">{saveBar}</div>
          )}

          <section className="card p-4" aria-labelledby="s-drafts">
            <h2 id="s-drafts" className="flex items-center gap-2 text-lg font-semibold">
              <FolderOpen className="size-5 text-steel-500" aria-hidden="true" /> Saved designs
            </h2>
            {drafts.length === 0 ? (
              <p className="mt-2 text-sm text-ink-muted">
                No saved designs yet. Save this one to come back to it later.
              </p>
            ) : (
              <ul className="mt-2 divide-y divide-line" data-testid="draft-list">
                {drafts.map((d) => (
                  <li key={d.id} className="flex flex-wrap items-center justify-between gap-2 py-2 text-sm">
                    <span>
                      <span className="font-medium">{d.name}</span>
                      {d.id === draftId && (
                        <span className="ml-2 rounded bg-steel-50 px-1.5 py-0.5 text-xs text-steel-700">
                          open
                        </span>
                      )}
                      <span className="block text-xs text-ink-muted">
                        {d.lengthMm != null ? withUnit(d.lengthMm, "length", system) : ""} ·{" "}
                        {USE_LABEL[d.use]} · saved {new Date(d.updatedAt).toLocaleString()}
                      </span>
                    </span>
                    <span className="flex gap-1">
                      <button
                        type="button"
                        className="btn-quiet px-3 py-1 text-xs"
                        onClick={() => void loadDraft(d.id)}
                        aria-label={`Open ${d.name}`}
                      >
                        Open
                      </button>
                      <button
                        type="button"
                        className="btn-quiet px-3 py-1 text-xs"
                        onClick={() => void deleteDraft(d.id, d.name)}
                        aria-label={`Delete ${d.name}`}
                      >
                        Delete
                      </button>
                    </span>
                  </li>
                ))}
              </ul>
            )}
          </section>
        </form>

        <section id="results" aria-labelledby="results-h" className="min-w-0 scroll-mt-4 space-y-4">
          <h2 id="results-h" className="text-xl font-bold">
            Results
          </h2>
          <PrintedInputs form={form} system={system} catalogue={catalogue} />
          {shown ? (
            <ResultsPanel
              report={shown.report}
              design={shown.design}
              stale={stale}
              system={system}
              catalogue={catalogue}
              tubeChosen={values.tubeMode === "chosen"}
              onUseTube={useTube}
              tubePreference={tubePreference}
              footer={
                compact ? undefined : (
                  <div className="no-print flex flex-wrap items-center gap-3 card p-4">{quoteButton}</div>
                )
              }
            />
          ) : (
            <div className="card p-6 text-sm text-ink-soft" data-testid="stale-note">
              Fill in the highlighted fields and the results appear here as you type.
            </div>
          )}
        </section>
      </div>

      {report && (
        <a
          href="#results"
          className="no-print fixed inset-x-3 bottom-3 z-30 flex items-center justify-between rounded-card border border-line bg-paper-raised px-4 py-2 text-sm no-underline shadow-card lg:hidden"
        >
          <span className="text-ink">
            {stale ? "Last valid: " : "Result: "}
            <StatusWord status={report.overall} />
          </span>
          <span className="font-medium text-steel-700">See results ↓</span>
        </a>
      )}
    </div>
  );
}

/** On paper only: the inputs the results were computed from. */
function PrintedInputs({
  form,
  system,
  catalogue,
}: {
  form: BuilderForm;
  system: UnitSystem;
  catalogue: Catalogue;
}) {
  const g = form.geometry;
  const n = (v: SiNumber, q: DisplayQuantity) =>
    v == null || Number.isNaN(v) ? "—" : withUnit(v, q, system);
  const d = (v: SiNumber) => (v == null || Number.isNaN(v) ? "—" : `${formatNumber(v, 1)}°`);
  const rows: [string, string][] = [
    ["Design", form.name],
    [
      "Use",
      `${USE_LABEL[form.application.use]}${form.application.description ? ` — ${form.application.description}` : ""}`,
    ],
    ["Installed length", n(form.lengthMm, "length")],
    [
      "Angles (side view)",
      `transmission ${d(g.transmission.verticalDeg)}, driveshaft ${d(g.driveshaft.verticalDeg)}, pinion ${d(g.pinion.verticalDeg)}`,
    ],
    ...(form.offset
      ? ([
          [
            "Angles (top view)",
            `transmission ${d(g.transmission.horizontalDeg)}, driveshaft ${d(g.driveshaft.horizontalDeg)}, pinion ${d(g.pinion.horizontalDeg)}`,
          ],
        ] as [string, string][])
      : []),
    ["Engine torque", n(form.torque.engineTorqueNm, "torque")],
    [
      "Speed",
      form.speedMode === "rpm"
        ? `${form.speed.maxShaftRpm ?? "—"} rpm`
        : `${n(form.speed.topSpeedKmh, "speed")}, tire ${n(form.speed.tireDiameterMm, "length")}, axle ${form.speed.axleRatio ?? "—"}`,
    ],
    ...printedOptionalRows(form, n),
    [
      "Tube",
      form.tubeMode === "auto"
        ? "picked by Yokeline"
        : form.tube.odMm != null && form.tube.wallMm != null
          ? tubeLabel(
              catalogue,
              { materialId: form.tube.materialId, odMm: form.tube.odMm, wallMm: form.tube.wallMm },
              system,
            )
          : "—",
    ],
  ];
  return (
    <dl className="hidden grid-cols-[10rem_1fr] gap-x-3 gap-y-1 text-sm print:grid">
      {rows.map(([k, v]) => (
        <div key={k} className="contents">
          <dt className="text-ink-muted">{k}</dt>
          <dd>{v}</dd>
        </div>
      ))}
    </dl>
  );
}

/** On paper: the optional groups, each only when filled in. */
function printedOptionalRows(
  form: BuilderForm,
  n: (v: SiNumber, q: DisplayQuantity) => string,
): [string, string][] {
  const rows: [string, string][] = [];
  const x = (v: SiNumber) => (v == null || Number.isNaN(v) ? "—" : String(v));
  const s = form.speed;
  const topGear = form.torque.topGearRatio ?? s.topGearRatio;
  if (s.maxEngineRpm != null || topGear != null)
    rows.push(["Engine path", `${x(s.maxEngineRpm)} rpm, top gear ${x(topGear)}`]);
  if (form.torque.ratedShaftTorqueNm != null)
    rows.push(["Rated shaft torque", n(form.torque.ratedShaftTorqueNm, "torque")]);
  const t = form.traction;
  if ([t.drivenAxleLoadKg, t.tireLoadedRadiusMm, t.adhesion].some((v) => v != null))
    rows.push([
      "Traction",
      `axle load ${n(t.drivenAxleLoadKg, "mass")}, loaded radius ${n(t.tireLoadedRadiusMm, "length")}, adhesion ${x(t.adhesion)}`,
    ]);
  const sl = form.slip;
  if ([sl.collapsedLengthMm, sl.travelMm, sl.droopExtensionMm, sl.bumpCompressionMm].some((v) => v != null))
    rows.push([
      "Slip",
      `collapsed ${n(sl.collapsedLengthMm, "length")}, travel ${n(sl.travelMm, "length")}, droop ${n(sl.droopExtensionMm, "length")}, bump ${n(sl.bumpCompressionMm, "length")}${sl.slipYokeId ? `, slip yoke ${sl.slipYokeId}` : ""}`,
    ]);
  const i = form.interface;
  const o = i.transmissionOutput;
  if (o.splineCount != null || o.majorDiameterMm != null)
    rows.push(["Output spline", `${x(o.splineCount)} teeth, ${n(o.majorDiameterMm, "diameter")}`]);
  for (const [key, label] of [
    ["pinion", "Pinion end"],
    ["front", "Front end"],
  ] as const) {
    const e = i[key];
    if (e.kind === "yoke")
      rows.push([
        label,
        `yoke${e.jointSeriesId ? ` ${e.jointSeriesId}` : ""}, caps ${n(e.capDiameterMm, "diameter")} × span ${n(e.capSpanMm, "diameter")}${e.retention ? `, ${e.retention}` : ""}`,
      ]);
    if (e.kind === "flange")
      rows.push([
        label,
        `flange, ${x(e.flange.boltCount)} bolts on ${n(e.flange.boltCircleMm, "diameter")}, pilot ${n(e.flange.pilotMm, "diameter")}`,
      ]);
  }
  if (i.lubrication) rows.push(["Joints", i.lubrication]);
  if (form.frontJointType === "double-cardan") rows.push(["Front joint", "double-Cardan"]);
  if (form.layout === "two-piece")
    rows.push(["Layout", `two-piece, centre bearing ${form.centreBearing.bearingId || "—"}`]);
  return rows;
}
