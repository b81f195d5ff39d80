/**
 * The traveller PDF: one page per shaft, letter or A4, black on white. A QR code for the serial,
 * a Code 128 per step (drawn as vector bars from bwip-js's encoding, so they stay sharp at any
 * printer resolution), what each station needs, and a sign-off line per step. Server only (reads
 * the embedded fonts from lib/traveller/fonts).
 */
import { PDFDocument, degrees, type PDFPage } from "pdf-lib";
import { BLACK, GREY, MARGIN, PAGE, Writer, drawCode128, drawQr, embedFonts, type Fonts } from "./pdf-kit";
import type { EvaluationReport } from "@/lib/driveline/report";
import { describeLimit } from "./measure";
import { shaftUseLabel } from "@/lib/driveline/uses";
import {
  balanceLimit,
  phaseTarget,
  runoutStations,
  tubeCutLengthMm,
  type FieldSpec,
  type NumericLimit,
  type StepSpec,
} from "./steps";
import { formatQuantity, type FloorUnits } from "./units";
import { addTwoPieceTravellerPages } from "./pdf-two-piece";
import type { TravellerStep, TravellerView } from "./view";
import { DEFAULT_TIME_ZONE, shopIsoDate } from "../dates";

/** Looking rearward: the front yoke's plane as a dashed reference, the rear yoke rotated by the index. */
export function drawPhaseDiagram(w: Writer, cx: number, cy: number, r: number, indexDeg: number): void {
  const p = w.page;
  p.drawEllipse({ x: cx, y: cy, xScale: r, yScale: r, borderColor: BLACK, borderWidth: 0.8 });
  p.drawLine({
    start: { x: cx, y: cy - r - 4 },
    end: { x: cx, y: cy + r + 4 },
    thickness: 0.6,
    color: GREY,
    dashArray: [2, 2],
  });
  // Clockwise looking rearward = clockwise on the page, from 12 o'clock.
  const a = (indexDeg * Math.PI) / 180;
  const dx = Math.sin(a) * r;
  const dy = Math.cos(a) * r;
  p.drawLine({
    start: { x: cx - dx, y: cy - dy },
    end: { x: cx + dx, y: cy + dy },
    thickness: 2.2,
    color: BLACK,
  });
  for (const s of [1, -1]) {
    p.drawEllipse({ x: cx + s * dx, y: cy + s * dy, xScale: 3.2, yScale: 3.2, color: BLACK });
  }
  w.text("front", cx + 3, cy + r + 1, 5.5, w.f.regular, GREY);
}

/**
 * The evaluation's verdict (how many checks pass), the first three that do not and two cautions,
 * from `y` down within `width`; returns the y below. Both travellers print it.
 */
export function drawVerdict(
  w: Writer,
  report: EvaluationReport,
  left: number,
  top: number,
  width: number,
): number {
  const { f } = w;
  let y = top;
  const notPassing = report.checks.filter((c) => c.status !== "pass");
  w.text(
    `Checks: ${report.overall.toUpperCase()} (${report.checks.length - notPassing.length} of ${report.checks.length} pass)`,
    left,
    y,
    9,
    f.bold,
  );
  y -= 11;
  for (const c of notPassing.slice(0, 3))
    y = w.wrap(`${c.status.toUpperCase()}: ${c.message}`, left, y, width, 7, f.regular, 2);
  for (const caution of report.cautions.slice(0, 2)) y = w.wrap(caution, left, y, width, 6.5, f.regular, 3);
  return y;
}

function fieldLine(field: FieldSpec, units: FloorUnits): string {
  if (field.type === "number" && field.limit) {
    const limit = field.quantity === "speed" ? "" : `: ${describeLimit(field.quantity, units, field.limit)}`;
    return `${field.label}${limit}`;
  }
  if (field.type === "confirm") return `${field.label}  [ ] yes`;
  if (field.type === "weights") return `${field.label}: plane, mass, angle`;
  return field.label;
}

type NumberField = Extract<FieldSpec, { type: "number" }>;

/** The frozen number fields of the first step of `kind` (the limits printed are the ones checked). */
function frozenFields(steps: readonly StepSpec[], kind: StepSpec["kind"]): NumberField[] {
  const step = steps.find((s) => s.kind === kind);
  return (step?.fields ?? []).filter((f): f is NumberField => f.type === "number");
}

const plusMinus = (l: NumericLimit | null | undefined) =>
  l && l.nominal != null && l.max != null ? { nominal: l.nominal, tol: l.max - l.nominal } : null;

function shaftBlock(w: Writer, view: TravellerView, top: number, left: number, width: number): number {
  const { report } = view;
  const units = view.floor.units;
  const ctx = { report, fulfilment: view.order.fulfilment, floor: view.floor };
  const { f } = w;
  const q = (quantity: Parameters<typeof formatQuantity>[0], v: number) => formatQuantity(quantity, units, v);
  const colW = width * 0.56;
  let y = top;
  const label = (t: string, x: number, yy: number) => w.text(t.toUpperCase(), x, yy, 6.5, f.bold, GREY);

  // Left column: tube, lengths, ends.
  label("Tube", left, y);
  y -= 12;
  const t = report.tube;
  w.text(
    `${t.tubeId ?? "tube as designed"} · ${t.materialId} · ${q("length", t.odMm)} OD × ${q("length", t.wallMm)} wall`,
    left,
    y,
    9,
    f.bold,
  );
  y -= 16;
  label(
    view.retube ? "Cut length (re-tube: the customer's weld-to-weld)" : "Cut length (weld seat to weld seat)",
    left,
    y,
  );
  y -= 15;
  const cut = plusMinus(frozenFields(view.steps, "cut").find((x) => x.key === "cutLengthMm")?.limit) ?? {
    nominal: tubeCutLengthMm(report),
    tol: view.floor.limits.cutLengthToleranceMm.value,
  };
  w.text(`${q("length", cut.nominal)} ± ${q("length", cut.tol)}`, left, y, 15, f.bold);
  y -= 14;
  w.text(
    `Between joint centres ${q("length", report.lengthMm)} ± ${q("length", report.shopFloor.lengthToleranceMm)}`,
    left,
    y,
    8.5,
  );
  y -= 14;
  label("Fittings and joints", left, y);
  y -= 11;
  for (const pos of ["front", "rear"] as const) {
    const end = report.ends[pos];
    const jointName = report.joints.find((j) => j.position === pos);
    const txt = end
      ? `${pos === "front" ? "Front" : "Rear"}: ${end.name} (${end.fittingId}), joint ${end.crossSeriesId ?? end.jointSeriesId}`
      : `${pos === "front" ? "Front" : "Rear"}: as designed`;
    y = w.wrap(
      `${txt}${jointName ? `, working angle ${jointName.workingAngleDeg.toFixed(2)}°` : ""}`,
      left,
      y,
      colW - 8,
      8,
      f.regular,
      2,
    );
  }
  y -= 2;
  label("Verdict and cautions", left, y);
  y -= 11;
  y = drawVerdict(w, report, left, y, colW - 8);
  const leftBottom = y;

  // Right column: phase drawing, runout, balance, speed.
  const rx = left + colW;
  let ry = top;
  const frozenPhase = plusMinus(
    frozenFields(view.steps, "weld-phase").find((x) => x.key === "phaseIndexDeg")?.limit,
  );
  const phase = frozenPhase
    ? { indexDeg: frozenPhase.nominal, toleranceDeg: frozenPhase.tol }
    : phaseTarget(ctx);
  label("Phase index, looking rearward", rx, ry);
  drawPhaseDiagram(w, rx + 26, ry - 34, 20, phase.indexDeg);
  w.text(`${phase.indexDeg.toFixed(1)}°`, rx + 56, ry - 26, 16, f.bold);
  w.text(`± ${phase.toleranceDeg.toFixed(1)}°, rear yoke`, rx + 56, ry - 37, 8);
  const turn = phase.indexDeg > 0 ? "clockwise" : "anticlockwise";
  w.text(
    phase.indexDeg === 0 ? "ears in line with the front" : `${turn} from the front yoke`,
    rx + 56,
    ry - 47,
    7,
  );
  ry -= 68;
  label("Runout (TIR) stations", rx, ry);
  ry -= 11;
  const { stations: current, fast } = runoutStations(ctx);
  const frozenRunout = frozenFields(view.steps, "runout").filter(
    (x) => x.stationMm != null && x.limit?.max != null,
  );
  const stations = frozenRunout.length
    ? frozenRunout.map((x) => ({ fromFrontWeldMm: x.stationMm!, limitMm: x.limit!.max! }))
    : current;
  for (const s of stations) {
    w.text(`${q("length", s.fromFrontWeldMm)} from front weld: at most ${q("runout", s.limitMm)}`, rx, ry, 8);
    ry -= 10;
  }
  if (fast) {
    w.text("Fast shaft: tighter runout limits", rx, ry, 7, f.bold);
    ry -= 10;
  }
  ry -= 3;
  label("Balance", rx, ry);
  ry -= 12;
  const perPlane =
    frozenFields(view.steps, "balance").find((x) => x.key === "residualFrontGmm")?.limit?.max ??
    balanceLimit(report).perPlaneGmm;
  w.text(`at most ${q("unbalance", perPlane)} per plane`, rx, ry, 10, f.bold);
  ry -= 10;
  w.text(
    `ISO 21940-11 G ${report.balance.gradeMmS} at ${Math.round(report.balance.speedRpm)} rpm`,
    rx,
    ry,
    7.5,
  );
  ry -= 13;
  label("Service", rx, ry);
  ry -= 11;
  w.text(
    `Max shaft speed ${Math.round(report.service.maxShaftRpm)} rpm (critical ${Math.round(report.criticalSpeedRpm)} rpm)`,
    rx,
    ry,
    7.5,
  );
  ry -= 10;
  return Math.min(leftBottom, ry);
}

function stepBlock(
  w: Writer,
  step: TravellerStep,
  units: FloorUnits,
  top: number,
  left: number,
  width: number,
  height: number,
): void {
  const { f, page } = w;
  const barcodeW = 190;
  const textW = width - barcodeW - 32;
  page.drawRectangle({ x: left, y: top - height, width, height, borderColor: BLACK, borderWidth: 0.8 });
  const x = left + 26;
  w.text(`${step.position}`, left + 6, top - 18, 16, f.bold);
  w.text(step.name, x, top - 13, 11, f.bold);
  let y = top - 23;
  if (step.instructions.length) y = w.wrap(step.instructions.join(". "), x, y, textW, 6.5, f.regular, 1);
  // Fields flow left to right: lot numbers in quarter cells, measured values in half cells.
  y -= 2;
  let cx = 0;
  let rowLines = 1;
  for (const field of step.fields) {
    const cell = field.type === "text" ? textW / 4 : textW / 2;
    if (cx + cell > textW + 0.5) {
      y -= rowLines * 9;
      cx = 0;
      rowLines = 1;
    }
    const after = w.wrap(fieldLine(field, units), x + cx, y, cell - 6, 7.5, f.regular, 2);
    rowLines = Math.max(rowLines, Math.round((y - after) / 9.375));
    cx += cell;
  }
  // Sign-off line for shops that also sign on paper.
  const sy = top - height + 6;
  const half = textW / 2;
  w.text("Signed", x, sy, 7, f.regular, GREY);
  w.rule(x + 26, sy - 1, x + half - 10, 0.5);
  w.text("Date", x + half, sy, 7, f.regular, GREY);
  w.rule(x + half + 20, sy - 1, x + textW, 0.5);
  // The step's code: bars, then its text in a fixed-width font under them.
  const bx = left + width - barcodeW;
  const drawn = drawCode128(page, step.barcodeText, bx, top - height + 16, height - 24, barcodeW - 8);
  const lw = f.mono.widthOfTextAtSize(step.barcodeText, 7);
  w.text(step.barcodeText, bx + (drawn - lw) / 2, top - height + 6, 7, f.mono);
}

/**
 * Failed checks an owner accepted for this one shaft, boxed and marked so nobody takes them for a
 * pass: the check as the evaluation says it, the owner's reason, who and when.
 */
function exceptionsBlock(w: Writer, view: TravellerView, top: number, left: number, width: number): number {
  const { f, page } = w;
  const pad = 6;
  let y = top - pad - 8;
  const lines: { text: string; bold: boolean }[] = view.acceptedExceptions.flatMap((a) => [
    { text: `ACCEPTED EXCEPTION - check "${a.checkId}" FAILED: ${a.message}`, bold: true },
    {
      text: `Reason: ${a.reason} - accepted by ${a.byName} on ${shopIsoDate(a.at, view.shop.timeZone ?? DEFAULT_TIME_ZONE)} for this order only; the shop's limits are unchanged.`,
      bold: false,
    },
  ]);
  // Measure first (wrap draws), so the box is drawn around what follows: draw the box last, as a border.
  for (const line of lines)
    y = w.wrap(line.text, left + pad, y, width - 2 * pad, 8, line.bold ? f.bold : f.regular, 3);
  const bottom = y + 2;
  page.drawRectangle({
    x: left,
    y: bottom,
    width,
    height: top - bottom,
    borderColor: BLACK,
    borderWidth: 1.6,
  });
  return bottom;
}

/** A re-tube: the customer's shaft, its weld-to-weld and the parts the counter meant to reuse. */
function retubeLine(
  w: Writer,
  retube: NonNullable<TravellerView["retube"]>,
  units: FloorUnits,
  left: number,
  top: number,
  width: number,
): number {
  const reused = retube.reused.length ? retube.reused.join("; ") : "none, all new parts";
  return (
    w.wrap(
      `RE-TUBE of the customer's shaft. Weld-to-weld ${formatQuantity("length", units, retube.weldToWeldMm)} (the cut length). Reused if they pass inspection: ${reused}.`,
      left,
      top - 2,
      width,
      8,
      w.f.bold,
      2,
    ) - 2
  );
}

/** What a page of a two-piece shaft's traveller changes: a line under the header, the block above the steps. */
export interface PageOptions {
  subtitle?: string;
  block?: (w: Writer, top: number, left: number, width: number) => number;
}

/** Draws one shaft's traveller on a new page of `doc`. */
export async function addTravellerPage(
  doc: PDFDocument,
  view: TravellerView,
  f: Fonts,
  options: PageOptions = {},
): Promise<void> {
  const [pw, ph] = PAGE[view.floor.paperSize];
  const page = doc.addPage([pw, ph]);
  const w = new Writer(page, f);
  const left = MARGIN;
  const width = pw - 2 * MARGIN;
  let y = ph - MARGIN;

  // Header: who, what, when; the serial big, with its QR code.
  const qr = 78;
  drawQr(page, view.serialQrText, left + width - qr, y - qr, qr);
  w.text(`${view.shop.name} · TRAVELLER${view.retube ? " · RE-TUBE" : ""}`, left, y - 9, 9, f.bold);
  w.text(view.serial, left, y - 32, 22, f.mono);
  w.text(
    `Revision ${view.revision} · shaft ${view.shaft.position} of ${view.shaft.count} · order ${view.order.number}`,
    left,
    y - 45,
    9,
  );
  const cols = [
    ["Customer", view.order.customerName],
    ["Promised", view.order.promisedDate],
    [
      view.order.fulfilment === "ship" ? "Ship" : "Pickup",
      view.order.fulfilment === "ship" ? "to the customer" : "at the shop",
    ],
  ] as const;
  const colW = (width - qr - 10) / 3;
  cols.forEach(([k, v], i) => {
    w.text(k.toUpperCase(), left + i * colW, y - 60, 6.5, f.bold, GREY);
    w.text(v.slice(0, 34), left + i * colW, y - 73, 11, f.bold);
  });
  const app = view.shaft.application;
  w.wrap(
    `${view.shaft.name}${app ? ` · ${app.description} (${shaftUseLabel(app.use).toLowerCase()})` : ""}`,
    left,
    y - 88,
    width - qr - 10,
    9,
    f.regular,
    1,
  );
  y -= 96;
  if (view.retube) y = retubeLine(w, view.retube, view.floor.units, left, y, width);
  if (options.subtitle) {
    w.text(options.subtitle, left, y - 2, 10, f.bold);
    y -= 12;
  }
  w.rule(left, y, left + width, 1.2);
  y = (options.block ?? ((ww, t, l, wd) => shaftBlock(ww, view, t, l, wd)))(w, y - 12, left, width);
  y -= 4;
  if (view.acceptedExceptions.length) y = exceptionsBlock(w, view, y, left, width) - 4;

  // Steps fill the rest of the page; a routing too long for it (a re-tube's) continues overleaf.
  const pages = drawSteps(doc, w, view, y, f);
  if (view.voidedBy != null) for (const p of pages) drawVoid(p, view.voidedBy, f);
}

function drawVoid(page: PDFPage, voidedBy: number, f: Fonts): void {
  const [pw, ph] = [page.getWidth(), page.getHeight()];
  const text = `VOID - see revision ${voidedBy}`;
  const size = 54;
  page.drawText(text, {
    x: pw / 2 - f.bold.widthOfTextAtSize(text, size) / 2.6,
    y: ph / 2 - 160,
    size,
    font: f.bold,
    color: BLACK,
    opacity: 0.3,
    rotate: degrees(35),
  });
}

/** Rows of fields a step's block needs (the cell packing of stepBlock, before any label wraps). */
function fieldRows(step: StepSpec): number {
  let rows = step.fields.length ? 1 : 0;
  let cx = 0;
  for (const field of step.fields) {
    const cell = field.type === "text" ? 0.25 : 0.5;
    if (cx + cell > 1.0001) {
      rows += 1;
      cx = 0;
    }
    cx += cell;
  }
  return rows;
}

/** The least height a step's block needs: name, instructions, its rows of fields, the sign-off line. */
const stepMinHeight = (step: StepSpec) => 30 + fieldRows(step) * 9.4 + 14;

/**
 * Draws the step blocks from `top` down, all the same height: spread over the page when they fit
 * (at most 92 pt each), else as many as fit per page with the rest on continuation pages, each
 * headed with the serial and its QR code. Returns every page drawn on.
 */
function drawSteps(doc: PDFDocument, first: Writer, view: TravellerView, top: number, f: Fonts): PDFPage[] {
  const bottom = MARGIN;
  const gap = 4;
  const left = MARGIN;
  const n = view.steps.length;
  const need = Math.max(0, ...view.steps.map(stepMinHeight));
  const spread = (top - bottom - gap * (n - 1)) / n;
  const width = first.page.getWidth() - 2 * MARGIN;
  if (spread >= need || n <= 1) {
    const h = Math.min(92, spread);
    view.steps.forEach((step, i) =>
      stepBlock(first, step, view.floor.units, top - i * (h + gap), left, width, h),
    );
    return [first.page];
  }
  // Continued: a little more than the least, so labels that wrap keep clear of the sign-off line.
  const h = Math.max(need + 8, 72);
  const pages = [first.page];
  let w = first;
  let y = top;
  let sheet = 1;
  for (const step of view.steps) {
    if (y - h < bottom) {
      sheet += 1;
      const page = doc.addPage([first.page.getWidth(), first.page.getHeight()]);
      pages.push(page);
      w = new Writer(page, f);
      y = continuationHeader(w, view, sheet);
    }
    stepBlock(w, step, view.floor.units, y, left, width, h);
    y -= h + gap;
  }
  return pages;
}

/** The head of a continuation page: whose traveller it is, with the serial's QR code. Returns where steps start. */
function continuationHeader(w: Writer, view: TravellerView, sheet: number): number {
  const width = w.page.getWidth() - 2 * MARGIN;
  const y = w.page.getHeight() - MARGIN;
  const qr = 54;
  drawQr(w.page, view.serialQrText, MARGIN + width - qr, y - qr, qr);
  w.text(
    `${view.shop.name} · TRAVELLER${view.retube ? " · RE-TUBE" : ""} · continued, sheet ${sheet}`,
    MARGIN,
    y - 9,
    9,
    w.f.bold,
  );
  w.text(view.serial, MARGIN, y - 30, 18, w.f.mono);
  w.text(
    `Revision ${view.revision} · shaft ${view.shaft.position} of ${view.shaft.count} · order ${view.order.number} · ${view.order.customerName}`,
    MARGIN,
    y - 44,
    9,
  );
  w.rule(MARGIN, y - qr - 6, MARGIN + width, 1.2);
  return y - qr - 14;
}

/** One page per shaft, in the order given. */
export async function renderTravellers(views: readonly TravellerView[]): Promise<Uint8Array> {
  const doc = await PDFDocument.create();
  doc.setTitle(views.length === 1 ? `Traveller ${views[0]!.serial}` : `Travellers (${views.length})`);
  doc.setCreator("Yokeline");
  const f = await embedFonts(doc);
  for (const view of views) {
    if (view.report.layout === "two-piece") await addTwoPieceTravellerPages(doc, view, f);
    else await addTravellerPage(doc, view, f);
  }
  return doc.save();
}

export async function renderTraveller(view: TravellerView): Promise<Uint8Array> {
  return renderTravellers([view]);
}
