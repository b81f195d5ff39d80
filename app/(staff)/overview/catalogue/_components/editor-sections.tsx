"use client";
import { ArrowDown, ArrowUp, Plus, RotateCcw, Trash2 } from "lucide-react";
import { TableCard } from "@/components/ui/table-card";
import { get, useFieldArray, useFormContext, useFormState, useWatch } from "react-hook-form";
import { defaultSettings, mmToIn, type SettingKey } from "@/lib/driveline";
import { FLOOR_LIMIT_META, LIMIT_META, type LimitMeta } from "@/lib/catalogue/limits";
import type { ShopConfigDocumentInput } from "@/lib/catalogue/schemas";
import { defaultFloorLimits, STEP_KINDS, type FloorLimitKey } from "@/lib/traveller/settings";
import { CheckboxInput, LinesInput, NumberInput, SelectInput, TextInput, type Path } from "./editor-inputs";

export const TD = "px-2 py-1.5 align-top";
export const inches = (digits: number) => (mm: number) => `${mmToIn(mm).toFixed(digits)} in`;

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
      <TableCard
        dense
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
      </TableCard>
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
        {(
          [
            ["up", ArrowUp, index - 1],
            ["down", ArrowDown, index + 1],
          ] as const
        ).map(([way, Icon, to]) => (
          <button
            key={way}
            type="button"
            className="rounded-md p-2 text-ink-muted hover:bg-paper-sunk disabled:opacity-30"
            aria-label={`Move ${row} ${way}`}
            disabled={to < 0 || to >= count}
            onClick={() => onMove(to)}
          >
            <Icon className="size-4" aria-hidden="true" />
          </button>
        ))}
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
      <TableCard
        dense
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
      </TableCard>
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
      <TableCard
        dense
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
      </TableCard>
    </Section>
  );
}
