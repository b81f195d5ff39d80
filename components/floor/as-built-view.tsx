import type { AsBuiltRecord } from "@/lib/floor/queries";
import { ShopTime } from "@/components/shop-locale";
import { RetubeBadge, RetubeSummary } from "@/components/orders/retube-summary";
import type { EvaluationReport } from "@/lib/driveline/report";
import { shownValue } from "@/lib/floor/scan";
import { formatQuantity, type FloorUnits } from "@/lib/traveller/units";

const OUTCOME: Record<string, { label: string; tone: string }> = {
  pass: { label: "Pass", tone: "bg-pass-soft text-pass" },
  rework: { label: "Rework, then pass", tone: "bg-pass-soft text-pass" },
  concession: { label: "Accepted by concession", tone: "bg-warn-soft text-warn" },
  hold: { label: "Hold", tone: "bg-warn-soft text-warn" },
};

const STATE: Record<AsBuiltRecord["state"], string> = {
  released: "Released to the shop",
  in_shop: "In the shop",
  on_hold: "On hold",
  ready: "Ready",
  shipped: "Shipped",
  picked_up: "Picked up",
};

/**
 * A shaft's as-built record: the frozen design and evaluation, then every step's measurements,
 * lots, who and when. Customers see what was signed off, not the shop's internal holds.
 */
export function AsBuiltView({
  record,
  units,
  audience,
  afterDesign,
}: {
  record: AsBuiltRecord;
  units: FloorUnits;
  audience: "staff" | "customer";
  /** Shown between the frozen design and the steps (the staff page's vibration triage). */
  afterDesign?: React.ReactNode;
}) {
  const r = record.evaluation as unknown as EvaluationReport;
  const len = (mm: number | undefined) =>
    typeof mm === "number" ? formatQuantity("length", units, mm) : "—";
  const summary: [string, string][] = [
    ["Overall verdict", r.overall ?? "—"],
    ["Length between joint centres", len(r.lengthMm)],
    ["Tube", r.tube ? `${r.tube.tubeId} · ${len(r.tube.odMm)} × ${len(r.tube.wallMm)} wall` : "—"],
    record.retube
      ? ["Cut length (re-tube: the customer's weld-to-weld)", len(record.retube.weldToWeldMm)]
      : ["Cut length", len(r.cutLengthMm ?? r.tube?.tubeLengthMm)],
    ["Service speed", r.service ? `${Math.round(r.service.maxShaftRpm)} rpm` : "—"],
    [
      "Critical speed",
      r.criticalSpeedRpm
        ? `${Math.round(r.criticalSpeedRpm)} rpm (ratio ${r.criticalSpeedRatio?.toFixed(2)})`
        : "—",
    ],
    ["Torsion safety factor", r.torsion ? r.torsion.safetyFactor.toFixed(2) : "—"],
    ["Phase index", r.phasing ? `${r.phasing.phaseIndexDeg}°` : "—"],
    [
      "Balance",
      r.balance
        ? `G ${r.balance.gradeMmS} at ${Math.round(r.balance.speedRpm)} rpm, ${formatQuantity("unbalance", units, r.balance.perPlaneGmm)} per plane`
        : "—",
    ],
  ];
  const checks = (r.checks ?? []).filter((c) => c.status !== "pass");
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-center gap-3 text-lg">
        <span className="rounded-full bg-steel-50 px-3 py-1 font-semibold text-steel-900">
          {STATE[record.state]}
        </span>
        {record.retube && <RetubeBadge />}
        <span className="text-ink-muted">
          Traveller revision {record.revision}
          {record.voidRevisions.length > 0 &&
            ` (void: ${record.voidRevisions.map((v) => `rev ${v}`).join(", ")})`}
        </span>
      </div>
      <section aria-labelledby="ab-design" className="card p-5">
        <h2 id="ab-design" className="mb-3 text-lg font-semibold">
          Built to (frozen design and evaluation)
        </h2>
        {record.shaft.application?.description && (
          <p className="mb-3">{record.shaft.application.description}</p>
        )}
        <dl className="grid gap-x-6 gap-y-2 sm:grid-cols-2">
          {summary.map(([k, v]) => (
            <div key={k}>
              <dt className="text-sm text-ink-muted">{k}</dt>
              <dd className="font-semibold">{v}</dd>
            </div>
          ))}
        </dl>
        {record.retube && (
          <RetubeSummary retube={record.retube} shaftName={record.shaft.name} units={units} />
        )}
        {checks.length > 0 && (
          <ul className="mt-4 list-disc space-y-1 pl-5 text-sm">
            {checks.map((c) => (
              <li key={c.id}>
                <span className="font-semibold uppercase">{c.status}</span> {c.message}
              </li>
            ))}
          </ul>
        )}
        {(r.cautions ?? []).length > 0 && (
          <ul className="mt-3 list-disc space-y-1 pl-5 text-sm text-warn">
            {(r.cautions ?? []).map((c) => (
              <li key={typeof c === "string" ? c : JSON.stringify(c)}>
                {typeof c === "string" ? c : (c as { message?: string }).message}
              </li>
            ))}
          </ul>
        )}
      </section>
      {afterDesign}
      <section aria-labelledby="ab-steps">
        <h2 id="ab-steps" className="mb-3 text-lg font-semibold">
          Steps and measurements
        </h2>
        <ol className="space-y-3">
          {record.steps.map((s) => {
            const records = audience === "staff" ? s.records : s.records.filter((x) => x.outcome !== "hold");
            return (
              <li key={s.code} className="card p-4">
                <div className="flex flex-wrap items-baseline justify-between gap-2">
                  <h3 className="text-lg font-semibold">
                    {s.position}. {s.spec.name}
                  </h3>
                  <span className="text-sm text-ink-muted">
                    {s.state === "done" && s.completedAt ? (
                      <>
                        Signed off <ShopTime at={s.completedAt.toISOString()} />
                      </>
                    ) : s.state === "on_hold" && audience === "staff" ? (
                      "On hold"
                    ) : (
                      "Not yet"
                    )}
                  </span>
                </div>
                {records.length > 0 && (
                  <ul className="mt-2 space-y-3">
                    {records.map((rec, i) => (
                      <li key={i} className="border-t border-line pt-2">
                        <p className="text-sm">
                          <span
                            className={`mr-2 rounded-full px-2 py-0.5 text-xs font-semibold ${OUTCOME[rec.outcome]?.tone}`}
                          >
                            {OUTCOME[rec.outcome]?.label ?? rec.outcome}
                          </span>
                          {rec.byName ?? "—"} · <ShopTime at={rec.at.toISOString()} />
                        </p>
                        <dl className="mt-1 grid gap-x-6 gap-y-1 text-sm sm:grid-cols-2">
                          {Object.entries(rec.values).map(([key, value]) => {
                            const field = s.spec.fields.find((f) => f.key === key);
                            const failed = rec.failures.some((f) => f.key === key);
                            return (
                              <div key={key} className="flex justify-between gap-3">
                                <dt className="text-ink-muted">{field?.label ?? key}</dt>
                                <dd className={`font-mono ${failed ? "font-bold text-fail" : ""}`}>
                                  {shownValue(field, value, units)}
                                  {failed ? " (out of limit)" : ""}
                                </dd>
                              </div>
                            );
                          })}
                        </dl>
                        {rec.reason && <p className="mt-1 text-sm">Reason: {rec.reason}</p>}
                      </li>
                    ))}
                  </ul>
                )}
              </li>
            );
          })}
        </ol>
      </section>
    </div>
  );
}
