"use client";
import { useCallback, useEffect, useRef, useState, useSyncExternalStore } from "react";
import { useRouter } from "next/navigation";
import { CheckCircle2, Loader2, PauseCircle, ScanLine, XCircle } from "lucide-react";
import type { ScanResult, StationField } from "@/lib/floor/scan";
import type { StepResult } from "@/lib/floor/work-orders";
import { OutboxPanel } from "@/components/floor/outbox-panel";
import { enqueueSignOff, postSignOff } from "@/components/floor/step-outbox";

type StepScan = Extract<ScanResult, { kind: "step" }>;
type ApiError = { error: { code: string; message: string; fields?: Record<string, string> } };

type View =
  | { kind: "idle" }
  | { kind: "loading"; code: string }
  | { kind: "error"; message: string }
  | { kind: "step"; scan: StepScan; key: string }
  | { kind: "result"; scan: StepScan; result: StepResult }
  | { kind: "queued"; scan: StepScan };

const STATUS_TEXT: Record<StepScan["status"], string> = {
  next: "Its turn — record and submit",
  on_hold: "On hold — rework, then measure again",
  done: "Already signed off",
  ahead: "Not its turn yet",
  left: "This shaft has left the shop",
};

async function readError(res: Response): Promise<ApiError["error"]> {
  try {
    return ((await res.json()) as ApiError).error;
  } catch {
    return { code: "internal", message: `The server answered ${res.status}.` };
  }
}

/** The scan station: one input that keeps focus and acts on Enter (what a keyboard-wedge scanner sends). */
export function ScanStation({ canConcede }: { canConcede: boolean }) {
  const router = useRouter();
  const scanRef = useRef<HTMLInputElement>(null);
  const [code, setCode] = useState("");
  const [view, setView] = useState<View>({ kind: "idle" });

  const focusScan = useCallback(() => {
    scanRef.current?.focus();
    scanRef.current?.select();
  }, []);

  // The scan input takes focus back whenever nothing else is being typed in.
  useEffect(() => {
    const onFocusOut = () =>
      setTimeout(() => {
        const el = document.activeElement;
        if (!el || el === document.body) focusScan();
      }, 0);
    document.addEventListener("focusout", onFocusOut);
    return () => document.removeEventListener("focusout", onFocusOut);
  }, [focusScan]);

  async function scan(text: string) {
    const value = text.trim();
    if (!value) return;
    setView({ kind: "loading", code: value });
    const res = await fetch(`/api/floor/scan?code=${encodeURIComponent(value)}`).catch(() => null);
    if (!res) return setView({ kind: "error", message: "The server cannot be reached. Scan again." });
    if (!res.ok) {
      const error = await readError(res);
      setView({ kind: "error", message: error.fields?.code ?? error.message });
      focusScan();
      return;
    }
    const result = (await res.json()) as ScanResult;
    setCode("");
    if (result.kind === "serial") {
      router.push(result.href);
      return;
    }
    setView({ kind: "step", scan: result, key: crypto.randomUUID() });
  }

  // True once React runs in the browser: a scan typed before that would do nothing (tests wait for it).
  const hydrated = useSyncExternalStore(
    () => () => undefined,
    () => true,
    () => false,
  );

  return (
    <div className="space-y-5" data-station-ready={hydrated || undefined}>
      <OutboxPanel />
      <form
        className="card p-4 md:p-5"
        onSubmit={(e) => {
          e.preventDefault();
          void scan(code);
        }}
      >
        <label htmlFor="scan" className="block text-lg font-semibold">
          Scan a traveller barcode or a serial
        </label>
        <div className="mt-2 flex gap-2">
          <input
            ref={scanRef}
            id="scan"
            name="code"
            value={code}
            onChange={(e) => setCode(e.target.value)}
            className="field-input min-h-14 min-w-0 flex-1 font-mono text-xl uppercase placeholder:font-sans placeholder:normal-case md:text-2xl"
            autoFocus
            autoComplete="off"
            autoCapitalize="characters"
            spellCheck={false}
            enterKeyHint="go"
            placeholder="Scan or type, then Enter"
            aria-describedby="scan-help"
          />
          <button
            type="submit"
            className="btn-primary min-h-14 px-5 text-lg"
            disabled={view.kind === "loading"}
          >
            <ScanLine className="size-5" aria-hidden="true" />
            Open
          </button>
        </div>
        <p id="scan-help" className="field-hint">
          A step&apos;s barcode opens that step for its shaft; a serial&apos;s QR code opens the shaft&apos;s
          as-built record.
        </p>
      </form>

      <div aria-live="polite">
        {view.kind === "idle" && (
          <div className="card px-6 py-10 text-center text-lg text-ink-muted">
            Ready. Scan the barcode of the step you are at.
          </div>
        )}
        {view.kind === "loading" && (
          <div className="flex items-center justify-center gap-3 card px-6 py-10 text-lg" role="status">
            <Loader2 className="size-6 animate-spin" aria-hidden="true" /> Reading {view.code}…
          </div>
        )}
        {view.kind === "error" && (
          <div
            role="alert"
            className="flex gap-3 rounded-md border-2 border-fail bg-fail-soft p-5 text-lg text-fail"
          >
            <XCircle className="mt-1 size-7 shrink-0" aria-hidden="true" />
            <div>
              <p className="text-xl font-bold">Not accepted</p>
              <p className="mt-1 text-ink">{view.message}</p>
            </div>
          </div>
        )}
        {view.kind === "step" && (
          <StepPanel
            key={view.key}
            scan={view.scan}
            idempotencyKey={view.key}
            canConcede={canConcede}
            onDone={(result) => {
              setView({ kind: "result", scan: view.scan, result });
              focusScan();
            }}
            onQueued={() => {
              setView({ kind: "queued", scan: view.scan });
              focusScan();
            }}
            onCancel={() => {
              setView({ kind: "idle" });
              focusScan();
            }}
          />
        )}
        {view.kind === "queued" && (
          <div role="status" className="card px-6 py-8 text-lg">
            <p className="text-xl font-bold">Kept on this station</p>
            <p className="mt-1">
              {view.scan.serial} step {view.scan.step.position}: {view.scan.step.name} will be sent when the
              server answers. Carry on with the next step.
            </p>
          </div>
        )}
        {view.kind === "result" && <ResultPanel scan={view.scan} result={view.result} />}
      </div>
    </div>
  );
}

function StepHeading({ scan }: { scan: StepScan }) {
  return (
    <div className="flex flex-wrap items-baseline justify-between gap-2">
      <div>
        <p className="font-mono text-base text-ink-muted">
          {scan.serial} · rev {scan.revision} · order {scan.orderNumber}
        </p>
        <h2 className="text-2xl font-bold md:text-3xl">
          Step {scan.step.position} of {scan.stepCount}: {scan.step.name}
        </h2>
        <p className="text-ink-muted">
          {scan.shaftName} for {scan.customerName} · promised {scan.promisedDate}
        </p>
      </div>
    </div>
  );
}

function StepPanel({
  scan,
  idempotencyKey,
  canConcede,
  onDone,
  onQueued,
  onCancel,
}: {
  scan: StepScan;
  idempotencyKey: string;
  canConcede: boolean;
  onDone: (r: StepResult) => void;
  /** The server could not be reached: the sign-off is kept on this station and sent later. */
  onQueued: () => void;
  onCancel: () => void;
}) {
  const [values, setValues] = useState<Record<string, unknown>>({});
  const [fieldErrors, setFieldErrors] = useState<Record<string, string>>({});
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const [reason, setReason] = useState("");
  const open = scan.status === "next" || scan.status === "on_hold";
  const set = (key: string, v: unknown) => setValues((s) => ({ ...s, [key]: v }));

  async function submit() {
    setBusy(true);
    setError(null);
    const sent = await postSignOff({ code: scan.code, values, idempotencyKey });
    setBusy(false);
    if (sent.kind === "unreachable") {
      enqueueSignOff({
        code: scan.code,
        values,
        idempotencyKey,
        label: `${scan.serial} · step ${scan.step.position} of ${scan.stepCount}: ${scan.step.name}`,
        at: new Date().toISOString(),
      });
      return onQueued();
    }
    if (sent.kind === "refused") {
      const e = (sent.body as ApiError | null)?.error ?? {
        code: "internal",
        message: `The server answered ${sent.status}.`,
      };
      setFieldErrors(e.fields ?? {});
      setError(e.fields ? "Check the values marked below." : e.message);
      return;
    }
    onDone(sent.body as StepResult);
  }

  async function concede() {
    setBusy(true);
    setError(null);
    const res = await fetch(`/api/floor/work-orders/${scan.workOrderId}/concession`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ reason }),
    }).catch(() => null);
    setBusy(false);
    if (!res) return setError("The server cannot be reached.");
    if (!res.ok) {
      const e = await readError(res);
      return setError(e.fields?.reason ?? e.message);
    }
    onDone((await res.json()) as StepResult);
  }

  return (
    <section className="space-y-5 card p-4 md:p-6" aria-labelledby="step-title">
      <div id="step-title">
        <StepHeading scan={scan} />
      </div>
      <p
        className={`rounded-md px-4 py-3 text-lg font-semibold ${
          scan.status === "next"
            ? "bg-steel-50 text-steel-900"
            : scan.status === "on_hold"
              ? "bg-warn-soft text-warn"
              : "bg-fail-soft text-fail"
        }`}
      >
        {STATUS_TEXT[scan.status]}
        {(scan.status === "ahead" || scan.status === "done") && scan.next && (
          <span className="block font-normal text-ink">
            Next for {scan.serial} is step {scan.next.position}: {scan.next.name}. Scan that step&apos;s
            barcode.
          </span>
        )}
      </p>
      {scan.hold && (
        <div className="rounded-md border-2 border-warn bg-warn-soft p-4">
          <p className="font-semibold text-warn">Held for</p>
          <ul className="mt-1 list-disc space-y-1 pl-5 text-ink">
            {scan.hold.failures.map((f) => (
              <li key={f.key}>{f.message}</li>
            ))}
          </ul>
        </div>
      )}
      {scan.step.instructions.length > 0 && (
        <ul className="list-disc space-y-1 pl-5 text-lg">
          {scan.step.instructions.map((line) => (
            <li key={line}>{line}</li>
          ))}
        </ul>
      )}
      {open && (
        <form
          className="space-y-4"
          noValidate
          onSubmit={(e) => {
            e.preventDefault();
            void submit();
          }}
        >
          {scan.step.fields.length === 0 && <p className="text-lg">Nothing to record: sign it off.</p>}
          <div className="grid gap-4 md:grid-cols-2">
            {scan.step.fields.map((f) => (
              <FieldInput
                key={f.key}
                field={f}
                value={values[f.key]}
                error={fieldErrors[f.key]}
                onChange={(v) => set(f.key, v)}
              />
            ))}
          </div>
          {error && (
            <p role="alert" className="rounded-md bg-fail-soft px-4 py-3 text-lg text-fail">
              {error}
            </p>
          )}
          <div className="flex flex-wrap gap-3">
            <button type="submit" className="btn-primary min-h-14 px-8 text-lg" disabled={busy}>
              {busy ? "Recording…" : scan.status === "on_hold" ? "Submit the new measurement" : "Submit"}
            </button>
            <button type="button" className="btn-quiet min-h-14 px-6 text-lg" onClick={onCancel}>
              Cancel
            </button>
          </div>
        </form>
      )}
      {scan.status === "on_hold" && canConcede && (
        <form
          className="space-y-2 border-t border-line pt-4"
          onSubmit={(e) => {
            e.preventDefault();
            void concede();
          }}
        >
          <label htmlFor="concession-reason" className="field-label">
            Owner&apos;s concession: accept it as it is, because…
          </label>
          <input
            id="concession-reason"
            className="field-input min-h-12 text-lg"
            value={reason}
            onChange={(e) => setReason(e.target.value)}
            required
            minLength={3}
          />
          <button type="submit" className="btn-quiet min-h-12" disabled={busy}>
            Accept with concession
          </button>
        </form>
      )}
      {!open && (
        <button type="button" className="btn-quiet min-h-12" onClick={onCancel}>
          Back to scanning
        </button>
      )}
    </section>
  );
}

function FieldInput({
  field,
  value,
  error,
  onChange,
}: {
  field: StationField;
  value: unknown;
  error?: string;
  onChange: (v: unknown) => void;
}) {
  const id = `f-${field.key}`;
  const describedBy = [field.type === "number" ? `${id}-limit` : null, error ? `${id}-error` : null]
    .filter(Boolean)
    .join(" ");
  const errorLine = error && (
    <p id={`${id}-error`} className="field-error text-base">
      {error}
    </p>
  );
  if (field.type === "confirm") {
    return (
      <fieldset className={error ? "rounded-md ring-2 ring-fail" : undefined}>
        <legend className="field-label text-base">{field.label}</legend>
        <div className="flex gap-3">
          {(["yes", "no"] as const).map((answer) => (
            <label
              key={answer}
              className="flex min-h-14 flex-1 cursor-pointer items-center justify-center gap-2 rounded-md border border-line-strong bg-white text-lg font-semibold has-[:checked]:border-steel-600 has-[:checked]:ring-2 has-[:checked]:ring-brass-400"
            >
              <input
                type="radio"
                name={field.key}
                className="size-5"
                checked={value === (answer === "yes")}
                onChange={() => onChange(answer === "yes")}
              />
              {answer === "yes" ? "Yes" : "No"}
            </label>
          ))}
        </div>
        {errorLine}
      </fieldset>
    );
  }
  if (field.type === "weights") return <WeightsInput field={field} onChange={onChange} error={error} />;
  return (
    <div>
      <label htmlFor={id} className="field-label text-base">
        {field.label}
        {field.unit ? ` (${field.unit})` : ""}
      </label>
      <input
        id={id}
        name={field.key}
        className="field-input min-h-14 text-xl"
        inputMode={field.type === "number" ? "decimal" : "text"}
        autoComplete="off"
        value={typeof value === "string" ? value : ""}
        onChange={(e) => onChange(e.target.value)}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy || undefined}
      />
      {field.type === "number" && (
        <p id={`${id}-limit`} className="mt-1 text-lg font-semibold text-ink-soft">
          {field.station && <span className="block">At {field.station}</span>}
          {field.limit ? <>Limit {field.limit}</> : "No limit"}
        </p>
      )}
      {errorLine}
    </div>
  );
}

interface WeightRow {
  plane: "front" | "rear";
  mass: string;
  angleDeg: string;
}

function WeightsInput({
  field,
  error,
  onChange,
}: {
  field: StationField;
  error?: string;
  onChange: (v: unknown) => void;
}) {
  const [rows, setRows] = useState<WeightRow[]>([]);
  const update = (next: WeightRow[]) => {
    setRows(next);
    onChange(next.filter((r) => r.mass.trim() !== "" || r.angleDeg.trim() !== ""));
  };
  return (
    <fieldset className="md:col-span-2">
      <legend className="field-label text-base">
        {field.label} (mass in the shop&apos;s units, angle in °)
      </legend>
      {rows.length === 0 && <p className="text-ink-muted">None added.</p>}
      <div className="space-y-2">
        {rows.map((r, i) => (
          <div key={i} className="grid grid-cols-[1fr_1fr_1fr_auto] gap-2">
            <select
              aria-label={`Weight ${i + 1} plane`}
              className="field-input min-h-12"
              value={r.plane}
              onChange={(e) =>
                update(
                  rows.map((x, j) => (j === i ? { ...x, plane: e.target.value as WeightRow["plane"] } : x)),
                )
              }
            >
              <option value="front">Front</option>
              <option value="rear">Rear</option>
            </select>
            <input
              aria-label={`Weight ${i + 1} mass`}
              className="field-input min-h-12"
              inputMode="decimal"
              value={r.mass}
              onChange={(e) => update(rows.map((x, j) => (j === i ? { ...x, mass: e.target.value } : x)))}
            />
            <input
              aria-label={`Weight ${i + 1} angle (°)`}
              className="field-input min-h-12"
              inputMode="decimal"
              value={r.angleDeg}
              onChange={(e) => update(rows.map((x, j) => (j === i ? { ...x, angleDeg: e.target.value } : x)))}
            />
            <button
              type="button"
              className="btn-quiet min-h-12"
              onClick={() => update(rows.filter((_, j) => j !== i))}
            >
              Remove
            </button>
          </div>
        ))}
      </div>
      <button
        type="button"
        className="mt-2 btn-quiet min-h-12"
        onClick={() => update([...rows, { plane: "front", mass: "", angleDeg: "" }])}
      >
        Add a weight
      </button>
      {error && <p className="field-error text-base">{error}</p>}
    </fieldset>
  );
}

function ResultPanel({ scan, result }: { scan: StepScan; result: StepResult }) {
  const held = result.outcome === "hold";
  return (
    <section
      role={held ? "alert" : "status"}
      className={`space-y-3 rounded-md border-2 p-5 ${held ? "border-warn bg-warn-soft" : "border-pass bg-pass-soft"}`}
    >
      <div className={`flex items-center gap-3 ${held ? "text-warn" : "text-pass"}`}>
        {held ? (
          <PauseCircle className="size-9 shrink-0" aria-hidden="true" />
        ) : (
          <CheckCircle2 className="size-9 shrink-0" aria-hidden="true" />
        )}
        <h2 className="text-2xl font-bold md:text-3xl">
          {held
            ? `On hold: ${result.step.name}`
            : result.outcome === "concession"
              ? `Accepted with concession: ${result.step.name}`
              : result.outcome === "rework"
                ? `Rework passed: ${result.step.name}`
                : `Passed: ${result.step.name}`}
        </h2>
      </div>
      <p className="font-mono text-ink-muted">
        {result.serial} · order {scan.orderNumber}
        {result.replayed ? " · already recorded (nothing new)" : ""}
      </p>
      {held && (
        <ul className="list-disc space-y-1 pl-5 text-lg text-ink">
          {result.failures.map((f) => (
            <li key={f.key}>{f.message}</li>
          ))}
        </ul>
      )}
      <p className="text-lg text-ink">
        {held
          ? "Rework the shaft, then scan this step again and record the new measurement."
          : result.next
            ? `Next: step ${result.next.position}, ${result.next.name}. Scan its barcode.`
            : "This shaft has left the shop."}
      </p>
    </section>
  );
}
