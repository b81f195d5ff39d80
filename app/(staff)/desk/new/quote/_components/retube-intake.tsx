"use client";
import { useId, useState } from "react";
import { useRouter } from "next/navigation";
import { Loader2 } from "lucide-react";
import { Alert } from "@/components/ui/alert";
import { sendJson, useMutation } from "@/lib/browser/mutation";
import {
  RETUBE_PARTS,
  RETUBE_PART_LABEL,
  emptyIntake,
  retubeLengthCheck,
  saveRepairBodySchema,
  type RepairIntake,
  type RetubeGeometry,
  type ShaftJob,
} from "@/lib/retube/intake";
import { formatQuantity, fromSi, toSi, unitOf, type FloorUnits } from "@/lib/traveller/units";
import { zodIssues } from "@/lib/validation";

export interface RetubeIntakeProps {
  designId: string;
  shaftName: string;
  /** What is saved on the draft now. */
  job: ShaftJob;
  initial: { weldToWeldMm: number; parts: RepairIntake["parts"] } | null;
  geometry: RetubeGeometry;
  /** The floor's units: the counter measures with the same tape as the floor. */
  units: FloorUnits;
}

type Errors = Record<string, string>;

/**
 * The counter's choice for one shaft: a new shaft, or a re-tube of the customer's shaft with its
 * weld-to-weld and the parts reused. Saved on the draft; the quote beside it is re-priced from it
 * (reused parts not charged, the teardown line added). Errors name the field and keep every entry.
 *
 * Joint-centre length: the counter MEASURES it on the shaft (front cross centre to rear cross
 * centre) and enters it in the builder; weld-to-weld + the catalogue fittings' joint-centre-to-weld-
 * seat is shown beside it as a cross-check only (a reused yoke need not match the catalogue part).
 */
export function RetubeIntake({ designId, shaftName, job, initial, geometry, units }: RetubeIntakeProps) {
  const router = useRouter();
  const id = useId();
  const unit = unitOf("length", units);
  const show = (mm: number) => formatQuantity("length", units, mm);
  const [choice, setChoice] = useState<ShaftJob>(job);
  const start = initial ?? emptyIntake();
  const [weld, setWeld] = useState(
    start.weldToWeldMm != null ? fromSi("length", units, start.weldToWeldMm).toFixed(unit.decimals) : "",
  );
  const [parts, setParts] = useState<RepairIntake["parts"]>(start.parts);
  const [errors, setErrors] = useState<Errors>({});
  const [message, setMessage] = useState<{ tone: "error" | "success"; text: string } | null>(null);
  const saveRepair = useMutation((body: unknown) =>
    sendJson(`/api/designs/${designId}/repair`, { method: "PUT", body }),
  );
  const saving = saveRepair.pending;

  const weldNumber = weld.trim() === "" ? NaN : Number(weld.trim().replace(",", "."));
  const weldMm = Number.isFinite(weldNumber) ? toSi("length", units, weldNumber) : NaN;
  const check = retubeLengthCheck(weldMm, geometry);

  const setPart = (part: keyof RepairIntake["parts"], patch: Partial<RepairIntake["parts"]["frontEnd"]>) =>
    setParts((all) => ({ ...all, [part]: { ...all[part], ...patch } }));

  async function save() {
    setMessage(null);
    const body =
      choice === "retube"
        ? { job: "retube" as const, repair: { weldToWeldMm: Number.isFinite(weldMm) ? weldMm : weld, parts } }
        : { job: "new" as const };
    // The server's own schema first, so a mistake is named before anything is sent.
    const parsed = saveRepairBodySchema.safeParse(body);
    if (!parsed.success) {
      setErrors(Object.fromEntries(zodIssues(parsed.error).map((i) => [i.path, i.message])));
      setMessage({ tone: "error", text: "Fix the fields marked below; nothing was saved yet." });
      return;
    }
    setErrors({});
    // A failed call keeps every entry here and frees the button.
    const res = await saveRepair.run(parsed.data);
    if (!res.ok) {
      setErrors(res.error.fields ?? {});
      setMessage({
        tone: "error",
        text:
          res.error.code === "unreachable"
            ? "No connection to the shop. Your entries are still here; try again."
            : res.error.message,
      });
      return;
    }
    setMessage({
      tone: "success",
      text:
        choice === "retube" ? "Saved: the quote is priced as a re-tube." : "Saved: priced as a new shaft.",
    });
    router.refresh();
  }

  const weldError = errors["repair.weldToWeldMm"];
  return (
    <section className="no-print card p-5" aria-labelledby={`${id}-title`} data-testid="retube-intake">
      <h2 id={`${id}-title`} className="font-semibold">
        Job for {shaftName}
      </h2>
      <fieldset className="mt-3">
        <legend className="sr-only">New shaft or re-tube</legend>
        <div className="grid gap-2 sm:grid-cols-2">
          {(
            [
              ["new", "New shaft", "Everything new, built to the design."],
              [
                "retube",
                "Re-tube / repair",
                "The customer's shaft is in: new tube, their parts reused where they pass inspection.",
              ],
            ] as const
          ).map(([value, title, hint]) => (
            <label
              key={value}
              className="flex cursor-pointer items-start gap-3 rounded-md border border-line-strong bg-white p-3 has-[:checked]:border-steel-600 has-[:checked]:ring-2 has-[:checked]:ring-brass-400"
            >
              <input
                type="radio"
                name={`${id}-job`}
                value={value}
                checked={choice === value}
                onChange={() => setChoice(value)}
                className="mt-1"
              />
              <span>
                <span className="block font-medium">{title}</span>
                <span className="text-sm text-ink-muted">{hint}</span>
              </span>
            </label>
          ))}
        </div>
      </fieldset>

      {choice === "retube" && (
        <div className="mt-4 space-y-4">
          <div className="max-w-xs">
            <label htmlFor={`${id}-weld`} className="field-label">
              Weld-to-weld ({unit.symbol})
            </label>
            <input
              id={`${id}-weld`}
              name="repair.weldToWeldMm"
              inputMode="decimal"
              className="field-input tabular-nums"
              value={weld}
              onChange={(e) => setWeld(e.target.value)}
              aria-invalid={weldError ? true : undefined}
              aria-describedby={`${id}-weld-hint${weldError ? ` ${id}-weld-error` : ""}`}
            />
            <p id={`${id}-weld-hint`} className="mt-1 text-xs text-ink-muted">
              Weld bead centre to weld bead centre, on the shaft as it came in. The new tube is cut to this
              length.
            </p>
            {weldError && (
              <p id={`${id}-weld-error`} className="field-error">
                {weldError}
              </p>
            )}
          </div>

          <div className="rounded-md bg-paper-sunk p-3 text-sm" data-testid="retube-length-check">
            <p>
              <strong>Joint-centre length</strong> {show(geometry.lengthMm)}: measured on the customer&apos;s
              shaft (front cross centre to rear cross centre) and entered in the builder; the engineering
              checks use it.
            </p>
            {check.derivedMm != null ? (
              <p className="mt-1">
                Cross-check from weld-to-weld and the catalogue fittings: {show(weldMm)} +{" "}
                {show(geometry.frontSeatMm!)} + {show(geometry.rearSeatMm!)} ={" "}
                <strong>{show(check.derivedMm)}</strong>
                {check.disagrees ? (
                  <strong className="block text-warn">
                    That is {show(Math.abs(check.differenceMm!))}{" "}
                    {check.differenceMm! > 0 ? "longer" : "shorter"} than the joint-centre length (more than
                    the ± {show(geometry.toleranceMm)} as-welded tolerance). Measure both again, or check that
                    the design names the customer&apos;s fittings.
                  </strong>
                ) : (
                  <span className="text-ink-muted"> (within ± {show(geometry.toleranceMm)}).</span>
                )}
              </p>
            ) : (
              <p className="mt-1 text-ink-muted">Enter the weld-to-weld to cross-check it.</p>
            )}
          </div>

          <fieldset>
            <legend className="field-label">Parts reused after inspection</legend>
            <p className="mb-2 text-xs text-ink-muted">
              Tick what the customer keeps and say what condition it is in. Reused parts are not charged; the
              floor inspects each again and holds the shaft if one fails.
            </p>
            <ul className="divide-y divide-line rounded-md border border-line">
              {RETUBE_PARTS.map((part) => {
                const noteError = errors[`repair.parts.${part}.note`];
                return (
                  <li key={part} className="grid gap-2 p-2 sm:grid-cols-[14rem_1fr] sm:items-center">
                    <label className="flex cursor-pointer items-center gap-2 text-sm">
                      <input
                        type="checkbox"
                        className="size-4 accent-steel-700"
                        name={`repair.parts.${part}.reuse`}
                        checked={parts[part].reuse}
                        onChange={(e) => setPart(part, { reuse: e.target.checked })}
                      />
                      Reuse: {RETUBE_PART_LABEL[part]}
                    </label>
                    <div>
                      <input
                        className="field-input"
                        name={`repair.parts.${part}.note`}
                        aria-label={`${RETUBE_PART_LABEL[part]}: condition`}
                        placeholder={
                          parts[part].reuse ? "Condition, e.g. bores round, no wear" : "Condition (optional)"
                        }
                        maxLength={200}
                        value={parts[part].note}
                        onChange={(e) => setPart(part, { note: e.target.value })}
                        aria-invalid={noteError ? true : undefined}
                        aria-describedby={noteError ? `${id}-${part}-error` : undefined}
                      />
                      {noteError && (
                        <p id={`${id}-${part}-error`} className="field-error">
                          {noteError}
                        </p>
                      )}
                    </div>
                  </li>
                );
              })}
            </ul>
          </fieldset>
        </div>
      )}

      <div className="mt-4 flex flex-wrap items-center gap-3">
        <button type="button" className="btn-quiet" onClick={() => void save()} disabled={saving}>
          {saving && <Loader2 className="size-4 animate-spin" aria-hidden="true" />}
          {choice === "retube" ? "Save re-tube details and re-price" : "Price as a new shaft"}
        </button>
        {message && (
          <div className="min-w-0 flex-1">
            <Alert tone={message.tone}>{message.text}</Alert>
          </div>
        )}
      </div>
    </section>
  );
}
