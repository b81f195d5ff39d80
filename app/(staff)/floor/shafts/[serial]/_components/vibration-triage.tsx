"use client";
import { useMemo, useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { Activity, Printer } from "lucide-react";
import {
  TRIAGE_SCORING,
  triageVibration,
  type TriageCause,
  type TriageFigure,
  type TriageResult,
} from "@/lib/driveline/triage";
import { KG_PER_LB, MM_PER_INCH } from "@/lib/driveline/units";
import { complaintFrom, runTriageSchema, type RunTriageInput, type TriageView } from "@/lib/floor/triage";
import { formatQuantity, type FloorUnits } from "@/lib/traveller/units";
import { Field } from "@/components/ui/field";
import { Alert } from "@/components/ui/alert";

/** 1 lbf = 0.45359237 kg × 9.80665 m/s² (exact by definition). */
const N_PER_LBF = KG_PER_LB * 9.80665;

const BAND: Record<TriageCause["band"], { label: string; tone: string }> = {
  "past-limit": { label: "At or past its limit", tone: "bg-fail-soft text-fail" },
  "toward-limit": { label: "Toward its limit", tone: "bg-warn-soft text-warn" },
  "well-within": { label: "Well within", tone: "bg-pass-soft text-pass" },
  "not-measured": { label: "Not measured yet", tone: "bg-paper-sunk text-ink-muted" },
};

const LOADS: { value: RunTriageInput["load"]; label: string }[] = [
  { value: "load", label: "Under load (accelerating)" },
  { value: "coast", label: "Coasting" },
  { value: "both", label: "Both" },
];

function figureText(f: Pick<TriageFigure, "quantity">, value: number, units: FloorUnits): string {
  switch (f.quantity) {
    case "rpm":
      return `${Math.round(value)} rpm`;
    case "hz":
      return `${value.toFixed(1)} Hz`;
    case "unbalance":
      return formatQuantity("unbalance", units, value);
    case "runout":
      return formatQuantity("runout", units, value);
    case "angle":
      return `${value.toFixed(1)}°`;
    case "acceleration":
      return `${Math.round(value)} rad/s²`;
    case "force":
      return units === "in" ? `${(value / N_PER_LBF).toFixed(1)} lbf` : `${value.toFixed(1)} N`;
    case "ratio":
      return value.toFixed(2);
    case "pct":
      return `${value.toFixed(3)} %`;
    case "grade":
      return `G ${value.toFixed(1)}`;
  }
}

const orderText = (order: number) => (order === 1 ? "once per turn (1× shaft)" : `${order}× shaft`);

/**
 * "Vibration triage" on a shaft's as-built record (staff): where and when it shakes → the shaft
 * speed there and the likely causes, ranked, from the frozen report and the accepted measurements
 * the server put in `view`. Computed here with the engineering core; nothing is saved.
 */
export function VibrationTriage({ view, units }: { view: TriageView; units: FloorUnits }) {
  const speedUnit = units === "in" ? "mph" : "km/h";
  const [result, setResult] = useState<{ out: TriageResult; asked: string; basis: string } | null>(null);
  const [failure, setFailure] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    control,
    formState: { errors },
  } = useForm<RunTriageInput>({
    resolver: zodResolver(runTriageSchema),
    defaultValues: { basis: view.roadSpeed ? "road" : "engine", load: "both" },
  });
  const basis = useWatch({ control, name: "basis" });
  const shaft = view.shaft;

  const onSubmit = handleSubmit((values) => {
    if (!shaft) return;
    setFailure(null);
    try {
      const out = triageVibration(shaft, complaintFrom(values, units));
      const where =
        values.basis === "road"
          ? `${values.roadSpeed} ${speedUnit}`
          : values.basis === "engine"
            ? `engine ${values.engineRpm} rpm in a ${values.gearRatio} gear`
            : `shaft ${values.shaftRpm} rpm`;
      const when = LOADS.find((l) => l.value === values.load)!.label.toLowerCase();
      // The core words the basis in SI; the road-speed one is said again in the shop's units.
      const basisText =
        values.basis === "road" && shaft.tireDiameterMm != null
          ? `road speed on ${units === "in" ? `${(shaft.tireDiameterMm / MM_PER_INCH).toFixed(1)} in` : `${Math.round(shaft.tireDiameterMm)} mm`} tires, axle ratio ${shaft.axleRatio} (engineering reference §7)`
          : out.speedBasis;
      setResult({ out, asked: `Shakes at ${where}, ${when}`, basis: basisText });
    } catch (e) {
      setResult(null);
      setFailure(e instanceof Error ? e.message : "The triage could not be computed.");
    }
  });

  const missingText = useMemo(
    () => view.missing.map((m) => `step ${m.position}, ${m.name} (${m.what})`).join("; "),
    [view.missing],
  );

  return (
    <section aria-labelledby="triage-heading" className="card p-5">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 id="triage-heading" className="text-lg font-semibold">
          Vibration triage
        </h2>
        {result && (
          <button type="button" className="no-print btn-quiet" onClick={() => window.print()}>
            <Printer className="size-4" aria-hidden="true" />
            Print
          </button>
        )}
      </div>
      {!shaft ? (
        <div className="mt-3 flex gap-3 rounded-md bg-paper-sunk p-4 text-sm">
          <Activity className="size-5 shrink-0 text-steel-500" aria-hidden="true" />
          <div>
            <p className="font-semibold">No measurements to triage yet</p>
            <p className="mt-1 text-ink-muted">
              The triage compares a complaint with what was measured on this shaft. Waiting for:{" "}
              {missingText || "the shaft's frozen evaluation"}.
            </p>
          </div>
        </div>
      ) : (
        <>
          <p className="mt-1 text-sm text-ink-muted">
            Where and when does it shake? The shaft speed there is compared with this shaft&apos;s frozen
            evaluation and its as-built measurements. Nothing is saved.
          </p>
          {view.missing.length > 0 && (
            <p className="mt-2 text-sm">
              <span className="font-semibold">Not measured yet:</span> {missingText}. Those causes show as
              &ldquo;not measured&rdquo;.
            </p>
          )}
          <form onSubmit={onSubmit} noValidate className="no-print mt-4 space-y-4" aria-label="Complaint">
            <fieldset>
              <legend className="field-label">Speed where it shakes</legend>
              <div className="flex flex-wrap gap-2">
                {(
                  [
                    ["road", `Road speed (${speedUnit})`],
                    ["engine", "Engine rpm and gear"],
                    ["shaft", "Shaft rpm"],
                  ] as const
                ).map(([value, label]) => (
                  <label
                    key={value}
                    className="flex cursor-pointer items-center gap-2 rounded-md border border-line-strong px-3 py-1.5 text-sm has-[:checked]:border-steel-600 has-[:checked]:bg-steel-50 has-[:disabled]:cursor-not-allowed has-[:disabled]:opacity-60"
                  >
                    <input
                      type="radio"
                      value={value}
                      disabled={value === "road" && !view.roadSpeed}
                      {...register("basis")}
                    />
                    {label}
                  </label>
                ))}
              </div>
              {!view.roadSpeed && (
                <p className="field-hint">
                  Road speed needs the design&apos;s axle ratio and tire size, which this design does not
                  give.
                </p>
              )}
            </fieldset>
            <div className="grid gap-4 sm:grid-cols-2">
              {basis === "road" && (
                <Field
                  label={`Road speed (${speedUnit})`}
                  inputMode="decimal"
                  autoComplete="off"
                  {...register("roadSpeed")}
                  error={errors.roadSpeed?.message}
                />
              )}
              {basis === "engine" && (
                <>
                  <Field
                    label="Engine speed (rpm)"
                    inputMode="decimal"
                    autoComplete="off"
                    {...register("engineRpm")}
                    error={errors.engineRpm?.message}
                  />
                  <Field
                    label="Gear ratio"
                    inputMode="decimal"
                    autoComplete="off"
                    hint="The gear it shakes in, e.g. 1.00 for direct, 0.70 for an overdrive"
                    {...register("gearRatio")}
                    error={errors.gearRatio?.message}
                  />
                </>
              )}
              {basis === "shaft" && (
                <Field
                  label="Shaft speed (rpm)"
                  inputMode="decimal"
                  autoComplete="off"
                  {...register("shaftRpm")}
                  error={errors.shaftRpm?.message}
                />
              )}
            </div>
            <fieldset>
              <legend className="field-label">When it shakes</legend>
              <div className="flex flex-wrap gap-2">
                {LOADS.map((l) => (
                  <label
                    key={l.value}
                    className="flex cursor-pointer items-center gap-2 rounded-md border border-line-strong px-3 py-1.5 text-sm has-[:checked]:border-steel-600 has-[:checked]:bg-steel-50"
                  >
                    <input type="radio" value={l.value} {...register("load")} />
                    {l.label}
                  </label>
                ))}
              </div>
              {errors.load && <p className="field-error">{errors.load.message}</p>}
            </fieldset>
            <button type="submit" className="btn-primary min-h-11">
              <Activity className="size-4" aria-hidden="true" />
              Run triage
            </button>
          </form>
          {failure && (
            <div className="mt-4">
              <Alert tone="error">{failure}</Alert>
            </div>
          )}
          {result && (
            <TriageResults result={result.out} asked={result.asked} basis={result.basis} units={units} />
          )}
        </>
      )}
    </section>
  );
}

function TriageResults({
  result,
  asked,
  basis,
  units,
}: {
  result: TriageResult;
  asked: string;
  basis: string;
  units: FloorUnits;
}) {
  return (
    <div className="mt-5 space-y-4 border-t border-line pt-4" aria-live="polite">
      <div>
        <p className="text-sm text-ink-muted">{asked}</p>
        <p className="text-lg font-semibold">
          Shaft speed {Math.round(result.shaftRpm)} rpm ({result.shaftHz.toFixed(1)} Hz)
        </p>
        <p className="text-sm text-ink-muted">From {basis}.</p>
        {result.notes.map((n) => (
          <p key={n} className="mt-1 text-sm font-semibold text-warn">
            {n}
          </p>
        ))}
      </div>
      <Alert tone="warning" title="Before anyone drives it">
        {result.cautions.map((c) => (
          <p key={c}>{c}</p>
        ))}
      </Alert>
      {result.notTheShaft && <Alert tone="info">{result.notTheShaft}</Alert>}
      <ol className="space-y-3" aria-label="Likely causes, most likely first">
        {result.causes.map((c, i) => (
          <li key={c.id} className="break-inside-avoid rounded-md border border-line p-4">
            <div className="flex flex-wrap items-baseline justify-between gap-2">
              <h3 className="font-semibold">
                {i + 1}. {c.title}
              </h3>
              <span className={`rounded-full px-2 py-0.5 text-xs font-semibold ${BAND[c.band].tone}`}>
                {BAND[c.band].label}
                {c.score != null && ` · ${c.score.toFixed(2)}× limit`}
              </span>
            </div>
            <p className="mt-1 text-sm text-ink-muted">
              {c.frequencyHz.toFixed(1)} Hz · {orderText(c.order)}
            </p>
            <p className="mt-2 text-sm">{c.summary}</p>
            {c.figures.length > 0 && (
              <dl className="mt-2 grid gap-x-6 gap-y-1 text-sm">
                {c.figures.map((f) => (
                  <div key={f.label} className="flex flex-wrap justify-between gap-x-3">
                    <dt className="text-ink-muted">{f.label}</dt>
                    <dd className="font-mono">
                      {figureText(f, f.value, units)}
                      {f.limit != null && ` (limit ${figureText(f, f.limit, units)})`}
                    </dd>
                  </div>
                ))}
              </dl>
            )}
            <p className="mt-2 text-sm">{c.loadNote}</p>
            <p className="mt-2 text-sm font-semibold">What to check</p>
            <ul className="list-disc space-y-0.5 pl-5 text-sm">
              {c.whatToCheck.map((w) => (
                <li key={w}>{w}</li>
              ))}
            </ul>
          </li>
        ))}
      </ol>
      {result.otherSources.length > 0 && (
        <div className="text-sm">
          <p className="font-semibold">Also turning at this speed (not the shaft)</p>
          <ul className="list-disc pl-5">
            {result.otherSources.map((o) => (
              <li key={o.label}>
                {o.label}: {o.frequencyHz.toFixed(1)} Hz. {o.note}
              </li>
            ))}
          </ul>
        </div>
      )}
      <details className="text-sm">
        <summary className="cursor-pointer font-semibold">How the causes are ranked</summary>
        <p className="mt-1 text-ink-muted">{TRIAGE_SCORING}</p>
      </details>
    </div>
  );
}
