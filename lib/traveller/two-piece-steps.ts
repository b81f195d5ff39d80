/**
 * The record sheets of a two-piece shaft: the routing's cut, weld-and-phase, runout and balance
 * steps once per piece (each with that piece's own limits: its cut length, its span between joint
 * centres, its runout stations and its ISO 21940-11 per-plane residual from its own mass), then the
 * assembly at the centre bearing that phases the three joints, final inspection and dispatch.
 *
 * A piece's step code is the routing code's first two letters and the piece letter ("CUT" → "CUA"
 * for the front piece, "CUB" for the rear), so every barcode names its piece. Pure.
 */
import type { EvaluationReport, ShaftPieceReport } from "@/lib/driveline/report";
import { defaultAssemblyStep, PER_PIECE_KINDS, type RoutingStep } from "./settings";
import { fieldsFor, phaseTarget, type FieldSpec, type StepContext, type StepSpec } from "./steps";

const PIECE_WORDS = { A: "piece A (front)", B: "piece B (rear)" } as const;

/** The report as one piece sees it: its span, cut length, tube, ends, balance and rear-yoke index. */
export function pieceReport(report: EvaluationReport, piece: ShaftPieceReport): EvaluationReport {
  const { asSpecified: _ignored, ...phasing } = report.phasing;
  return {
    ...report,
    lengthMm: piece.spanMm,
    cutLengthMm: piece.cutLengthMm,
    tube: piece.tube,
    ends: piece.ends,
    balance: piece.balance,
    criticalSpeedRpm: piece.criticalSpeedRpm,
    criticalSpeedRatio: piece.criticalSpeedRatio,
    phasing: { ...phasing, phaseIndexDeg: piece.phaseIndexDeg },
    // The piece's own two joints: the centre joint is the front piece's rear and the rear piece's front.
    joints: report.joints
      .filter((j) => j.position === piece.position || j.position === "centre")
      .map((j) =>
        j.position === "centre" ? { ...j, position: piece.position === "front" ? "rear" : "front" } : j,
      ),
  };
}

/** Length of the assembled shaft laid straight on the bench: the two pieces' spans, joint centre to joint centre. */
export function assembledLengthMm(report: EvaluationReport): number {
  return (report.pieces ?? []).reduce((s, p) => s + p.spanMm, 0) || report.lengthMm;
}

function phaseField(ctx: StepContext, key: string, label: string, indexDeg: number): FieldSpec {
  const t = phaseTarget(ctx);
  return {
    key,
    label,
    type: "number",
    quantity: "angle",
    limit: {
      min: indexDeg - t.toleranceDeg,
      max: indexDeg + t.toleranceDeg,
      nominal: indexDeg,
      angular: true,
      source: t.source,
    },
  };
}

/** Both pieces' rear-yoke indices, as assembled (the three joints phased as one chain). */
function pieceIndexFields(ctx: StepContext): FieldSpec[] {
  return (ctx.report.pieces ?? []).map((p) =>
    phaseField(ctx, `phaseIndex${p.piece}Deg`, `Piece ${p.piece} rear yoke phase index`, p.phaseIndexDeg),
  );
}

function overallLengthField(ctx: StepContext): FieldSpec {
  const nominal = assembledLengthMm(ctx.report);
  const tol = ctx.report.shopFloor.lengthToleranceMm;
  return {
    key: "overallLengthMm",
    label: "Overall length laid straight (joint centres)",
    type: "number",
    quantity: "length",
    limit: {
      min: nominal - tol,
      max: nominal + tol,
      nominal,
      source: ctx.report.shopFloor.sources[0] ?? "shop setting",
    },
  };
}

/** The assembly step's record: what was fitted, both indices and the overall length. */
export function assemblyFields(ctx: StepContext): FieldSpec[] {
  if (ctx.report.layout !== "two-piece") return [];
  return [
    { key: "centreBearingLot", label: "Centre bearing lot", type: "text" },
    { key: "centreJointLot", label: "Centre joint lot", type: "text" },
    ...pieceIndexFields(ctx),
    overallLengthField(ctx),
    { key: "centreBearingSecured", label: "Stub nut tightened, bearing rubber intact", type: "confirm" },
  ];
}

/** Labels and lots of a piece's weld-and-phase step: the front piece ends in the stub, the rear piece starts at the centre yoke. */
function pieceWeldFields(fields: FieldSpec[], piece: ShaftPieceReport): FieldSpec[] {
  const drop = piece.piece === "A" ? "rearJointLot" : "frontJointLot";
  return fields
    .filter((f) => f.key !== drop)
    .map((f) => {
      if (piece.piece === "A" && f.key === "rearYokeLot") return { ...f, label: "Centre bearing stub lot" };
      if (piece.piece === "B" && f.key === "frontYokeLot") return { ...f, label: "Centre yoke lot" };
      if (f.key === "weldedLengthMm")
        return { ...f, label: `As-welded length of piece ${piece.piece} (joint centres)` };
      if (f.key === "phaseIndexDeg") return { ...f, label: `Piece ${piece.piece} rear yoke phase index` };
      return f;
    });
}

/** The piece's three-letter code: the routing code's first two letters and the piece letter, unless taken. */
function pieceCode(code: string, piece: "A" | "B", taken: Set<string>): string {
  const candidates = [code[0]! + code[1]! + piece, code[0]! + code[2]! + piece, code[1]! + code[2]! + piece];
  for (let c = 65; c <= 90; c++) candidates.push(code[0]! + String.fromCharCode(c) + piece);
  const free = candidates.find((c) => !taken.has(c))!;
  taken.add(free);
  return free;
}

/** The final inspection of the assembled shaft: its laid-straight length and both pieces' indices. */
function finalInspectionFields(fields: FieldSpec[], ctx: StepContext): FieldSpec[] {
  return fields.flatMap((f) => {
    if (f.key === "overallLengthMm") return [overallLengthField(ctx)];
    if (f.key === "phaseIndexDeg") return pieceIndexFields(ctx);
    return [f];
  });
}

/** Every step of a two-piece shaft's traveller, in order (see the file's comment). */
export function deriveTwoPieceSteps(ctx: StepContext): StepSpec[] {
  const pieces = ctx.report.pieces ?? [];
  const routing: RoutingStep[] = [...ctx.floor.routing];
  if (!routing.some((s) => s.kind === "assembly")) {
    const at = routing.findIndex((s) => s.kind === "final-inspection");
    routing.splice(at < 0 ? routing.length : at, 0, defaultAssemblyStep);
  }
  const taken = new Set(routing.map((s) => s.code));
  const out: Omit<StepSpec, "position">[] = [];
  for (const step of routing) {
    const name =
      step.kind === "dispatch" && step.name === "Pack and ship / pickup"
        ? ctx.fulfilment === "ship"
          ? "Pack and ship"
          : "Pickup"
        : step.name;
    if (!PER_PIECE_KINDS.includes(step.kind)) {
      const fields = fieldsFor(step, ctx);
      out.push({
        code: step.code,
        kind: step.kind,
        name,
        instructions: [...step.instructions],
        fields: step.kind === "final-inspection" ? finalInspectionFields(fields, ctx) : fields,
      });
      continue;
    }
    for (const piece of pieces) {
      const pctx: StepContext = { ...ctx, report: pieceReport(ctx.report, piece) };
      const fields = fieldsFor(step, pctx);
      out.push({
        code: pieceCode(step.code, piece.piece, taken),
        kind: step.kind,
        name: `${name} — ${PIECE_WORDS[piece.piece]}`,
        instructions: [...step.instructions],
        fields: step.kind === "weld-phase" ? pieceWeldFields(fields, piece) : fields,
        piece: piece.piece,
      });
    }
  }
  return out.map((s, i) => ({ ...s, position: i + 1 }));
}
