"use client";
import { useWatch } from "react-hook-form";
import type { ShopConfigDocumentInput } from "@/lib/catalogue/schemas";
import { inches } from "./editor-sections";
import { ListSection, type Column, type Option } from "./list-section";

const WELD_FAMILIES = [
  { value: "steel", label: "Steel" },
  { value: "aluminium", label: "Aluminium" },
  { value: "composite", label: "Composite" },
];
const FITTING_KINDS = [
  { value: "weld-yoke", label: "Weld yoke" },
  { value: "slip-yoke-assembly", label: "Slip yoke assembly" },
  { value: "flange-yoke", label: "Flange yoke" },
];
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

// Columns many lists share.
const id = (className = "w-36"): Column => ({
  kind: "text",
  key: "id",
  heading: "Id",
  mono: true,
  className,
});
const name = (className: string): Column => ({ kind: "text", key: "name", heading: "Name", className });
const source = (className: string): Column => ({ kind: "text", key: "source", heading: "Source", className });
const mass: Column = { kind: "number", key: "massKg", heading: "Mass (kg)", className: "w-20" };
const price: Column = { kind: "number", key: "priceCents", heading: "Price", money: true, className: "w-28" };
const weldFamily: Column = {
  kind: "select",
  key: "weldFamily",
  heading: "Weld family",
  options: WELD_FAMILIES,
};
const tubeOd: Column = {
  kind: "number",
  key: "tubeOdMm",
  heading: "Tube OD (mm)",
  hint: inches(3),
  className: "w-24",
};
const series = (heading: string, options: Option[]): Column => ({
  kind: "select",
  key: "jointSeriesId",
  heading,
  options,
  className: "w-28",
});

function useMaterialOptions(): Option[] {
  const materials = useWatch<ShopConfigDocumentInput, "catalogue.materials">({ name: "catalogue.materials" });
  return (materials ?? []).filter((m) => m?.id).map((m) => ({ value: m.id, label: m.name || m.id }));
}

function useSeriesOptions(): Option[] {
  const list = useWatch<ShopConfigDocumentInput, "catalogue.jointSeries">({ name: "catalogue.jointSeries" });
  return (list ?? []).filter((s) => s?.id).map((s) => ({ value: s.id, label: s.id }));
}

const MATERIAL_COLUMNS: Column[] = [
  id(),
  name("w-64"),
  { kind: "number", key: "elasticModulusGPa", heading: "E (GPa)", className: "w-24" },
  { kind: "number", key: "densityKgM3", heading: "Density (kg/m³)", className: "w-24" },
  { kind: "number", key: "tensileYieldMPa", heading: "Minimum yield (MPa)", className: "w-24" },
  { kind: "number", key: "shearYieldMPa", heading: "Shear yield (MPa)", className: "w-24" },
  { kind: "text", key: "condition", heading: "Condition", className: "w-48" },
  weldFamily,
  source("w-72"),
  {
    kind: "number",
    key: "weldZoneTensileYieldMPa",
    heading: "Weld-zone yield (MPa)",
    optional: true,
    className: "w-24",
  },
  {
    kind: "text",
    key: "weldZoneSource",
    heading: "Weld-zone source",
    label: "Weld-zone yield source",
    className: "w-72",
  },
];

export function MaterialsSection() {
  return (
    <ListSection
      list="catalogue.materials"
      id="materials"
      title="Materials"
      description="Tube materials and their constants. Yields are minimums for the condition named, not typical values. Welding softens the tube next to the weld: the weld-zone yield is checked in torsion too. Each figure names its source (a standard, a handbook or the mill's certificate)."
      caption="Tube materials"
      noun="material"
      addLabel="Add material"
      blank={() => ({ id: "", name: "", weldFamily: "steel", source: "" })}
      columns={MATERIAL_COLUMNS}
    />
  );
}

export function TubesSection() {
  const materials = useMaterialOptions();
  return (
    <ListSection
      list="catalogue.tubes"
      id="tubes"
      title="Tubes"
      description="Tube sizes in stock, in millimetres (inches shown under each). The wall must be less than half the outside diameter."
      caption="Tube sizes in stock"
      noun="tube"
      addLabel="Add tube"
      blank={() => ({ id: "", materialId: materials[0]?.value ?? "" })}
      columns={[
        { ...id("w-44"), heading: "Part id" },
        { kind: "select", key: "materialId", heading: "Material", options: materials, className: "w-56" },
        { kind: "number", key: "odMm", heading: "OD (mm)", hint: inches(3), className: "w-24" },
        { kind: "number", key: "wallMm", heading: "Wall (mm)", hint: inches(3), className: "w-24" },
        {
          kind: "number",
          key: "maxLengthMm",
          heading: "Longest piece (mm)",
          hint: inches(1),
          className: "w-24",
        },
        {
          kind: "number",
          key: "pricePerMetreCents",
          heading: "Price per metre",
          money: true,
          className: "w-28",
        },
      ]}
    />
  );
}

export function FittingsSection() {
  const options = useSeriesOptions();
  return (
    <ListSection
      list="catalogue.endFittings"
      id="fittings"
      title="End fittings"
      description="Yokes welded to the tube: dimensions in millimetres, mass, torque rating including the weld, price. A flange bolt torque, when given, names its source. A flange yoke's bolt pattern (bolts, bolt circle, pilot) is matched to the vehicle's companion flange: give all three or none."
      caption="End fittings"
      noun="fitting"
      addLabel="Add end fitting"
      blank={() => ({
        id: "",
        name: "",
        kind: "weld-yoke",
        jointSeriesId: options[0]?.value ?? "",
        weldFamily: "steel",
      })}
      columns={[
        id(),
        name("w-72"),
        { kind: "select", key: "kind", heading: "Kind", options: FITTING_KINDS, className: "w-40" },
        series("Joint series", options),
        tubeOd,
        weldFamily,
        {
          kind: "number",
          key: "jointCentreToWeldSeatMm",
          heading: "Joint centre to weld seat (mm)",
          hint: inches(2),
          className: "w-24",
        },
        mass,
        { kind: "number", key: "torqueRatingNm", heading: "Torque rating (N·m)", className: "w-24" },
        price,
        {
          kind: "number",
          key: "fastenerTorqueNm",
          heading: "Flange bolt torque (N·m)",
          optional: true,
          className: "w-20",
        },
        {
          kind: "text",
          key: "fastenerTorqueSource",
          heading: "Bolt torque source",
          label: "Flange bolt torque source",
          className: "w-56",
        },
        // A flange yoke's bolt pattern (matched to the vehicle's companion flange).
        {
          kind: "number",
          key: "flange.boltCount",
          heading: "Flange bolts",
          optional: true,
          className: "w-16",
        },
        {
          kind: "number",
          key: "flange.boltCircleMm",
          heading: "Bolt circle (mm)",
          optional: true,
          hint: inches(3),
          className: "w-24",
        },
        {
          kind: "number",
          key: "flange.pilotMm",
          heading: "Pilot (mm)",
          optional: true,
          hint: inches(3),
          className: "w-24",
        },
      ]}
    />
  );
}

export function JointsSection() {
  const options = useSeriesOptions();
  return (
    <ListSection
      list="catalogue.jointSeries"
      id="joints"
      title="Universal joints"
      description="Joint (cross) series: peak (static) torque rating against the design torque, continuous rating against the running torque, largest working angle, mass, price, and the strap or U-bolt torque with its source. The caps (diameter, span across them, how the vehicle's yoke holds them) match a vehicle's yoke; a conversion cross has these caps on one side and the other series' on the other; a double-Cardan joint's largest angle is the whole joint's."
      caption="Universal joint series"
      noun="joint series"
      addLabel="Add joint series"
      blank={() => ({ id: "", name: "" })}
      columns={[
        id("w-28"),
        name("w-56"),
        { kind: "number", key: "torqueRatingNm", heading: "Peak torque rating (N·m)", className: "w-24" },
        {
          kind: "number",
          key: "continuousTorqueNm",
          heading: "Continuous rating (N·m)",
          optional: true,
          className: "w-24",
        },
        {
          kind: "number",
          key: "maxWorkingAngleDeg",
          heading: "Largest working angle (°)",
          className: "w-20",
        },
        mass,
        price,
        {
          kind: "number",
          key: "strapTorqueNm",
          heading: "Strap torque (N·m)",
          optional: true,
          className: "w-20",
        },
        { kind: "text", key: "strapTorqueSource", heading: "Strap torque source", className: "w-56" },
        // What a vehicle's yoke takes (caps, span, retention), lubrication, kind and a conversion's other side.
        {
          kind: "number",
          key: "capDiameterMm",
          heading: "Cap diameter (mm)",
          optional: true,
          hint: inches(3),
          className: "w-20",
        },
        {
          kind: "number",
          key: "capSpanMm",
          heading: "Span across caps (mm)",
          optional: true,
          hint: inches(3),
          className: "w-24",
        },
        {
          kind: "select",
          key: "retention",
          heading: "Held by",
          rowLabel: (row) => `Held by (${row})`,
          options: RETENTIONS,
          className: "w-32",
        },
        {
          kind: "select",
          key: "lubrication",
          heading: "Lubrication",
          options: LUBRICATIONS,
          className: "w-32",
        },
        { kind: "select", key: "kind", heading: "Kind", options: JOINT_KINDS, className: "w-36" },
        {
          kind: "select",
          key: "otherSeriesId",
          heading: "Conversion: other side",
          label: "Conversion other side",
          options: [{ value: "", label: "— (not a conversion)" }, ...options],
          className: "w-40",
        },
      ]}
    />
  );
}

/** Slip yokes matched to a transmission's output spline; their least engagement and seal surface are checked. */
export function SlipYokesSection() {
  const options = useSeriesOptions();
  return (
    <ListSection
      list="catalogue.slipYokes"
      id="slip-yokes"
      title="Slip yokes"
      description="Slip yokes for transmission and transfer-case outputs, matched by spline count and major diameter. The least spline engagement at full droop and the ground seal surface's length come from the maker's sheet; each row names its source."
      caption="Slip yokes"
      noun="slip yoke"
      addLabel="Add slip yoke"
      blank={() => ({ id: "", name: "", jointSeriesId: options[0]?.value ?? "", source: "" })}
      empty="No slip yokes yet. Without them the shop's fixed spline engagement applies and slip yokes are not priced in quotes."
      columns={[
        id("w-40"),
        name("w-64"),
        { kind: "number", key: "splineCount", heading: "Splines", className: "w-16" },
        {
          kind: "number",
          key: "majorDiameterMm",
          heading: "Major diameter (mm)",
          label: "Spline major diameter (mm)",
          hint: inches(3),
          className: "w-24",
        },
        series("Ears (joint series)", options),
        {
          kind: "number",
          key: "sealSurfaceLengthMm",
          heading: "Seal surface (mm)",
          label: "Seal surface length (mm)",
          hint: inches(2),
          className: "w-24",
        },
        {
          kind: "number",
          key: "minEngagementMm",
          heading: "Least engagement (mm)",
          label: "Least spline engagement (mm)",
          hint: inches(2),
          className: "w-24",
        },
        mass,
        price,
        source("w-72"),
      ]}
    />
  );
}

/** Centre support bearings for two-piece shafts: the stub welded to the front piece, the centre joint's series, price. */
export function CentreBearingsSection() {
  const options = useSeriesOptions();
  return (
    <ListSection
      list="catalogue.centreBearings"
      id="centre-bearings"
      title="Centre bearings"
      description="For two-piece shafts: the bearing with the splined stub welded to the front piece and the end yoke of the centre joint. The stub's weld seat takes the tube size given; the price covers bearing, stub and end yoke. Each row names its source."
      caption="Centre bearings"
      noun="centre bearing"
      addLabel="Add centre bearing"
      blank={() => ({
        id: "",
        name: "",
        jointSeriesId: options[0]?.value ?? "",
        weldFamily: "steel",
        source: "",
      })}
      empty="No centre bearings yet: two-piece shafts cannot be ordered until one is added."
      columns={[
        id(),
        name("w-72"),
        series("Centre joint series", options),
        tubeOd,
        weldFamily,
        {
          kind: "number",
          key: "jointCentreToWeldSeatMm",
          heading: "Centre joint to stub weld seat (mm)",
          hint: inches(2),
          className: "w-24",
        },
        mass,
        price,
        source("w-56"),
      ]}
    />
  );
}
