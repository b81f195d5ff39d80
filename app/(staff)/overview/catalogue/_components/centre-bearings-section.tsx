"use client";
import { useFieldArray } from "react-hook-form";
import type { ShopConfigDocumentInput } from "@/lib/catalogue/schemas";
import { NumberInput, SelectInput, TextInput } from "./editor-inputs";
import {
  AddButton,
  RemoveButton,
  Section,
  Table,
  TD,
  WELD_FAMILIES,
  inches,
  useRowName,
  useSeriesOptions,
} from "./editor-sections";

function CentreBearingRow({
  index,
  onRemove,
  series,
}: {
  index: number;
  onRemove: () => void;
  series: { value: string; label: string }[];
}) {
  const p = `catalogue.centreBearings.${index}` as const;
  const row = useRowName(`${p}.id`, "centre bearing", index);
  return (
    <tr>
      <td className={TD}>
        <TextInput name={`${p}.id`} label={`Id of ${row}`} mono className="w-36" />
      </td>
      <td className={TD}>
        <TextInput name={`${p}.name`} label={`Name of ${row}`} className="w-72" />
      </td>
      <td className={TD}>
        <SelectInput
          name={`${p}.jointSeriesId`}
          label={`Centre joint series of ${row}`}
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
          label={`Centre joint to stub weld seat (mm) of ${row}`}
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
        <TextInput name={`${p}.source`} label={`Source of ${row}`} className="w-56" />
      </td>
      <td className={TD}>
        <RemoveButton label={`Remove ${row}`} onClick={onRemove} />
      </td>
    </tr>
  );
}

/** Centre support bearings for two-piece shafts: the stub welded to the front piece, the centre joint's series, price. */
export function CentreBearingsSection() {
  const { fields, append, remove } = useFieldArray<ShopConfigDocumentInput, "catalogue.centreBearings">({
    name: "catalogue.centreBearings",
  });
  const series = useSeriesOptions();
  return (
    <Section
      id="centre-bearings"
      title={`Centre bearings (${fields.length})`}
      description="For two-piece shafts: the bearing with the splined stub welded to the front piece and the end yoke of the centre joint. The stub's weld seat takes the tube size given; the price covers bearing, stub and end yoke. Each row names its source."
      action={
        <AddButton
          label="Add centre bearing"
          onClick={() =>
            append(
              {
                id: "",
                name: "",
                jointSeriesId: series[0]?.value ?? "",
                weldFamily: "steel",
                source: "",
              } as never,
              { focusName: `catalogue.centreBearings.${fields.length}.id` },
            )
          }
        />
      }
    >
      {fields.length === 0 ? (
        <p className="card p-4 text-sm text-ink-muted">
          No centre bearings yet: two-piece shafts cannot be ordered until one is added.
        </p>
      ) : (
        <Table
          caption="Centre bearings"
          headings={[
            "Id",
            "Name",
            "Centre joint series",
            { label: "Tube OD (mm)", right: true },
            "Weld family",
            { label: "Centre joint to stub weld seat (mm)", right: true },
            { label: "Mass (kg)", right: true },
            { label: "Price", right: true },
            "Source",
            { label: "Remove", srOnly: true },
          ]}
        >
          {fields.map((f, i) => (
            <CentreBearingRow key={f.id} index={i} onRemove={() => remove(i)} series={series} />
          ))}
        </Table>
      )}
    </Section>
  );
}
