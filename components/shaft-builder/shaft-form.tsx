"use client";

import type { FieldErrors } from "react-hook-form";
import type { EvaluationReport, FieldIssue } from "@/lib/driveline";
import { Alert } from "@/components/ui/alert";
import type { FieldKit } from "./field-kit";
import {
  AnglesSection,
  ApplicationSection,
  FormSection,
  LengthSection,
  NameField,
  SpeedSection,
  TorqueSection,
} from "./form-sections";
import { InterfaceFields } from "./interface-fields";
import { LayoutFields } from "./layout-fields";
import type { BuilderForm, FormValidation } from "./model";
import { SlipFields } from "./slip-fields";
import { TubePicker } from "./tube-picker";

/** Fields the form shows an error beside; any other issue is listed once under the form. */
const SHOWN_PATHS = [
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
];
const TUBE_PATHS = ["tube.materialId", "tube.odMm", "tube.wallMm"];
/** The optional groups show every error of theirs beside its field. */
const GROUP_PREFIXES = ["traction.", "slip.", "interface.", "centreBearing."];

/** The core's issues that no field on screen shows. */
export function otherIssuesOf(issues: readonly FieldIssue[], tubeChosen: boolean): FieldIssue[] {
  const shown = new Set([...SHOWN_PATHS, ...(tubeChosen ? TUBE_PATHS : [])]);
  return issues.filter(
    (i) =>
      !shown.has(i.path.startsWith("ends.") ? i.path.replace(/\.fittingId$/, "") : i.path) &&
      !GROUP_PREFIXES.some((p) => i.path.startsWith(p)),
  );
}

/** Compact layout: Enter in a one-line field does not submit the form (only its buttons do). */
function keepEnterFromSubmitting(e: React.KeyboardEvent<HTMLFormElement>) {
  const t = e.target;
  if (e.key === "Enter" && t instanceof HTMLInputElement && !["submit", "button"].includes(t.type))
    e.preventDefault();
}

/**
 * The guided form, in the order of a measuring sheet: use, length and ends, angles, torque,
 * speed, tube, then the optional slip, layout and vehicle-end groups; then saving (and at the
 * counter the order details with the quote button), and the saved designs below.
 */
export function ShaftForm({
  kit,
  errors,
  validation,
  report,
  onSubmit,
  saveBar,
  quoteButton,
  drafts,
}: {
  kit: FieldKit;
  errors: FieldErrors<BuilderForm>;
  validation: FormValidation;
  report: EvaluationReport | null;
  onSubmit: React.FormEventHandler<HTMLFormElement>;
  saveBar: React.ReactNode;
  quoteButton: React.ReactNode;
  drafts: React.ReactNode;
}) {
  const otherIssues = otherIssuesOf(validation.issues, kit.values.tubeMode === "chosen");
  return (
    <form
      className="no-print min-w-0 space-y-5"
      noValidate
      aria-label="Shaft design"
      onSubmit={onSubmit}
      onKeyDown={kit.compact ? keepEnterFromSubmitting : undefined}
    >
      <ApplicationSection kit={kit} errors={errors} />
      <LengthSection kit={kit} />
      <AnglesSection kit={kit} report={report} />
      <TorqueSection kit={kit} report={report} valid={validation.design !== null} />
      <SpeedSection kit={kit} report={report} />
      <FormSection kit={kit} id="s-tube" title="6. Tube">
        <TubePicker kit={kit} />
        {kit.guide("tube")}
      </FormSection>
      <FormSection kit={kit} id="s-slip" title="7. Slip and layout">
        <SlipFields kit={kit} />
        <LayoutFields kit={kit} />
      </FormSection>
      <FormSection kit={kit} id="s-if" title="8. Where the shaft meets the vehicle">
        <InterfaceFields kit={kit} />
      </FormSection>

      {otherIssues.length > 0 && (
        <Alert tone="error" title="Other fields to fix">
          <ul className="list-disc pl-4">
            {otherIssues.map((i) => (
              <li key={i.message}>{i.message}</li>
            ))}
          </ul>
        </Alert>
      )}

      {kit.compact ? (
        <FormSection kit={kit} id="s-order" title="9. Order details">
          <NameField kit={kit} errors={errors} />
          <div className="flex flex-wrap items-center gap-3">{quoteButton}</div>
          <div className="flex flex-wrap items-center gap-3 border-t border-line pt-3">{saveBar}</div>
        </FormSection>
      ) : (
        <div className="flex flex-wrap items-center gap-3 card p-4">{saveBar}</div>
      )}
      {drafts}
    </form>
  );
}
