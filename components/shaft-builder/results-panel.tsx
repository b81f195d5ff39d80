"use client";
import { useShopLocale } from "@/components/shop-locale";
import { formatMoney } from "@/lib/money";

import { useState } from "react";
import { AlertTriangle, CheckCircle2, Loader2, XCircle } from "lucide-react";
import type {
  Catalogue,
  CheckStatus,
  DesignFile,
  EvaluationReport,
  TubeCandidate,
  TubePreference,
} from "@/lib/driveline";
import { sameTube } from "@/lib/driveline/catalogue/tube-match";
import { DEMO_CATALOGUE_NOTE, DISCLAIMER, SAFETY_CAUTION } from "@/lib/driveline/report";
import { kgToLb } from "@/lib/driveline/units";
import { DrivelineView } from "./driveline-diagram";
import { SpeedRatioPlot } from "./speed-ratio-plot";
import { LoadsSummary } from "./loads-summary";
import { formatNumber, withUnit, type UnitSystem } from "./model";

const STATUS = {
  pass: { word: "Pass", Icon: CheckCircle2, text: "text-pass", box: "bg-pass-soft border-pass/30" },
  warn: { word: "Warning", Icon: AlertTriangle, text: "text-warn", box: "bg-warn-soft border-warn/30" },
  fail: { word: "Fail", Icon: XCircle, text: "text-fail", box: "bg-fail-soft border-fail/30" },
} as const satisfies Record<CheckStatus, unknown>;

/** A status as icon and word (never colour alone). */
export function StatusWord({ status, className = "" }: { status: CheckStatus; className?: string }) {
  const s = STATUS[status];
  return (
    <span className={`inline-flex items-center gap-1 font-semibold ${s.text} ${className}`}>
      <s.Icon className="size-4 shrink-0" aria-hidden="true" />
      {s.word}
    </span>
  );
}

export interface TubeChoice {
  materialId: string;
  odMm: number;
  wallMm: number;
}

const mass = (kg: number, system: UnitSystem) =>
  system === "imperial" ? `${formatNumber(kgToLb(kg), 1)} lb` : `${formatNumber(kg, 1)} kg`;

/** Cents in the shop's currency (the builder sits under a layout that gives the shop's locale). */
function useMoney(): (cents: number) => string {
  const { currency } = useShopLocale();
  return (cents) => formatMoney(cents, currency);
}

function materialName(catalogue: Catalogue, id: string): string {
  const name = catalogue.materials.find((m) => m.id === id)?.name ?? id;
  return name.split(" (")[0] ?? name;
}

/** "Chromoly 4130, normalised 3.500 × 0.083 in" */
export function tubeLabel(catalogue: Catalogue, t: TubeChoice, system: UnitSystem): string {
  const od = withUnit(t.odMm, "diameter", system).split(" ")[0];
  return `${materialName(catalogue, t.materialId)} ${od} × ${withUnit(t.wallMm, "diameter", system)}`;
}

interface ResultsPanelProps {
  report: EvaluationReport;
  design: DesignFile;
  /** True when the form has errors and these results are from the last valid state. */
  stale: boolean;
  /** The form changed and the engineering is still loading (a moment): these are the last results. */
  calculating?: boolean;
  system: UnitSystem;
  catalogue: Catalogue;
  /** The customer chose the tube (rather than letting Yokeline pick). */
  tubeChosen: boolean;
  onUseTube: (tube: TubeChoice) => void;
  /** Shown at the end (the quote button). */
  footer?: React.ReactNode;
  /** The shop's preference: the ranking (and the suggestion) is cheapest or lightest first. */
  tubePreference?: TubePreference;
}

/** The live evaluation: verdict, cautions, tube, checks, pictures, alternatives. */
export function ResultsPanel({
  report,
  design,
  stale,
  calculating = false,
  system,
  catalogue,
  tubeChosen,
  onUseTube,
  footer,
  tubePreference = "lightest",
}: ResultsPanelProps) {
  const critical = report.checks.find((c) => c.id === "critical-speed");
  const ranking =
    (tubePreference === "cheapest" ? report.tubeSelection?.byCost : report.tubeSelection?.byMass) ?? [];
  const order = tubePreference === "cheapest" ? "cheapest" : "lightest";
  const suggested: TubeCandidate | undefined = ranking.find((c) => c.status === "pass") ?? ranking[0];
  const view = { report, system, catalogue };

  return (
    <div className="space-y-5">
      {stale && (
        <div
          role="status"
          className="rounded-md border border-warn/40 bg-warn-soft p-3 text-sm font-medium text-warn"
          data-testid="stale-note"
        >
          Fix the highlighted fields — these results are from your last valid entries.
        </div>
      )}
      {calculating && (
        <div
          role="status"
          className="flex items-center gap-2 rounded-md border border-line bg-paper-sunk p-3 text-sm font-medium text-ink-soft"
          data-testid="calculating-note"
        >
          <Loader2 className="size-4 animate-spin" aria-hidden="true" />
          Calculating your changes… the results below are from your previous entries.
        </div>
      )}
      <div className={`space-y-5 ${stale ? "opacity-50 grayscale" : calculating ? "opacity-60" : ""}`}>
        <Verdict {...view} />
        {tubeChosen && critical?.status === "fail" && (
          <SuggestedTube {...view} suggested={suggested} onUseTube={onUseTube} />
        )}
        <ChecksList report={report} />
        <KeyFigures report={report} system={system} />
        <LoadsSummary report={report} design={design} system={system} catalogue={catalogue} />
        <DrivelinePictures report={report} design={design} />
        {ranking.length > 0 && (
          <TubeRanking {...view} ranking={ranking} order={order} onUseTube={onUseTube} />
        )}
        {report.twoPiece && <TwoPieceProposalView {...view} proposal={report.twoPiece} />}
        <Notes cautions={report.cautions} />
      </div>
      {footer}
    </div>
  );
}

interface ViewProps {
  report: EvaluationReport;
  system: UnitSystem;
  catalogue: Catalogue;
}

/** The overall result, the tube, speed and torque in one line, and the safety caution. */
function Verdict({ report, system, catalogue }: ViewProps) {
  const money = useMoney();
  const failing = report.checks.filter((c) => c.status === "fail").length;
  const warning = report.checks.filter((c) => c.status === "warn").length;
  return (
    <section
      aria-labelledby="verdict"
      className={`rounded-card border p-4 ${STATUS[report.overall].box}`}
      data-testid="verdict"
    >
      <h3 id="verdict" className="flex flex-wrap items-center gap-2 text-lg font-bold">
        <StatusWord status={report.overall} className="text-lg" />
        <span className="text-ink">
          {report.overall === "pass"
            ? "Every check passes."
            : report.overall === "warn"
              ? `${warning} check${warning === 1 ? "" : "s"} need${warning === 1 ? "s" : ""} attention.`
              : `${failing} check${failing === 1 ? "" : "s"} fail${failing === 1 ? "s" : ""}: this shaft should not be built as entered.`}
        </span>
      </h3>
      <p className="mt-1 text-sm text-ink-soft">
        {report.tube.origin === "catalogue" ? "Yokeline picked " : "Your tube: "}
        <strong className="text-ink">{tubeLabel(catalogue, report.tube, system)}</strong>,{" "}
        {mass(report.tube.massKg, system)}
        {report.tube.priceCents != null ? `, tube ${money(report.tube.priceCents)}` : ""}. Shaft up to{" "}
        {formatNumber(report.service.maxShaftRpm, 0)} rpm, peak torque{" "}
        {withUnit(report.service.peakShaftTorqueNm, "torque", system, 0)}.
      </p>
      {report.overall !== "pass" && (
        <p
          className="mt-3 flex gap-2 rounded-md border border-fail/30 bg-paper-raised p-3 text-sm font-medium text-ink"
          data-testid="safety-caution"
        >
          <AlertTriangle className="mt-0.5 size-4 shrink-0 text-fail" aria-hidden="true" />
          <span>
            <span className="sr-only">Safety caution: </span>
            {SAFETY_CAUTION}
          </span>
        </p>
      )}
    </section>
  );
}

/** The chosen tube fails the critical speed: the best passing tube, one click to take it. */
function SuggestedTube({
  system,
  catalogue,
  suggested,
  onUseTube,
}: ViewProps & { suggested: TubeCandidate | undefined; onUseTube: (tube: TubeChoice) => void }) {
  const money = useMoney();
  return (
    <section aria-labelledby="suggested" className="card border-fail/40 p-4" data-testid="suggested-tube">
      <h3 id="suggested" className="font-semibold">
        The tube you chose is too slender for this length and speed
      </h3>
      {suggested ? (
        <>
          <p className="mt-1 text-sm text-ink-soft">
            Suggested: <strong className="text-ink">{tubeLabel(catalogue, suggested, system)}</strong> —
            critical-speed ratio {suggested.criticalSpeedRatio.toFixed(3)}, torsion safety{" "}
            {suggested.torsionSafetyFactor.toFixed(2)}, {mass(suggested.massKg, system)},{" "}
            {money(suggested.priceCents)}.
          </p>
          <button type="button" className="no-print mt-3 btn-accent" onClick={() => onUseTube(suggested)}>
            Use suggested tube
          </button>
        </>
      ) : (
        <p className="mt-1 text-sm text-ink-soft">
          No single tube in the shop&rsquo;s stock passes at this length; see the two-piece proposal below.
        </p>
      )}
    </section>
  );
}

/** Every check, with its status and message. */
function ChecksList({ report }: { report: EvaluationReport }) {
  return (
    <section aria-labelledby="checks-h" className="card p-4">
      <h3 id="checks-h" className="font-semibold">
        Checks
      </h3>
      <ul className="mt-2 divide-y divide-line" data-testid="checks">
        {report.checks.map((c) => (
          <li
            key={c.id}
            className="grid gap-1 py-2 sm:grid-cols-[6.5rem_1fr]"
            data-testid={`check-${c.id}`}
            data-status={c.status}
          >
            <StatusWord status={c.status} />
            <span className="text-sm text-ink-soft">{c.message}</span>
          </li>
        ))}
      </ul>
    </section>
  );
}

/** The figures a shop looks at first. */
function KeyFigures({ report, system }: { report: EvaluationReport; system: UnitSystem }) {
  const front = report.joints[0];
  const rear = report.joints[report.joints.length - 1];
  return (
    <section aria-labelledby="figures-h" className="card p-4">
      <h3 id="figures-h" className="font-semibold">
        Key figures
      </h3>
      <dl className="mt-2 grid grid-cols-2 gap-x-4 gap-y-2 text-sm sm:grid-cols-3">
        {[
          ["Front working angle", front ? `${front.workingAngleDeg.toFixed(2)}°` : "—"],
          ["Rear working angle", rear ? `${rear.workingAngleDeg.toFixed(2)}°` : "—"],
          ["Equivalent angle", `${report.phasing.equivalentAngleDeg.toFixed(2)}°`],
          ["Rear yoke index", `${report.phasing.phaseIndexDeg.toFixed(1)}°`],
          ["Output speed variation", `${report.phasing.outputSpeedVariationPct.toFixed(3)} %`],
          ["Max shaft speed", `${formatNumber(report.service.maxShaftRpm, 0)} rpm`],
          ["Critical speed", `${formatNumber(report.criticalSpeedRpm, 0)} rpm`],
          ["Critical-speed ratio", report.criticalSpeedRatio.toFixed(3)],
          ["Torsion safety factor", report.torsion.safetyFactor.toFixed(2)],
          ["Cut length", report.cutLengthMm != null ? withUnit(report.cutLengthMm, "length", system) : "—"],
          ["Rotor mass", mass(report.balance.rotorMassKg, system)],
          ["Balance per plane", `${formatNumber(report.balance.perPlaneGmm, 1)} g·mm`],
        ].map(([k, v]) => (
          <div key={k}>
            <dt className="text-ink-muted">{k}</dt>
            <dd className="font-semibold tabular-nums">{v}</dd>
          </div>
        ))}
      </dl>
    </section>
  );
}

/** Side (and top) view drawings and the speed over one turn. */
function DrivelinePictures({ report, design }: { report: EvaluationReport; design: DesignFile }) {
  const [exaggerate, setExaggerate] = useState(false);
  const front = report.joints[0];
  const rear = report.joints[report.joints.length - 1];
  const g = design.geometry;
  const ds = g.driveshaft ?? { verticalDeg: 0, horizontalDeg: 0 };
  const hasTopView = [g.transmission, ds, g.pinion].some((a) => a.horizontalDeg !== 0);
  const k = exaggerate ? 4 : 1;
  return (
    <section aria-labelledby="pictures-h" className="card p-4">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 id="pictures-h" className="font-semibold">
          The driveline
        </h3>
        <label className="no-print inline-flex items-center gap-2 text-sm">
          <input
            type="checkbox"
            checked={exaggerate}
            onChange={(e) => setExaggerate(e.target.checked)}
            className="size-4 accent-steel-700"
          />
          Draw angles 4× larger
        </label>
      </div>
      <div className="mt-3 space-y-4">
        <DrivelineView
          view="side"
          lengthMm={design.lengthMm}
          transmissionDeg={g.transmission.verticalDeg}
          driveshaftDeg={ds.verticalDeg}
          pinionDeg={g.pinion.verticalDeg}
          frontWorkingDeg={front?.workingAngleDeg ?? 0}
          rearWorkingDeg={rear?.workingAngleDeg ?? 0}
          exaggeration={k}
        />
        {hasTopView && (
          <DrivelineView
            view="top"
            lengthMm={design.lengthMm}
            transmissionDeg={g.transmission.horizontalDeg}
            driveshaftDeg={ds.horizontalDeg}
            pinionDeg={g.pinion.horizontalDeg}
            frontWorkingDeg={front?.workingAngleDeg ?? 0}
            rearWorkingDeg={rear?.workingAngleDeg ?? 0}
            exaggeration={k}
          />
        )}
        {report.curves && (
          <div>
            <h4 className="text-sm font-semibold">Speed over one turn</h4>
            <p className="mb-2 text-sm text-ink-soft">
              Each joint speeds the shaft up and slows it down twice a turn. Set at the right angle to each
              other, the two joints cancel, and the pinion turns smoothly — that is what phasing does.
            </p>
            <SpeedRatioPlot
              curves={report.curves}
              phaseIndexDeg={report.phasing.phaseIndexDeg}
              outputVariationPct={report.phasing.outputSpeedVariationPct}
            />
          </div>
        )}
      </div>
    </section>
  );
}

/** The tubes that pass, in the shop's order, each one click to take. */
function TubeRanking({
  report,
  system,
  catalogue,
  ranking,
  order,
  onUseTube,
}: ViewProps & {
  ranking: readonly TubeCandidate[];
  order: string;
  onUseTube: (tube: TubeChoice) => void;
}) {
  const money = useMoney();
  return (
    <section aria-labelledby="tubes-h" className="card p-4">
      <h3 id="tubes-h" className="font-semibold">
        Tubes that pass, {order} first
      </h3>
      <div className="relative mt-2 overflow-x-auto">
        <table className="w-full min-w-[36rem] text-left text-sm print:min-w-0" data-testid="tube-ranking">
          <thead className="text-ink-muted">
            <tr>
              <th scope="col" className="py-1 pr-2 font-medium">
                Tube
              </th>
              <th scope="col" className="py-1 pr-2 font-medium">
                Mass
              </th>
              <th scope="col" className="py-1 pr-2 font-medium">
                Critical-speed margin
              </th>
              <th scope="col" className="py-1 pr-2 font-medium">
                Torsion safety
              </th>
              <th scope="col" className="py-1 pr-2 font-medium">
                Price
              </th>
              <th scope="col" className="py-1 font-medium">
                <span className="sr-only">Action</span>
              </th>
            </tr>
          </thead>
          <tbody className="divide-y divide-line">
            {ranking.slice(0, 8).map((c) => {
              const current = sameTube(c, report.tube);
              return (
                <tr key={c.tubeId} className={current ? "bg-steel-50" : undefined}>
                  <td className="py-2 pr-2">
                    <span className="font-medium">{tubeLabel(catalogue, c, system)}</span>
                    <span className="block text-xs">
                      <StatusWord status={c.status} className="text-xs" />
                    </span>
                  </td>
                  <td className="py-2 pr-2 tabular-nums">{mass(c.massKg, system)}</td>
                  <td className="py-2 pr-2 tabular-nums">
                    +{formatNumber(c.speedHeadroomPct, 0)} % speed (ratio {c.criticalSpeedRatio.toFixed(3)})
                  </td>
                  <td className="py-2 pr-2 tabular-nums">{c.torsionSafetyFactor.toFixed(2)}</td>
                  <td className="py-2 pr-2 tabular-nums">{money(c.priceCents)}</td>
                  <td className="no-print py-2 text-right">
                    {current ? (
                      <span className="text-xs font-semibold text-steel-700">In use</span>
                    ) : (
                      <button
                        type="button"
                        className="btn-quiet px-2 py-1 text-xs"
                        onClick={() => onUseTube(c)}
                        aria-label={`Use this tube: ${tubeLabel(catalogue, c, system)}`}
                      >
                        Use this tube
                      </button>
                    )}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      {ranking.length > 8 && (
        <p className="mt-2 text-xs text-ink-muted">
          {ranking.length - 8} more pass; the {order} are shown.
        </p>
      )}
    </section>
  );
}

/** Too long for one piece: the two-piece proposal and its checks. */
function TwoPieceProposalView({
  system,
  catalogue,
  proposal,
}: ViewProps & { proposal: NonNullable<EvaluationReport["twoPiece"]> }) {
  return (
    <section aria-labelledby="two-h" className="card p-4" data-testid="two-piece">
      <h3 id="two-h" className="flex flex-wrap items-center gap-2 font-semibold">
        Two-piece proposal <StatusWord status={proposal.overall} />
      </h3>
      <p className="mt-1 text-sm text-ink-soft">{proposal.reason}</p>
      <p className="mt-1 text-sm text-ink-soft">
        Centre support bearing {withUnit(proposal.centreBearingFromFrontMm, "length", system)} behind the
        front joint, dropped {withUnit(proposal.centreBearingDropMm, "length", system)} below the straight
        line.{" "}
        {proposal.feasible
          ? "The shop can build it this way."
          : "Even split in two, it does not pass; talk to the shop."}
      </p>
      <ul className="mt-2 text-sm">
        {proposal.pieces.map((p) => (
          <li key={p.position}>
            {p.position === "front" ? "Front" : "Rear"} piece: {withUnit(p.spanMm, "length", system)},{" "}
            {tubeLabel(catalogue, p.tube, system)}, critical-speed ratio{" "}
            {p.tube.criticalSpeedRatio.toFixed(3)}
          </li>
        ))}
      </ul>
      <ul className="mt-2 divide-y divide-line">
        {proposal.checks.map((c) => (
          <li key={c.id} className="grid gap-1 py-1.5 sm:grid-cols-[6.5rem_1fr]">
            <StatusWord status={c.status} />
            <span className="text-sm text-ink-soft">{c.message}</span>
          </li>
        ))}
      </ul>
    </section>
  );
}

/** The report's cautions and notes (the safety caution is shown with the verdict). */
function Notes({ cautions }: { cautions: EvaluationReport["cautions"] }) {
  return (
    <section aria-label="Notes" className="space-y-2 text-sm text-ink-soft">
      {cautions
        .filter((c) => c !== SAFETY_CAUTION)
        .map((c) => (
          <p key={c} className={c === DISCLAIMER ? "font-medium text-ink" : undefined}>
            {c === DEMO_CATALOGUE_NOTE ? "Note: " : ""}
            {c}
          </p>
        ))}
    </section>
  );
}
