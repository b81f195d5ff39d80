"use client";

import type { Catalogue } from "@/lib/driveline";
import { sameTubeOd, sameTubeWall } from "@/lib/driveline/catalogue/tube-match";
import { RadioChoices, type FieldKit } from "./field-kit";
import { withUnit, type SiNumber } from "./model";

/** The catalogue value nearest to `to` (the first when `to` is empty). */
const nearest = (values: number[], to: SiNumber) =>
  values.reduce(
    (best, v) => (to != null && Math.abs(v - to) < Math.abs(best - to) ? v : best),
    values[0] ?? 0,
  );

/** The walls a material offers at one outside diameter, thinnest first. */
const wallsAt = (catalogue: Catalogue, materialId: string, odMm: number) =>
  catalogue.tubes
    .filter((t) => t.materialId === materialId && sameTubeOd(t.odMm, odMm))
    .map((t) => t.wallMm)
    .sort((a, b) => a - b);

/**
 * The tube: let Yokeline pick, or choose one from the catalogue — material, then outside diameter,
 * then wall, each narrowing the next (a size from a file that the catalogue lacks stays shown as such).
 */
export function TubePicker({ kit }: { kit: FieldKit }) {
  const { values, errs, markChanged, catalogue } = kit;
  const tube = values.tube;
  const materials = catalogue.materials.filter((m) => catalogue.tubes.some((t) => t.materialId === m.id));
  const ods = [
    ...new Set(catalogue.tubes.filter((t) => t.materialId === tube?.materialId).map((t) => t.odMm)),
  ].sort((a, b) => a - b);
  const walls = tube?.odMm != null ? wallsAt(catalogue, tube.materialId, tube.odMm) : [];
  const currentOd = ods.find((o) => tube?.odMm != null && sameTubeOd(o, tube.odMm));
  const currentWall = walls.find((w) => tube?.wallMm != null && sameTubeWall(w, tube.wallMm));

  const choose = (materialId: string, odMm: number) => {
    const wallMm = nearest(wallsAt(catalogue, materialId, odMm), tube?.wallMm ?? null);
    kit.setValue("tube", { materialId, odMm, wallMm }, { shouldDirty: true });
    markChanged();
  };
  const setMaterial = (materialId: string) => {
    const list = catalogue.tubes.filter((t) => t.materialId === materialId);
    choose(materialId, nearest([...new Set(list.map((t) => t.odMm))], tube?.odMm ?? null));
  };

  return (
    <>
      <fieldset className="space-y-1">
        <legend className="sr-only">Tube</legend>
        <RadioChoices
          kit={kit}
          name="tubeMode"
          choices={[
            ["auto", "Let Yokeline pick (recommended)"],
            ["chosen", "I want a specific tube"],
          ]}
        />
      </fieldset>
      {values.tubeMode === "chosen" && (
        <div className="grid gap-4 sm:grid-cols-3">
          <div>
            <label htmlFor="tube-material" className="field-label">
              Tube material
            </label>
            <select
              id="tube-material"
              className="field-input"
              value={tube?.materialId ?? ""}
              onChange={(e) => setMaterial(e.target.value)}
              aria-invalid={errs["tube.materialId"] ? true : undefined}
            >
              {!materials.some((m) => m.id === tube?.materialId) && (
                <option value={tube?.materialId ?? ""}>{tube?.materialId} (from file)</option>
              )}
              {materials.map((m) => (
                <option key={m.id} value={m.id}>
                  {m.name.split(" (")[0]}
                </option>
              ))}
            </select>
            {errs["tube.materialId"] && <p className="field-error">{errs["tube.materialId"]}</p>}
          </div>
          <SizeSelect
            kit={kit}
            id="tube-od"
            label="Outside diameter"
            sizes={ods}
            current={currentOd}
            given={tube?.odMm}
            error={errs["tube.odMm"]}
            onPick={(od) => choose(tube?.materialId ?? "", od)}
          />
          <SizeSelect
            kit={kit}
            id="tube-wall"
            label="Wall"
            sizes={walls}
            current={currentWall}
            given={tube?.wallMm}
            error={errs["tube.wallMm"]}
            onPick={(wall) => {
              kit.setValue("tube.wallMm", wall, { shouldDirty: true });
              markChanged();
            }}
          />
        </div>
      )}
    </>
  );
}

/** One of the tube's size selects; a size not in the catalogue (from a file) is shown as such. */
function SizeSelect({
  kit,
  id,
  label,
  sizes,
  current,
  given,
  error,
  onPick,
}: {
  kit: FieldKit;
  id: string;
  label: string;
  sizes: number[];
  current: number | undefined;
  given: SiNumber | undefined;
  error: string | undefined;
  onPick: (mm: number) => void;
}) {
  return (
    <div>
      <label htmlFor={id} className="field-label">
        {label}
      </label>
      <select
        id={id}
        className="field-input"
        value={current != null ? String(current) : "custom"}
        onChange={(e) => onPick(Number(e.target.value))}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
      >
        {current == null && (
          <option value="custom">
            {given != null ? withUnit(given, "diameter", kit.system) : "—"} (from file)
          </option>
        )}
        {sizes.map((mm) => (
          <option key={mm} value={String(mm)}>
            {withUnit(mm, "diameter", kit.system)}
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
