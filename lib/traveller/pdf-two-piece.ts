/**
 * The traveller of a two-piece shaft: a cover page for the whole shaft (both pieces, the centre
 * bearing, the three joints and their indices) with the assembly, final inspection and dispatch
 * steps, then one page per piece with that piece's tube, cut length, phase index, runout stations
 * and balance limit beside its own scannable steps. Server only, like pdf.ts.
 */
import type { PDFDocument } from "pdf-lib";
import type { ShaftPieceReport } from "@/lib/driveline/report";
import { GREY, type Fonts, type Writer } from "./pdf-kit";
import { addTravellerPage, drawPhaseDiagram, drawVerdict } from "./pdf";
import { assembledLengthMm, pieceReport } from "./two-piece-steps";
import { formatQuantity } from "./units";
import type { TravellerView } from "./view";

const PIECE_WORDS = { A: "Piece A (front)", B: "Piece B (rear)" } as const;

function stepNumbers(view: TravellerView, piece: "A" | "B" | undefined): string {
  return view.steps
    .filter((s) => s.piece === piece)
    .map((s) => s.position)
    .join(", ");
}

/** The cover's block: what the two pieces are, where the centre bearing goes, the three joints and both indices. */
function summaryBlock(w: Writer, view: TravellerView, top: number, left: number, width: number): number {
  const { report } = view;
  const { f } = w;
  const units = view.floor.units;
  const q = (quantity: Parameters<typeof formatQuantity>[0], v: number) => formatQuantity(quantity, units, v);
  const label = (t: string, x: number, yy: number) => w.text(t.toUpperCase(), x, yy, 6.5, f.bold, GREY);
  const colW = width * 0.62;
  const tol = report.shopFloor.lengthToleranceMm;
  let y = top;

  label("Two-piece shaft with a centre bearing", left, y);
  y -= 12;
  const t = report.tube;
  w.text(
    `${t.tubeId ?? "tube as designed"} · ${t.materialId} · ${q("length", t.odMm)} OD × ${q("length", t.wallMm)} wall, both pieces`,
    left,
    y,
    9,
    f.bold,
  );
  y -= 13;
  w.text(
    `Overall, laid straight: ${q("length", assembledLengthMm(report))} ± ${q("length", tol)} between the front and rear joint centres`,
    left,
    y,
    8.5,
  );
  y -= 14;
  for (const p of report.pieces ?? []) {
    label(`${PIECE_WORDS[p.piece]} — steps ${stepNumbers(view, p.piece)}`, left, y);
    y -= 10;
    y = w.wrap(pieceLine(p, q, tol), left, y, colW - 8, 7.5, f.regular, 3);
    y -= 2;
  }
  const cb = report.centreBearing;
  if (cb) {
    label("Centre bearing and joints", left, y);
    y -= 10;
    y = w.wrap(
      `${cb.name} (${cb.bearingId}), centre joint ${cb.jointSeriesId}: ${q("length", cb.fromFrontMm)} from the front joint centre, ${q("length", cb.dropMm)} below the straight line.`,
      left,
      y,
      colW - 8,
      7.5,
      f.regular,
      3,
    );
  }
  y = w.wrap(
    `Working angles: ${report.joints.map((j) => `${j.position} ${j.workingAngleDeg.toFixed(2)}°`).join(", ")}.`,
    left,
    y,
    colW - 8,
    7.5,
    f.regular,
    2,
  );
  y -= 2;
  y = drawVerdict(w, report, left, y, colW - 8);

  // Right column: each piece's rear-yoke index, looking rearward.
  const rx = left + colW;
  let ry = top;
  label("Phase indices, looking rearward", rx, ry);
  ry -= 8;
  for (const p of report.pieces ?? []) {
    drawPhaseDiagram(w, rx + 22, ry - 22, 16, p.phaseIndexDeg);
    w.text(`${p.phaseIndexDeg.toFixed(1)}°`, rx + 46, ry - 18, 13, f.bold);
    w.text(
      `piece ${p.piece} rear yoke ± ${report.shopFloor.phasingToleranceDeg.toFixed(1)}°`,
      rx + 46,
      ry - 28,
      7,
    );
    ry -= 50;
  }
  w.text(
    `Assembly, inspection and dispatch: steps ${stepNumbers(view, undefined)} (this page)`,
    rx,
    ry,
    7,
    f.bold,
  );
  ry -= 10;
  return Math.min(y, ry);
}

function pieceLine(p: ShaftPieceReport, q: (quantity: "length", v: number) => string, tol: number): string {
  const ends = [p.ends.front, p.ends.rear].map((e) => (e ? `${e.name} (${e.fittingId})` : "as designed"));
  return `Between joint centres ${q("length", p.spanMm)} ± ${q("length", tol)}; cut ${p.cutLengthMm != null ? q("length", p.cutLengthMm) : "as designed"}; front: ${ends[0]}; rear: ${ends[1]}; critical speed ${Math.round(p.criticalSpeedRpm)} rpm.`;
}

/** The cover page, then one page per piece, each with its own steps' codes. */
export async function addTwoPieceTravellerPages(
  doc: PDFDocument,
  view: TravellerView,
  f: Fonts,
): Promise<void> {
  const pieces = view.report.pieces ?? [];
  await addTravellerPage(doc, { ...view, steps: view.steps.filter((s) => !s.piece) }, f, {
    subtitle: `Two-piece shaft: cover, assembly and dispatch · ${pieces.length} piece pages follow`,
    block: (w, top, left, width) => summaryBlock(w, view, top, left, width),
  });
  for (const piece of pieces) {
    await addTravellerPage(
      doc,
      {
        ...view,
        report: pieceReport(view.report, piece),
        steps: view.steps.filter((s) => s.piece === piece.piece),
        acceptedExceptions: [],
      },
      f,
      {
        subtitle: `${PIECE_WORDS[piece.piece]} of a two-piece shaft — its own cut length, phase, runout and balance`,
      },
    );
  }
}
