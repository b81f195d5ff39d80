"use client";

import type { FieldErrors } from "react-hook-form";
import type { EvaluationReport } from "@/lib/driveline";
import { SHAFT_USE_LABEL, shaftUseLabel } from "@/lib/driveline/uses";
import { SHAFT_USES } from "@/lib/designs/schemas";
import { RadioChoices, type FieldKit } from "./field-kit";
import { FrontJointField } from "./layout-fields";
import type { BuilderForm } from "./model";
import { reportAdditions, speedPathText } from "./report-additions";
import { EngineSpeedField, RunningTorqueGroup, TopGearField } from "./service-fields";
import { withUnit } from "./model";

/** One numbered section of the form. */
export function FormSection({
  kit,
  id,
  title,
  children,
}: {
  kit: FieldKit;
  id: string;
  title: string;
  children: React.ReactNode;
}) {
  return (
    <section className={kit.compact ? "space-y-3 card p-3" : "space-y-4 card p-4"} aria-labelledby={id}>
      <h2 id={id} className="text-lg font-semibold">
        {title}
      </h2>
      {children}
    </section>
  );
}

/** The design's name (first on the customer's form; with the order details at the counter). */
export function NameField({ kit, errors }: { kit: FieldKit; errors: FieldErrors<BuilderForm> }) {
  return (
    <div>
      <label htmlFor="design-name" className="field-label">
        Design name
      </label>
      <input
        id="design-name"
        className="field-input"
        aria-invalid={errors.name ? true : undefined}
        {...kit.register("name", { onChange: kit.markChanged })}
      />
      {errors.name && <p className="field-error">name: {errors.name.message}</p>}
    </div>
  );
}

/** 1. What the shaft is for: the use (it sets the service factor and limits) and the vehicle. */
export function ApplicationSection({ kit, errors }: { kit: FieldKit; errors: FieldErrors<BuilderForm> }) {
  return (
    <FormSection kit={kit} id="s-app" title="1. What the shaft is for">
      {!kit.compact && <NameField kit={kit} errors={errors} />}
      <div>
        <label htmlFor="app-use" className="field-label">
          Use
        </label>
        <select
          id="app-use"
          className="field-input"
          data-autofocus={kit.compact || undefined}
          {...kit.register("application.use", { onChange: kit.markChanged })}
        >
          {SHAFT_USES.map((u) => (
            <option key={u} value={u}>
              {SHAFT_USE_LABEL[u]}
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
          {...kit.register("application.description", { onChange: kit.markChanged })}
        />
        {errors.application?.description && (
          <p className="field-error">{errors.application.description.message}</p>
        )}
      </div>
    </FormSection>
  );
}

/** An end fitting from the catalogue, or left to the shop. */
function EndSelect({ kit, end }: { kit: FieldKit; end: "front" | "rear" }) {
  const id = `end-${end}`;
  const error = kit.errs[`ends.${end}`];
  return (
    <div>
      <label htmlFor={id} className="field-label">
        {end === "front" ? "Front end fitting" : "Rear end fitting"}
      </label>
      <select
        id={id}
        className="field-input"
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        {...kit.register(`ends.${end}`, { onChange: kit.markChanged })}
      >
        <option value="">Let the shop choose</option>
        {kit.catalogue.endFittings.map((f) => (
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
}

/** 2. Length and ends. */
export function LengthSection({ kit }: { kit: FieldKit }) {
  return (
    <FormSection kit={kit} id="s-len" title="2. Length and ends">
      {kit.num("lengthMm", "Installed length", "length", {
        hint: "Joint centre to joint centre, at loaded ride height.",
        guide: "length",
      })}
      {kit.guide("no-shaft")}
      {kit.guide("weld-to-weld")}
      <div className="grid gap-4 sm:grid-cols-2">
        <EndSelect kit={kit} end="front" />
        <EndSelect kit={kit} end="rear" />
      </div>
      {kit.guide("ends")}
    </FormSection>
  );
}

/** 3. Angles: side view, the top view when offset, and the front joint type. */
export function AnglesSection({ kit, report }: { kit: FieldKit; report: EvaluationReport | null }) {
  const { num } = kit;
  return (
    <FormSection kit={kit} id="s-ang" title="3. Angles, side view">
      <p className="text-sm text-ink-soft">
        Degrees, positive when the part points down toward the rear (the pinion: nose up toward the front).
      </p>
      <div className={kit.compact ? "grid gap-3 sm:grid-cols-3" : "space-y-4"}>
        {num("geometry.transmission.verticalDeg", "Transmission angle", null, {
          unit: "°",
          guide: "transmission",
        })}
        {num("geometry.driveshaft.verticalDeg", "Driveshaft angle", null, { unit: "°", guide: "driveshaft" })}
        {num("geometry.pinion.verticalDeg", "Pinion angle", null, { unit: "°", guide: "pinion" })}
      </div>
      {kit.guide("wrap")}
      <label className="flex items-center gap-2 text-sm font-medium">
        <input
          type="checkbox"
          className="size-4 accent-steel-700"
          {...kit.register("offset", { onChange: kit.markChanged })}
        />
        My driveline is offset sideways
      </label>
      {kit.values.offset && (
        <div className="space-y-4 border-l-2 border-brass-400 pl-3">
          <p className="text-sm text-ink-soft">
            Top view, degrees, positive when the part turns to the right going rearward.
          </p>
          {num("geometry.transmission.horizontalDeg", "Transmission angle, top view", null, { unit: "°" })}
          {num("geometry.driveshaft.horizontalDeg", "Driveshaft angle, top view", null, { unit: "°" })}
          {num("geometry.pinion.horizontalDeg", "Pinion angle, top view", null, { unit: "°" })}
          {kit.guide("offset")}
        </div>
      )}
      <FrontJointField kit={kit} rearWorkingAngleDeg={report?.joints.at(-1)?.workingAngleDeg} />
    </FormSection>
  );
}

/** 4. Torque and gearing, with the design torque the core worked out. */
export function TorqueSection({
  kit,
  report,
  valid,
}: {
  kit: FieldKit;
  report: EvaluationReport | null;
  /** Whether the form as shown is a valid design (else the figure is not shown). */
  valid: boolean;
}) {
  const { num, values } = kit;
  const serviceFactor = report ? reportAdditions(report).service.serviceFactor : undefined;
  return (
    <FormSection kit={kit} id="s-tq" title="4. Torque and gearing">
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
      {values.torque && valid && (
        <p className="text-sm text-ink-soft" data-testid="design-torque">
          {serviceFactor != null ? "Design torque at the shaft" : "Torque at the shaft in first gear"}:{" "}
          <strong className="text-ink">
            {report ? withUnit(report.service.peakShaftTorqueNm, "torque", kit.system, 0) : "—"}
          </strong>
          {serviceFactor != null && (
            <>
              {" "}
              (service factor {serviceFactor.toFixed(2)} for{" "}
              {shaftUseLabel(values.application.use).toLowerCase()})
            </>
          )}
        </p>
      )}
      {kit.guide("torque")}
      <RunningTorqueGroup kit={kit} />
    </FormSection>
  );
}

/** 5. Shaft speed: from the road (top speed, tire, axle) or a known rpm, and the engine path. */
export function SpeedSection({ kit, report }: { kit: FieldKit; report: EvaluationReport | null }) {
  const { num, errs } = kit;
  const speedMode = kit.values.speedMode;
  return (
    <FormSection kit={kit} id="s-sp" title="5. Shaft speed">
      <fieldset className="space-y-1">
        <legend className="field-label">How fast does the shaft turn?</legend>
        <RadioChoices
          kit={kit}
          name="speedMode"
          choices={[
            ["vehicle", "From top speed, tire size and axle ratio"],
            ["rpm", "I know the maximum shaft rpm"],
          ]}
        />
      </fieldset>
      {speedMode === "rpm" ? (
        num("speed.maxShaftRpm", "Maximum shaft speed", null, { unit: "rpm", guide: "rpm" })
      ) : (
        <>
          {num("speed.topSpeedKmh", "Top speed", "speed", { guide: "speed" })}
          <div className="grid gap-4 sm:grid-cols-2">
            {num("speed.tireDiameterMm", "Tire diameter", "length", { guide: "tire" })}
            {num("speed.axleRatio", "Axle ratio", null, { unit: ": 1" })}
          </div>
          {errs["speed.maxShaftRpm"] && <p className="field-error">{errs["speed.maxShaftRpm"]}</p>}
        </>
      )}
      <EngineSpeedField kit={kit} />
      {report && (report.service.engineRpm != null || speedMode === "vehicle") && (
        <p className="text-sm text-ink-soft" data-testid="speed-path">
          {speedPathText(report.service, kit.system)}
        </p>
      )}
    </FormSection>
  );
}
