"use client";

import { Controller } from "react-hook-form";
import { FieldGroup, anyError, type FieldKit } from "./field-kit";
import { NumberField } from "./number-field";
import type { SiNumber } from "./model";

/**
 * One "Top gear ratio" for both of its uses: the running torque (`torque.topGearRatio`) and the
 * engine-speed path (`speed.topGearRatio`). Typing sets both; a file that gives only one shows it.
 */
export function TopGearField({ kit }: { kit: FieldKit }) {
  const error = kit.errs["torque.topGearRatio"] ?? kit.errs["speed.topGearRatio"];
  return (
    <Controller
      control={kit.control}
      name="torque.topGearRatio"
      render={({ field }) => (
        <NumberField
          name={field.name}
          label="Top gear ratio"
          value={(field.value as SiNumber) ?? kit.values.speed?.topGearRatio ?? null}
          onChange={(v) => {
            field.onChange(v);
            kit.setValue("speed.topGearRatio", v, { shouldDirty: true });
            kit.markChanged();
          }}
          onBlur={field.onBlur}
          quantity={null}
          system={kit.system}
          unit=": 1"
          hint="The highest gear, below 1 for an overdrive (optional)."
          error={error}
        />
      )}
    />
  );
}

/** The engine-speed path, beside the road-speed path: max engine rpm ÷ top gear ratio. */
export function EngineSpeedField({ kit }: { kit: FieldKit }) {
  const topGear = kit.values.torque?.topGearRatio ?? kit.values.speed?.topGearRatio;
  const missingGear = kit.values.speed?.maxEngineRpm != null && topGear == null;
  return kit.num("speed.maxEngineRpm", "Maximum engine rpm", null, {
    unit: "rpm",
    hint: "Optional. With the top gear ratio (section 4) it gives a second shaft speed: engine rpm ÷ top gear. An overdrive turns the shaft faster than the engine; the faster path governs.",
    guide: "engine",
    error:
      kit.errs["speed.maxEngineRpm"] ??
      (missingGear
        ? "speed.maxEngineRpm: needs the top gear ratio (section 4) to give a shaft speed"
        : undefined),
  });
}

/** Running torque and wheel-slip inputs, folded away until wanted. */
export function RunningTorqueGroup({ kit }: { kit: FieldKit }) {
  const t = kit.values.traction;
  const filled =
    kit.values.torque?.ratedShaftTorqueNm != null ||
    (t != null && [t.drivenAxleLoadKg, t.tireLoadedRadiusMm, t.adhesion].some((v) => v != null));
  const hasError = anyError(kit.errs, "traction") || anyError(kit.errs, "torque.ratedShaftTorqueNm");
  const noAxle = kit.values.speedMode === "rpm" || kit.values.speed?.axleRatio == null;
  return (
    <FieldGroup
      title="Running torque and traction"
      summary="optional: the tires may slip before the engine's torque arrives"
      filled={filled}
      hasError={hasError}
      testId="group-traction"
    >
      {kit.num("torque.ratedShaftTorqueNm", "Machine's rated torque at the shaft", "torque", {
        hint: "Industrial machines: the torque the shaft carries all day. Vehicles leave it empty (engine torque through top gear is used).",
      })}
      <p className="text-sm text-ink-soft">
        The wheels cannot push harder than the tires grip: with the axle load and tire radius the design
        torque is the lesser of the engine&rsquo;s and the wheel-slip torque.
        {noAxle && " The wheel-slip torque needs the axle ratio (section 5, from top speed)."}
      </p>
      <div className="grid gap-4 sm:grid-cols-3">
        {kit.num("traction.drivenAxleLoadKg", "Driven axle load", "mass", {
          hint: "On the scale, loaded as it works.",
        })}
        {kit.num("traction.tireLoadedRadiusMm", "Tire radius under load", "length", {
          hint: "Axle centre to the ground, loaded.",
        })}
        {kit.num("traction.adhesion", "Tire grip (adhesion)", null, {
          hint: "Empty: the shop's figure for the use.",
        })}
      </div>
      {kit.guide("traction")}
    </FieldGroup>
  );
}
