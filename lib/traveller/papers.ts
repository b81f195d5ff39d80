/**
 * The customer's papers, drawn from the same frozen data as the traveller: an install sheet per
 * shaft (fastener torques from the shop's catalogue as its parts makers give them, greasing, the
 * re-check after the first miles, the speed it was built for, the safety caution) and, once final
 * inspection has passed, an as-built certificate with what was measured. Server only.
 */
import { PDFDocument, type PDFPage } from "pdf-lib";
import type { EvaluationReport } from "@/lib/driveline/report";
import { shaftUseLabel } from "@/lib/driveline/uses";
import { GREY, MARGIN, PAGE, Writer, drawQr, embedFonts, type Fonts } from "./pdf-kit";
import { describeLimit, type BalanceWeight, type SiValues } from "./measure";
import type { FieldSpec, StepSpec } from "./steps";
import type { StepCompletion } from "@/lib/floor/states";
import { formatQuantity, type FloorUnits } from "./units";
import { formatTimestamp } from "../dates";
import type { Fulfilment } from "@/lib/orders/states";

/** 1 lbf·ft = 0.3048 m × 4.4482216152605 N (exact by definition of the pound-force and the foot). */
const NM_PER_LBF_FT = 0.3048 * 4.4482216152605;

export const SAFETY_CAUTION =
  "A driveshaft that fails or whirls can kill. These figures are engineering estimates for a shop's use: they do not replace a qualified engineer, the component makers' ratings, or the local rules.";

export interface PaperTorque {
  nm: number;
  source: string;
}

export interface InstallEnd {
  position: "front" | "rear";
  fittingName: string;
  fittingId: string;
  kind: string;
  jointSeriesId: string;
  /** Straps / U-bolts of the joint's caps in the vehicle's yoke (null: not in the catalogue). */
  strap: PaperTorque | null;
  /** Flange bolts (flange yokes only). */
  fastener: PaperTorque | null;
}

export interface PaperShaft {
  serial: string | null;
  name: string;
  position: number;
  count: number;
  application: { description: string; use: string } | null;
  report: EvaluationReport;
}

export interface PapersHeader {
  /** `timeZone`: the shop's (price book), for the dates printed. */
  shop: { name: string; phone: string | null; timeZone: string };
  order: { number: string; customerName: string; fulfilment: Fulfilment };
  units: FloorUnits;
  paperSize: keyof typeof PAGE;
}

export interface InstallSheetView extends PapersHeader {
  shafts: (PaperShaft & { ends: InstallEnd[] })[];
}

export interface AsBuiltStep {
  spec: StepSpec;
  completion: StepCompletion | null;
  completedAt: Date | null;
  byName: string | null;
  /** The values of the record that completed the step (SI). */
  values: SiValues;
  /** A concession's reason (the shop accepted the values as they are). */
  reason: string | null;
}

export interface AsBuiltView extends PapersHeader {
  shafts: (PaperShaft & { serial: string; revision: number; steps: AsBuiltStep[] })[];
}

export function formatTorque(nm: number): string {
  return `${Math.round(nm)} N·m (${Math.round(nm / NM_PER_LBF_FT)} lbf·ft)`;
}

/** Text flowing down the page, starting a new page when the next block would not fit. */
class Flow {
  page!: PDFPage;
  w!: Writer;
  y = 0;
  readonly width: number;

  constructor(
    readonly doc: PDFDocument,
    readonly f: Fonts,
    readonly size: readonly [number, number],
    readonly footer: string,
  ) {
    this.width = size[0] - 2 * MARGIN;
  }

  newPage(): void {
    this.page = this.doc.addPage([this.size[0], this.size[1]]);
    this.w = new Writer(this.page, this.f);
    this.y = this.size[1] - MARGIN;
    this.w.wrap(this.footer, MARGIN, MARGIN + 14, this.width, 6.5, this.f.regular, 2);
  }

  /** Makes room for `height` points (a new page when the rest of this one is too short). */
  room(height: number): void {
    if (this.y - height < MARGIN + 30) this.newPage();
  }

  heading(text: string): void {
    this.room(40);
    this.y -= 8;
    this.w.text(text.toUpperCase(), MARGIN, this.y, 8, this.f.bold, GREY);
    this.y -= 4;
    this.w.rule(MARGIN, this.y, MARGIN + this.width, 0.6);
    this.y -= 12;
  }

  para(text: string, size = 9, bold = false, indent = 0): void {
    const lines = Math.ceil(this.f.regular.widthOfTextAtSize(text, size) / (this.width - indent)) + 1;
    this.room(lines * size * 1.25);
    this.y = this.w.wrap(
      text,
      MARGIN + indent,
      this.y,
      this.width - indent,
      size,
      bold ? this.f.bold : this.f.regular,
    );
  }

  /** A label and its value on one line (the value wraps under itself). */
  pair(label: string, value: string, labelWidth = 150): void {
    this.room(24);
    this.w.text(label, MARGIN, this.y, 8.5, this.f.bold);
    this.y = this.w.wrap(value, MARGIN + labelWidth, this.y, this.width - labelWidth, 8.5, this.f.regular);
  }
}

function header(flow: Flow, title: string, view: PapersHeader, shaft: PaperShaft, serialLine: string): void {
  const { w, f } = flow;
  const top = flow.y;
  if (shaft.serial) drawQr(flow.page, shaft.serial, MARGIN + flow.width - 64, top - 64, 64);
  w.text(`${view.shop.name}${view.shop.phone ? ` · ${view.shop.phone}` : ""}`, MARGIN, top - 9, 9, f.bold);
  w.text(title, MARGIN, top - 32, 20, f.bold);
  w.text(serialLine, MARGIN, top - 47, 10, f.mono);
  const app = shaft.application;
  w.wrap(
    `Order ${view.order.number} · ${view.order.customerName} · shaft ${shaft.position} of ${shaft.count}: ${shaft.name}${app ? ` (${app.description}, ${shaftUseLabel(app.use).toLowerCase()})` : ""}`,
    MARGIN,
    top - 61,
    flow.width - 72,
    9,
  );
  flow.y = top - 78;
}

function builtFor(flow: Flow, r: EvaluationReport, units: FloorUnits): void {
  const q = (v: number) => formatQuantity("length", units, v);
  flow.heading("Built for");
  flow.pair("Length between joint centres", `${q(r.lengthMm)} ± ${q(r.shopFloor.lengthToleranceMm)}`);
  flow.pair(
    "Tube",
    `${r.tube.tubeId ?? "as designed"} · ${r.tube.materialId} · ${q(r.tube.odMm)} OD × ${q(r.tube.wallMm)} wall`,
  );
  flow.pair(
    "Maximum shaft speed",
    `${Math.round(r.service.maxShaftRpm)} rpm — the speed it was designed and balanced for; do not run it faster (critical speed ${Math.round(r.criticalSpeedRpm)} rpm)`,
  );
  flow.pair(
    "Working angles as designed",
    r.joints.map((j) => `${j.position} ${j.workingAngleDeg.toFixed(2)}°`).join(", "),
  );
  flow.pair(
    "Rear yoke index",
    `${(r.phasing.asSpecified?.phaseIndexDeg ?? r.phasing.phaseIndexDeg).toFixed(1)}° from the front yoke, looking rearward`,
  );
  flow.pair("Balanced to", `ISO 21940-11 G ${r.balance.gradeMmS} at ${Math.round(r.balance.speedRpm)} rpm`);
}

function endLine(end: InstallEnd): string {
  const where = end.position === "front" ? "Front" : "Rear";
  const torque = (t: PaperTorque | null, what: string) =>
    t
      ? `${what}: ${formatTorque(t.nm)} (${t.source})`
      : `${what}: not in the shop's catalogue — use the joint maker's published figure`;
  if (end.kind === "slip-yoke-assembly")
    return `${where}: ${end.fittingName} — slides onto the output shaft's splines; nothing to tighten at this end. Check the spline engagement at ride height.`;
  if (end.kind === "flange-yoke")
    return `${where}: ${end.fittingName} — ${torque(end.fastener, "flange bolts, tightened evenly in a cross pattern")}`;
  return `${where}: ${end.fittingName}, joint ${end.jointSeriesId} — ${torque(end.strap, "strap / U-bolt nuts, tightened evenly")}`;
}

function installPage(flow: Flow, view: InstallSheetView, shaft: InstallSheetView["shafts"][number]): void {
  flow.newPage();
  header(flow, "Install sheet", view, shaft, shaft.serial ? `Serial ${shaft.serial}` : "Not yet serialised");
  const r = shaft.report;
  builtFor(flow, r, view.units);

  flow.heading("Fastening (torque to the parts makers' figures)");
  for (const end of shaft.ends) flow.para(endLine(end), 9);
  flow.para(
    "Seat each bearing cap fully in the yoke's ears before tightening; never hammer on a cap. Use new strap bolts or U-bolts where the maker says they are one-use. Dry threads unless the maker says otherwise.",
    8,
  );

  flow.heading("Greasing (common shop practice)");
  flow.para(
    "Grease each joint through its fitting until fresh grease comes out of every cap seal; a joint sealed for life has no fitting — do not drill it. Grease the slip spline before fitting it. Use the grease the joint maker names.",
    9,
  );

  flow.heading("Re-check after the first miles (common shop practice)");
  flow.para(
    "After the first 500 km (300 miles), re-tighten every strap, U-bolt and flange bolt to the figures above and look for grease leaks and marks of rubbing; then at every service. Vibration at speed: stop and have it checked — do not drive on.",
    9,
  );

  if (r.cautions.length) {
    flow.heading("From the design check");
    for (const c of r.cautions) flow.para(`• ${c}`, 8);
  }
  flow.heading("Safety");
  flow.para(SAFETY_CAUTION, 9.5, true);
}

/** The install sheet: one page (or more) per shaft. */
export async function renderInstallSheet(view: InstallSheetView): Promise<Uint8Array> {
  const doc = await PDFDocument.create();
  doc.setTitle(`Install sheet, order ${view.order.number}`);
  doc.setCreator("Yokeline");
  const flow = new Flow(doc, await embedFonts(doc), PAGE[view.paperSize], SAFETY_CAUTION);
  for (const shaft of view.shafts) installPage(flow, view, shaft);
  return doc.save();
}

function valueText(field: FieldSpec, values: SiValues, units: FloorUnits): string {
  const v = values[field.key];
  if (v === undefined || v === null || v === "") return "—";
  switch (field.type) {
    case "number":
      return typeof v === "number" ? formatQuantity(field.quantity, units, v) : String(v);
    case "confirm":
      return v === true ? "yes" : "no";
    case "weights": {
      const ws = Array.isArray(v) ? (v as BalanceWeight[]) : [];
      return ws.length
        ? ws
            .map((x) => `${x.plane} ${formatQuantity("mass", units, x.massG)} at ${x.angleDeg.toFixed(0)}°`)
            .join(", ")
        : "none";
    }
    default:
      return String(v);
  }
}

function asBuiltPage(flow: Flow, view: AsBuiltView, shaft: AsBuiltView["shafts"][number]): void {
  const when = (d: Date | null) => (d ? formatTimestamp(d, view.shop.timeZone) : "—");
  flow.newPage();
  header(
    flow,
    "As-built certificate",
    view,
    shaft,
    `Serial ${shaft.serial} · traveller revision ${shaft.revision}`,
  );
  const fin = shaft.steps.find((s) => s.spec.kind === "final-inspection");
  flow.para(
    `This shaft passed final inspection on ${when(fin?.completedAt ?? null)}${fin?.byName ? `, signed off by ${fin.byName}` : ""}. The values below were measured on it, in the shop's units, against the limits its traveller carried.`,
    9,
  );
  builtFor(flow, shaft.report, view.units);

  for (const step of shaft.steps) {
    if (step.spec.kind === "dispatch" || step.spec.kind === "sign-off") continue;
    const how =
      step.completion === "concession"
        ? "accepted by the shop's concession"
        : step.completion === "rework"
          ? "passed after rework"
          : step.completion === "pass"
            ? "passed"
            : "not signed off";
    flow.heading(`${step.spec.position}. ${step.spec.name} — ${how}`);
    flow.para(`${when(step.completedAt)}${step.byName ? ` · ${step.byName}` : ""}`, 7.5);
    for (const field of step.spec.fields) {
      const limit =
        field.type === "number" && field.limit && field.quantity !== "speed"
          ? `   (limit ${describeLimit(field.quantity, view.units, field.limit)})`
          : "";
      flow.pair(field.label, `${valueText(field, step.values, view.units)}${limit}`, 190);
    }
    if (step.reason) flow.para(`Concession: ${step.reason}`, 8);
  }
  flow.heading("Safety");
  flow.para(SAFETY_CAUTION, 9.5, true);
}

/** The as-built certificate: one page (or more) per shaft. */
export async function renderAsBuiltCertificate(view: AsBuiltView): Promise<Uint8Array> {
  const doc = await PDFDocument.create();
  doc.setTitle(`As-built certificate, order ${view.order.number}`);
  doc.setCreator("Yokeline");
  const flow = new Flow(doc, await embedFonts(doc), PAGE[view.paperSize], SAFETY_CAUTION);
  for (const shaft of view.shafts) asBuiltPage(flow, view, shaft);
  return doc.save();
}
