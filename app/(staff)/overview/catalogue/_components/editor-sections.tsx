"use client";
import { ArrowDown, ArrowUp, Plus, RotateCcw, Trash2 } from "lucide-react";
import { get, useFieldArray, useFormContext, useFormState, useWatch } from "react-hook-form";
import { defaultSettings, mmToIn, type SettingKey } from "@/lib/driveline";
import { FLOOR_LIMIT_META, LIMIT_META, type LimitMeta } from "@/lib/catalogue/limits";
import type { ShopConfigDocumentInput } from "@/lib/catalogue/schemas";
import { defaultFloorLimits, STEP_KINDS, type FloorLimitKey } from "@/lib/traveller/settings";
import { CheckboxInput, LinesInput, NumberInput, SelectInput, TextInput, type Path } from "./editor-inputs";

const TH = "px-2 py-2 font-semibold whitespace-nowrap";
export const TD = "px-2 py-1.5 align-top";
export const inches = (digits: number) => (mm: number) => `${mmToIn(mm).toFixed(digits)} in`;

export const WELD_FAMILIES = [
  { value: "steel", label: "Steel" },
  { value: "aluminium", label: "Aluminium" },
  { value: "composite", label: "Composite" },
];
const FITTING_KINDS = [
  { value: "weld-yoke", label: "Weld yoke" },
  { value: "slip-yoke-assembly", label: "Slip yoke assembly" },
  { value: "flange-yoke", label: "Flange yoke" },
];

export function Section({
  id,
  title,
  description,
  action,
  children,
}: {
  id: string;
  title: string;
  description?: React.ReactNode;
  action?: React.ReactNode;
  children: React.ReactNode;
}) {
  return (
    <section id={id} aria-labelledby={`${id}-title`} className="scroll-mt-24 space-y-3">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h2 id={`${id}-title`} className="text-lg font-semibold">
            {title}
          </h2>
          {description && <p className="max-w-3xl text-sm text-ink-muted">{description}</p>}
        </div>
        {action && <div className="no-print">{action}</div>}
      </div>
      {children}
    </section>
  );
}

export function Table({
  caption,
  headings,
  children,
}: {
  caption: string;
  headings: (string | { label: string; srOnly?: boolean; right?: boolean })[];
  children: React.ReactNode;
}) {
  return (
    <div className="overflow-x-auto card">
      <table className="w-full text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="border-b border-line bg-paper-sunk text-xs tracking-wide text-ink-muted uppercase">
          <tr>
            {headings.map((h) => {
              const { label, srOnly, right } = typeof h === "string" ? { label: h } : h;
              return (
                <th key={label} scope="col" className={`${TH} ${right ? "text-right" : ""}`}>
                  {srOnly ? <span className="sr-only">{label}</span> : label}
                </th>
              );
            })}
          </tr>
        </thead>
        <tbody className="divide-y divide-line">{children}</tbody>
      </table>
    </div>
  );
}

export function AddButton({ label, onClick }: { label: string; onClick: () => void }) {
  return (
    <button type="button" className="btn-quiet" onClick={onClick}>
      <Plus className="size-4" aria-hidden="true" />
      {label}
    </button>
  );
}

export function RemoveButton({ label, onClick }: { label: string; onClick: () => void }) {
  return (
    <button
      type="button"
      className="rounded-md p-2 text-ink-muted hover:bg-fail-soft hover:text-fail"
      aria-label={label}
      title={label}
      onClick={onClick}
    >
      <Trash2 className="size-4" aria-hidden="true" />
    </button>
  );
}

/** The id a row is called by in labels ("tube YL-T-…", or "new tube, row 4"). */
export function useRowName(path: Path, noun: string, index: number): string {
  const value = useWatch<ShopConfigDocumentInput>({ name: path });
  return typeof value === "string" && value.trim() ? `${noun} ${value}` : `new ${noun}, row ${index + 1}`;
}

export function PolicySection({ currency }: { currency: string }) {
  return (
    <Section
      id="policy"
      title="Price book & policy"
      description={`What every shaft is charged beyond its parts, and what is asked up front. Money in ${currency}.`}
    >
      <div className="grid gap-4 card p-5 sm:grid-cols-2 lg:grid-cols-4">
        <NumberInput name="priceBook.labourPerShaftCents" label="Labour per shaft" money visibleLabel />
        <NumberInput name="priceBook.balancingPerShaftCents" label="Balancing per shaft" money visibleLabel />
        <NumberInput
          name="priceBook.teardownPerShaftCents"
          label="Re-tube teardown and inspection"
          money
          visibleLabel
        />
        <NumberInput
          name="priceBook.labourPerExtraPieceCents"
          label="Labour per extra piece (two-piece)"
          money
          visibleLabel
        />
        <NumberInput name="priceBook.shippingCents" label="Shipping per shaft" money visibleLabel />
        <NumberInput name="priceBook.taxRatePercent" label="Tax (%)" visibleLabel />
        <NumberInput
          name="priceBook.tubeAllowanceMm"
          label="Tube allowance per cut (mm)"
          hint={inches(2)}
          visibleLabel
        />
        <NumberInput
          name="priceBook.minimumTubeChargeMm"
          label="Shortest tube charged (mm)"
          hint={inches(1)}
          visibleLabel
        />
        <NumberInput name="priceBook.depositPercent" label="Asked up front (% of the total)" visibleLabel />
        <NumberInput
          name="priceBook.cancellationFeePercent"
          label="Kept on cancellation (% of the deposit)"
          visibleLabel
        />
        <NumberInput name="priceBook.leadTimeWorkingDays" label="Lead time (working days)" visibleLabel />
        <SelectInput
          name="priceBook.tubePreference"
          label="Tube Yokeline picks"
          visibleLabel
          options={[
            { value: "cheapest", label: "The cheapest that passes every check" },
            { value: "lightest", label: "The lightest that passes every check" },
          ]}
        />
        <TextInput name="catalogue.name" label="Catalogue name" visibleLabel className="sm:col-span-2" />
        <div className="flex items-end sm:col-span-2 lg:col-span-4">
          <CheckboxInput
            name="catalogue.demo"
            label="This is the demonstration catalogue (invented parts and prices; a warning is shown)"
          />
        </div>
      </div>
      <p className="text-sm text-ink-muted">
        100 % up front asks the whole price at ordering; less asks a deposit and the balance at final
        inspection.
      </p>
    </Section>
  );
}

function MaterialRow({ index, onRemove }: { index: number; onRemove: () => void }) {
  const p = `catalogue.materials.${index}` as const;
  const row = useRowName(`${p}.id`, "material", index);
  return (
    <tr>
      <td className={TD}>
        <TextInput name={`${p}.id`} label={`Id of ${row}`} mono className="w-36" />
      </td>
      <td className={TD}>
        <TextInput name={`${p}.name`} label={`Name of ${row}`} className="w-64" />
      </td>
      <td className={TD}>
        <NumberInput name={`${p}.elasticModulusGPa`} label={`E (GPa) of ${row}`} className="w-24" />
      </td>
      <td className={TD}>
        <NumberInput name={`${p}.densityKgM3`} label={`Density (kg/m³) of ${row}`} className="w-24" />
      </td>
      <td className={TD}>
        <NumberInput name={`${p}.tensileYieldMPa`} label={`Minimum yield (MPa) of ${row}`} className="w-24" />
      </td>
      <td className={TD}>
        <NumberInput name={`${p}.shearYieldMPa`} label={`Shear yield (MPa) of ${row}`} className="w-24" />
      </td>
      <td className={TD}>
        <TextInput name={`${p}.condition`} label={`Condition of ${row}`} className="w-48" />
      </td>
      <td className={TD}>
        <SelectInput name={`${p}.weldFamily`} label={`Weld family of ${row}`} options={WELD_FAMILIES} />
      </td>
      <td className={TD}>
        <TextInput name={`${p}.source`} label={`Source of ${row}`} className="w-72" />
      </td>
      <td className={TD}>
        <NumberInput
          name={`${p}.weldZoneTensileYieldMPa`}
          label={`Weld-zone yield (MPa) of ${row}`}
          empty={undefined}
          placeholder="—"
          className="w-24"
        />
      </td>
      <td className={TD}>
        <TextInput name={`${p}.weldZoneSource`} label={`Weld-zone yield source of ${row}`} className="w-72" />
      </td>
      <td className={TD}>
        <RemoveButton label={`Remove ${row}`} onClick={onRemove} />
      </td>
    </tr>
  );
}

export function MaterialsSection() {
  const { fields, append, remove } = useFieldArray<ShopConfigDocumentInput, "catalogue.materials">({
    name: "catalogue.materials",
  });
  return (
    <Section
      id="materials"
      title={`Materials (${fields.length})`}
      description="Tube materials and their constants. Yields are minimums for the condition named, not typical values. Welding softens the tube next to the weld: the weld-zone yield is checked in torsion too. Each figure names its source (a standard, a handbook or the mill's certificate)."
      action={
        <AddButton
          label="Add material"
          onClick={() =>
            append({ id: "", name: "", weldFamily: "steel", source: "" } as never, {
              focusName: `catalogue.materials.${fields.length}.id`,
            })
          }
        />
      }
    >
      <Table
        caption="Tube materials"
        headings={[
          "Id",
          "Name",
          { label: "E (GPa)", right: true },
          { label: "Density (kg/m³)", right: true },
          { label: "Minimum yield (MPa)", right: true },
          { label: "Shear yield (MPa)", right: true },
          "Condition",
          "Weld family",
          "Source",
          { label: "Weld-zone yield (MPa)", right: true },
          "Weld-zone source",
          { label: "Remove", srOnly: true },
        ]}
      >
        {fields.map((f, i) => (
          <MaterialRow key={f.id} index={i} onRemove={() => remove(i)} />
        ))}
      </Table>
    </Section>
  );
}

function useMaterialOptions() {
  const materials = useWatch<ShopConfigDocumentInput, "catalogue.materials">({ name: "catalogue.materials" });
  return (materials ?? []).filter((m) => m?.id).map((m) => ({ value: m.id, label: m.name || m.id }));
}

function TubeRow({
  index,
  onRemove,
  materials,
}: {
  index: number;
  onRemove: () => void;
  materials: { value: string; label: string }[];
}) {
  const p = `catalogue.tubes.${index}` as const;
  const row = useRowName(`${p}.id`, "tube", index);
  return (
    <tr>
      <td className={TD}>
        <TextInput name={`${p}.id`} label={`Part id of ${row}`} mono className="w-44" />
      </td>
      <td className={TD}>
        <SelectInput
          name={`${p}.materialId`}
          label={`Material of ${row}`}
          options={materials}
          className="w-56"
        />
      </td>
      <td className={TD}>
        <NumberInput name={`${p}.odMm`} label={`OD (mm) of ${row}`} hint={inches(3)} className="w-24" />
      </td>
      <td className={TD}>
        <NumberInput name={`${p}.wallMm`} label={`Wall (mm) of ${row}`} hint={inches(3)} className="w-24" />
      </td>
      <td className={TD}>
        <NumberInput
          name={`${p}.maxLengthMm`}
          label={`Longest piece (mm) of ${row}`}
          hint={inches(1)}
          className="w-24"
        />
      </td>
      <td className={TD}>
        <NumberInput
          name={`${p}.pricePerMetreCents`}
          label={`Price per metre of ${row}`}
          money
          className="w-28"
        />
      </td>
      <td className={TD}>
        <RemoveButton label={`Remove ${row}`} onClick={onRemove} />
      </td>
    </tr>
  );
}

export function TubesSection() {
  const { fields, append, remove } = useFieldArray<ShopConfigDocumentInput, "catalogue.tubes">({
    name: "catalogue.tubes",
  });
  const materials = useMaterialOptions();
  return (
    <Section
      id="tubes"
      title={`Tubes (${fields.length})`}
      description="Tube sizes in stock, in millimetres (inches shown under each). The wall must be less than half the outside diameter."
      action={
        <AddButton
          label="Add tube"
          onClick={() =>
            append({ id: "", materialId: materials[0]?.value ?? "" } as never, {
              focusName: `catalogue.tubes.${fields.length}.id`,
            })
          }
        />
      }
    >
      <Table
        caption="Tube sizes in stock"
        headings={[
          "Part id",
          "Material",
          { label: "OD (mm)", right: true },
          { label: "Wall (mm)", right: true },
          { label: "Longest piece (mm)", right: true },
          { label: "Price per metre", right: true },
          { label: "Remove", srOnly: true },
        ]}
      >
        {fields.map((f, i) => (
          <TubeRow key={f.id} index={i} onRemove={() => remove(i)} materials={materials} />
        ))}
      </Table>
    </Section>
  );
}

export function useSeriesOptions() {
  const series = useWatch<ShopConfigDocumentInput, "catalogue.jointSeries">({
    name: "catalogue.jointSeries",
  });
  return (series ?? []).filter((s) => s?.id).map((s) => ({ value: s.id, label: s.id }));
}

function FittingRow({
  index,
  onRemove,
  series,
}: {
  index: number;
  onRemove: () => void;
  series: { value: string; label: string }[];
}) {
  const p = `catalogue.endFittings.${index}` as const;
  const row = useRowName(`${p}.id`, "fitting", index);
  return (
    <tr>
      <td className={TD}>
        <TextInput name={`${p}.id`} label={`Id of ${row}`} mono className="w-36" />
      </td>
      <td className={TD}>
        <TextInput name={`${p}.name`} label={`Name of ${row}`} className="w-72" />
      </td>
      <td className={TD}>
        <SelectInput name={`${p}.kind`} label={`Kind of ${row}`} options={FITTING_KINDS} className="w-40" />
      </td>
      <td className={TD}>
        <SelectInput
          name={`${p}.jointSeriesId`}
          label={`Joint series of ${row}`}
          options={series}
          className="w-28"
        />
      </td>
      <td className={TD}>
        <NumberInput
          name={`${p}.tubeOdMm`}
          label={`Tube OD (mm) of ${row}`}
          hint={inches(3)}
          className="w-24"
        />
      </td>
      <td className={TD}>
        <SelectInput name={`${p}.weldFamily`} label={`Weld family of ${row}`} options={WELD_FAMILIES} />
      </td>
      <td className={TD}>
        <NumberInput
          name={`${p}.jointCentreToWeldSeatMm`}
          label={`Joint centre to weld seat (mm) of ${row}`}
          hint={inches(2)}
          className="w-24"
        />
      </td>
      <td className={TD}>
        <NumberInput name={`${p}.massKg`} label={`Mass (kg) of ${row}`} className="w-20" />
      </td>
      <td className={TD}>
        <NumberInput name={`${p}.torqueRatingNm`} label={`Torque rating (N·m) of ${row}`} className="w-24" />
      </td>
      <td className={TD}>
        <NumberInput name={`${p}.priceCents`} label={`Price of ${row}`} money className="w-28" />
      </td>
      <td className={TD}>
        <NumberInput
          name={`${p}.fastenerTorqueNm`}
          label={`Flange bolt torque (N·m) of ${row}`}
          empty={undefined}
          placeholder="—"
          className="w-20"
        />
      </td>
      <td className={TD}>
        <TextInput
          name={`${p}.fastenerTorqueSource`}
          label={`Flange bolt torque source of ${row}`}
          className="w-56"
        />
      </td>
      <FlangeCells p={p} row={row} />
      <td className={TD}>
        <RemoveButton label={`Remove ${row}`} onClick={onRemove} />
      </td>
    </tr>
  );
}

export function FittingsSection() {
  const { fields, append, remove } = useFieldArray<ShopConfigDocumentInput, "catalogue.endFittings">({
    name: "catalogue.endFittings",
  });
  const series = useSeriesOptions();
  return (
    <Section
      id="fittings"
      title={`End fittings (${fields.length})`}
      description="Yokes welded to the tube: dimensions in millimetres, mass, torque rating including the weld, price. A flange bolt torque, when given, names its source. A flange yoke's bolt pattern (bolts, bolt circle, pilot) is matched to the vehicle's companion flange: give all three or none."
      action={
        <AddButton
          label="Add end fitting"
          onClick={() =>
            append(
              {
                id: "",
                name: "",
                kind: "weld-yoke",
                jointSeriesId: series[0]?.value ?? "",
                weldFamily: "steel",
              } as never,
              { focusName: `catalogue.endFittings.${fields.length}.id` },
            )
          }
        />
      }
    >
      <Table
        caption="End fittings"
        headings={[
          "Id",
          "Name",
          "Kind",
          "Joint series",
          { label: "Tube OD (mm)", right: true },
          "Weld family",
          { label: "Joint centre to weld seat (mm)", right: true },
          { label: "Mass (kg)", right: true },
          { label: "Torque rating (N·m)", right: true },
          { label: "Price", right: true },
          { label: "Flange bolt torque (N·m)", right: true },
          "Bolt torque source",
          ...FLANGE_HEADINGS,
          { label: "Remove", srOnly: true },
        ]}
      >
        {fields.map((f, i) => (
          <FittingRow key={f.id} index={i} onRemove={() => remove(i)} series={series} />
        ))}
      </Table>
    </Section>
  );
}

function JointRow({
  index,
  onRemove,
  series,
}: {
  index: number;
  onRemove: () => void;
  series: { value: string; label: string }[];
}) {
  const p = `catalogue.jointSeries.${index}` as const;
  const row = useRowName(`${p}.id`, "joint series", index);
  return (
    <tr>
      <td className={TD}>
        <TextInput name={`${p}.id`} label={`Id of ${row}`} mono className="w-28" />
      </td>
      <td className={TD}>
        <TextInput name={`${p}.name`} label={`Name of ${row}`} className="w-56" />
      </td>
      <td className={TD}>
        <NumberInput
          name={`${p}.torqueRatingNm`}
          label={`Peak torque rating (N·m) of ${row}`}
          className="w-24"
        />
      </td>
      <td className={TD}>
        <NumberInput
          name={`${p}.continuousTorqueNm`}
          label={`Continuous rating (N·m) of ${row}`}
          empty={undefined}
          placeholder="—"
          className="w-24"
        />
      </td>
      <td className={TD}>
        <NumberInput
          name={`${p}.maxWorkingAngleDeg`}
          label={`Largest working angle (°) of ${row}`}
          className="w-20"
        />
      </td>
      <td className={TD}>
        <NumberInput name={`${p}.massKg`} label={`Mass (kg) of ${row}`} className="w-20" />
      </td>
      <td className={TD}>
        <NumberInput name={`${p}.priceCents`} label={`Price of ${row}`} money className="w-28" />
      </td>
      <td className={TD}>
        <NumberInput
          name={`${p}.strapTorqueNm`}
          label={`Strap torque (N·m) of ${row}`}
          empty={undefined}
          placeholder="—"
          className="w-20"
        />
      </td>
      <td className={TD}>
        <TextInput name={`${p}.strapTorqueSource`} label={`Strap torque source of ${row}`} className="w-56" />
      </td>
      <JointInterfaceCells p={p} row={row} series={series} />
      <td className={TD}>
        <RemoveButton label={`Remove ${row}`} onClick={onRemove} />
      </td>
    </tr>
  );
}

export function JointsSection() {
  const { fields, append, remove } = useFieldArray<ShopConfigDocumentInput, "catalogue.jointSeries">({
    name: "catalogue.jointSeries",
  });
  const series = useSeriesOptions();
  return (
    <Section
      id="joints"
      title={`Universal joints (${fields.length})`}
      description="Joint (cross) series: peak (static) torque rating against the design torque, continuous rating against the running torque, largest working angle, mass, price, and the strap or U-bolt torque with its source. The caps (diameter, span across them, how the vehicle's yoke holds them) match a vehicle's yoke; a conversion cross has these caps on one side and the other series' on the other; a double-Cardan joint's largest angle is the whole joint's."
      action={
        <AddButton
          label="Add joint series"
          onClick={() =>
            append({ id: "", name: "" } as never, { focusName: `catalogue.jointSeries.${fields.length}.id` })
          }
        />
      }
    >
      <Table
        caption="Universal joint series"
        headings={[
          "Id",
          "Name",
          { label: "Peak torque rating (N·m)", right: true },
          { label: "Continuous rating (N·m)", right: true },
          { label: "Largest working angle (°)", right: true },
          { label: "Mass (kg)", right: true },
          { label: "Price", right: true },
          { label: "Strap torque (N·m)", right: true },
          "Strap torque source",
          ...JOINT_INTERFACE_HEADINGS,
          { label: "Remove", srOnly: true },
        ]}
      >
        {fields.map((f, i) => (
          <JointRow key={f.id} index={i} onRemove={() => remove(i)} series={series} />
        ))}
      </Table>
    </Section>
  );
}

const RETENTIONS = [
  { value: "", label: "—" },
  { value: "strap", label: "Straps" },
  { value: "u-bolt", label: "U-bolts" },
  { value: "round", label: "Round bores" },
];
const LUBRICATIONS = [
  { value: "", label: "—" },
  { value: "sealed", label: "Sealed" },
  { value: "greaseable", label: "Greaseable" },
];
const JOINT_KINDS = [
  { value: "", label: "Single cross" },
  { value: "double-cardan", label: "Double-Cardan" },
];

const FLANGE_HEADINGS = [
  { label: "Flange bolts", right: true },
  { label: "Bolt circle (mm)", right: true },
  { label: "Pilot (mm)", right: true },
];

/** A flange yoke's bolt pattern (matched to the vehicle's companion flange). */
function FlangeCells({ p, row }: { p: `catalogue.endFittings.${number}`; row: string }) {
  return (
    <>
      <td className={TD}>
        <NumberInput
          name={`${p}.flange.boltCount`}
          label={`Flange bolts of ${row}`}
          empty={undefined}
          placeholder="—"
          className="w-16"
        />
      </td>
      <td className={TD}>
        <NumberInput
          name={`${p}.flange.boltCircleMm`}
          label={`Bolt circle (mm) of ${row}`}
          empty={undefined}
          placeholder="—"
          hint={inches(3)}
          className="w-24"
        />
      </td>
      <td className={TD}>
        <NumberInput
          name={`${p}.flange.pilotMm`}
          label={`Pilot (mm) of ${row}`}
          empty={undefined}
          placeholder="—"
          hint={inches(3)}
          className="w-24"
        />
      </td>
    </>
  );
}

const JOINT_INTERFACE_HEADINGS = [
  { label: "Cap diameter (mm)", right: true },
  { label: "Span across caps (mm)", right: true },
  "Held by",
  "Lubrication",
  "Kind",
  "Conversion: other side",
];

/** What a vehicle's yoke takes (caps, span, retention), lubrication, kind and a conversion's other side. */
function JointInterfaceCells({
  p,
  row,
  series,
}: {
  p: `catalogue.jointSeries.${number}`;
  row: string;
  series: { value: string; label: string }[];
}) {
  return (
    <>
      <td className={TD}>
        <NumberInput
          name={`${p}.capDiameterMm`}
          label={`Cap diameter (mm) of ${row}`}
          empty={undefined}
          placeholder="—"
          hint={inches(3)}
          className="w-20"
        />
      </td>
      <td className={TD}>
        <NumberInput
          name={`${p}.capSpanMm`}
          label={`Span across caps (mm) of ${row}`}
          empty={undefined}
          placeholder="—"
          hint={inches(3)}
          className="w-24"
        />
      </td>
      <td className={TD}>
        <SelectInput
          name={`${p}.retention`}
          label={`Held by (${row})`}
          options={RETENTIONS}
          className="w-32"
        />
      </td>
      <td className={TD}>
        <SelectInput
          name={`${p}.lubrication`}
          label={`Lubrication of ${row}`}
          options={LUBRICATIONS}
          className="w-32"
        />
      </td>
      <td className={TD}>
        <SelectInput name={`${p}.kind`} label={`Kind of ${row}`} options={JOINT_KINDS} className="w-36" />
      </td>
      <td className={TD}>
        <SelectInput
          name={`${p}.otherSeriesId`}
          label={`Conversion other side of ${row}`}
          options={[{ value: "", label: "— (not a conversion)" }, ...series]}
          className="w-40"
        />
      </td>
    </>
  );
}

function SlipYokeRow({
  index,
  onRemove,
  series,
}: {
  index: number;
  onRemove: () => void;
  series: { value: string; label: string }[];
}) {
  const p = `catalogue.slipYokes.${index}` as const;
  const row = useRowName(`${p}.id`, "slip yoke", index);
  return (
    <tr>
      <td className={TD}>
        <TextInput name={`${p}.id`} label={`Id of ${row}`} mono className="w-40" />
      </td>
      <td className={TD}>
        <TextInput name={`${p}.name`} label={`Name of ${row}`} className="w-64" />
      </td>
      <td className={TD}>
        <NumberInput name={`${p}.splineCount`} label={`Splines of ${row}`} className="w-16" />
      </td>
      <td className={TD}>
        <NumberInput
          name={`${p}.majorDiameterMm`}
          label={`Spline major diameter (mm) of ${row}`}
          hint={inches(3)}
          className="w-24"
        />
      </td>
      <td className={TD}>
        <SelectInput
          name={`${p}.jointSeriesId`}
          label={`Ears (joint series) of ${row}`}
          options={series}
          className="w-28"
        />
      </td>
      <td className={TD}>
        <NumberInput
          name={`${p}.sealSurfaceLengthMm`}
          label={`Seal surface length (mm) of ${row}`}
          hint={inches(2)}
          className="w-24"
        />
      </td>
      <td className={TD}>
        <NumberInput
          name={`${p}.minEngagementMm`}
          label={`Least spline engagement (mm) of ${row}`}
          hint={inches(2)}
          className="w-24"
        />
      </td>
      <td className={TD}>
        <NumberInput name={`${p}.massKg`} label={`Mass (kg) of ${row}`} className="w-20" />
      </td>
      <td className={TD}>
        <NumberInput name={`${p}.priceCents`} label={`Price of ${row}`} money className="w-28" />
      </td>
      <td className={TD}>
        <TextInput name={`${p}.source`} label={`Source of ${row}`} className="w-72" />
      </td>
      <td className={TD}>
        <RemoveButton label={`Remove ${row}`} onClick={onRemove} />
      </td>
    </tr>
  );
}

/** Slip yokes matched to a transmission's output spline; their least engagement and seal surface are checked. */
export function SlipYokesSection() {
  const { fields, append, remove } = useFieldArray<ShopConfigDocumentInput, "catalogue.slipYokes">({
    name: "catalogue.slipYokes",
  });
  const series = useSeriesOptions();
  return (
    <Section
      id="slip-yokes"
      title={`Slip yokes (${fields.length})`}
      description="Slip yokes for transmission and transfer-case outputs, matched by spline count and major diameter. The least spline engagement at full droop and the ground seal surface's length come from the maker's sheet; each row names its source."
      action={
        <AddButton
          label="Add slip yoke"
          onClick={() =>
            append({ id: "", name: "", jointSeriesId: series[0]?.value ?? "", source: "" } as never, {
              focusName: `catalogue.slipYokes.${fields.length}.id`,
            })
          }
        />
      }
    >
      {fields.length === 0 ? (
        <p className="card p-5 text-sm text-ink-muted">
          No slip yokes yet. Without them the shop&apos;s fixed spline engagement applies and slip yokes are
          not priced in quotes.
        </p>
      ) : (
        <Table
          caption="Slip yokes"
          headings={[
            "Id",
            "Name",
            { label: "Splines", right: true },
            { label: "Major diameter (mm)", right: true },
            "Ears (joint series)",
            { label: "Seal surface (mm)", right: true },
            { label: "Least engagement (mm)", right: true },
            { label: "Mass (kg)", right: true },
            { label: "Price", right: true },
            "Source",
            { label: "Remove", srOnly: true },
          ]}
        >
          {fields.map((f, i) => (
            <SlipYokeRow key={f.id} index={i} onRemove={() => remove(i)} series={series} />
          ))}
        </Table>
      )}
    </Section>
  );
}

/** One limit: its value, its source, and the reference default to go back to. */
function LimitRow({
  base,
  meta,
  reference,
}: {
  base: `settings.${SettingKey}` | `floor.limits.${FloorLimitKey}`;
  meta: LimitMeta;
  reference: { value: number; source: string };
}) {
  const { setValue } = useFormContext<ShopConfigDocumentInput>();
  const current = useWatch<ShopConfigDocumentInput>({ name: base }) as { value?: unknown; source?: unknown };
  const differs = current?.value !== reference.value || current?.source !== reference.source;
  const unit = meta.unit ? ` (${meta.unit})` : "";
  return (
    <tr>
      <th scope="row" className={`${TD} font-normal`}>
        {meta.label}
        {meta.unit && <span className="text-ink-muted"> ({meta.unit})</span>}
      </th>
      <td className={TD}>
        <NumberInput name={`${base}.value`} label={`${meta.label}${unit}`} className="w-28" />
      </td>
      <td className={TD}>
        <TextInput name={`${base}.source`} label={`Source of ${meta.label}`} className="min-w-72" />
      </td>
      <td className={`${TD} text-xs text-ink-muted`}>
        {differs ? (
          <button
            type="button"
            className="inline-flex items-center gap-1 rounded-md px-2 py-1 text-steel-700 hover:bg-paper-sunk"
            title={`Reference: ${reference.value} — ${reference.source}`}
            onClick={() => setValue(base, { ...reference }, { shouldDirty: true, shouldValidate: true })}
          >
            <RotateCcw className="size-3.5" aria-hidden="true" />
            Back to the reference {reference.value}
            <span className="sr-only"> for {meta.label}</span>
          </button>
        ) : (
          "Reference value"
        )}
      </td>
    </tr>
  );
}

export function LimitsSection() {
  return (
    <Section
      id="limits"
      title="Engineering limits"
      description="The limits every design is checked against, each with its source (printed on the report). Tighten them for your shop; loosening a limit needs a source that allows it."
    >
      <Table
        caption="Engineering limits with their sources"
        headings={["Limit", "Value", "Source", "Reference"]}
      >
        {(Object.keys(defaultSettings) as SettingKey[]).map((key) => (
          <LimitRow
            key={key}
            base={`settings.${key}`}
            meta={LIMIT_META[key]}
            reference={defaultSettings[key]}
          />
        ))}
      </Table>
    </Section>
  );
}

const STEP_KIND_LABELS: Record<(typeof STEP_KINDS)[number], string> = {
  cut: "Cut",
  "weld-phase": "Weld and phase",
  runout: "Runout",
  balance: "Balance",
  "final-inspection": "Final inspection",
  dispatch: "Dispatch",
  "sign-off": "Sign-off",
  teardown: "Teardown (re-tube)",
  inspection: "Inspect reused parts (re-tube)",
  assembly: "Assembly (two-piece)",
};

function RoutingRow({
  index,
  count,
  onRemove,
  onMove,
}: {
  index: number;
  count: number;
  onRemove: () => void;
  onMove: (to: number) => void;
}) {
  const p = `floor.routing.${index}` as const;
  const code = useWatch<ShopConfigDocumentInput>({ name: `${p}.code` });
  const row = typeof code === "string" && code ? `step ${code}` : `new step, row ${index + 1}`;
  return (
    <tr>
      <td className={`${TD} text-ink-muted tabular-nums`}>{index + 1}</td>
      <td className={TD}>
        <TextInput name={`${p}.code`} label={`Code of ${row}`} mono className="w-20" />
      </td>
      <td className={TD}>
        <SelectInput
          name={`${p}.kind`}
          label={`Kind of ${row}`}
          options={STEP_KINDS.map((k) => ({ value: k, label: STEP_KIND_LABELS[k] }))}
          className="w-40"
        />
      </td>
      <td className={TD}>
        <TextInput name={`${p}.name`} label={`Name of ${row}`} className="w-48" />
      </td>
      <td className={TD}>
        <LinesInput name={`${p}.instructions`} label={`Instructions of ${row}`} />
      </td>
      <td className={`${TD} whitespace-nowrap`}>
        <button
          type="button"
          className="rounded-md p-2 text-ink-muted hover:bg-paper-sunk disabled:opacity-30"
          aria-label={`Move ${row} up`}
          disabled={index === 0}
          onClick={() => onMove(index - 1)}
        >
          <ArrowUp className="size-4" aria-hidden="true" />
        </button>
        <button
          type="button"
          className="rounded-md p-2 text-ink-muted hover:bg-paper-sunk disabled:opacity-30"
          aria-label={`Move ${row} down`}
          disabled={index === count - 1}
          onClick={() => onMove(index + 1)}
        >
          <ArrowDown className="size-4" aria-hidden="true" />
        </button>
        <RemoveButton label={`Remove ${row}`} onClick={onRemove} />
      </td>
    </tr>
  );
}

export function FloorSection() {
  const { fields, append, remove, move } = useFieldArray<ShopConfigDocumentInput, "floor.routing">({
    name: "floor.routing",
  });
  const { control } = useFormContext<ShopConfigDocumentInput>();
  const { errors } = useFormState({ control, name: "floor.routing" });
  const routingError = get(errors, "floor.routing") as
    { message?: string; root?: { message?: string } } | undefined;
  const routingMessage = routingError?.message ?? routingError?.root?.message;
  return (
    <Section
      id="floor"
      title="Floor routing & tolerances"
      description="The steps every shaft follows on the floor, in order, and the floor's own tolerances. Released work orders keep the routing they were printed with."
    >
      <div className="grid gap-4 card p-5 sm:grid-cols-2 lg:grid-cols-4">
        <TextInput name="floor.shopCode" label="Shop code (first letters of serials)" visibleLabel mono />
        <SelectInput
          name="floor.paperSize"
          label="Traveller paper"
          visibleLabel
          options={[
            { value: "letter", label: "US Letter" },
            { value: "a4", label: "A4" },
          ]}
        />
        <SelectInput
          name="floor.units"
          label="Units on the floor"
          visibleLabel
          options={[
            { value: "in", label: "Inches" },
            { value: "mm", label: "Millimetres" },
          ]}
        />
        <NumberInput
          name="floor.phasingToleranceDeg"
          label="Floor phasing tolerance (°)"
          empty={null}
          placeholder="engineering limit"
          visibleLabel
        />
      </div>
      <Table
        caption="Floor tolerances with their sources"
        headings={["Tolerance", "Value", "Source", "Reference"]}
      >
        {(Object.keys(defaultFloorLimits) as FloorLimitKey[]).map((key) => (
          <LimitRow
            key={key}
            base={`floor.limits.${key}`}
            meta={FLOOR_LIMIT_META[key]}
            reference={defaultFloorLimits[key]}
          />
        ))}
      </Table>
      <div className="flex flex-wrap items-end justify-between gap-3 pt-2">
        <h3 className="font-semibold">Routing ({fields.length} steps)</h3>
        <AddButton
          label="Add step"
          onClick={() =>
            append(
              { code: "", kind: "sign-off", name: "", instructions: [] },
              {
                focusName: `floor.routing.${fields.length}.code`,
              },
            )
          }
        />
      </div>
      {routingMessage && (
        <p className="text-sm text-fail" role="alert">
          Routing {routingMessage}
        </p>
      )}
      <Table
        caption="Floor routing"
        headings={[
          { label: "Order", srOnly: true },
          "Code",
          "Kind",
          "Name",
          "Instructions (one per line, at most 6)",
          { label: "Move or remove", srOnly: true },
        ]}
      >
        {fields.map((f, i) => (
          <RoutingRow
            key={f.id}
            index={i}
            count={fields.length}
            onRemove={() => remove(i)}
            onMove={(to) => move(i, to)}
          />
        ))}
      </Table>
    </Section>
  );
}
