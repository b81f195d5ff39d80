import type { Metadata } from "next";
import { requirePermission } from "@/lib/auth/guard";
import { getShopEngineering } from "@/lib/shop/config";
import { formatMoney } from "@/lib/pricing/price-book";
import { mmToIn, type SettingKey } from "@/lib/driveline";
import { PageHeader } from "@/components/ui/page-header";
import { Alert } from "@/components/ui/alert";
import { CELL, TableCard } from "@/components/ui/table-card";

export const metadata: Metadata = { title: "Catalogue & prices" };

/** Inches for the trade's customary sizes, converted at the edge. */
const inchesFromMm = (mm: number, digits: number) => `${mmToIn(mm).toFixed(digits)} in`;
const num = (n: number, digits = 1) =>
  n.toLocaleString("en-US", { minimumFractionDigits: digits, maximumFractionDigits: digits });

/** Names people read for each limit, with its unit. */
const LIMIT_LABEL: Record<SettingKey, string> = {
  minWorkingAngleDeg: "Smallest working angle (°)",
  maxAngleDifferenceDeg: "Largest front/rear angle difference (°)",
  maxJointAngularAccelerationRadS2: "Largest angular acceleration per joint (rad/s²)",
  accelerationWarnFraction: "Warn from this share of the acceleration limit",
  maxEquivalentAngleDeg: "Largest equivalent angle (°)",
  maxCriticalSpeedRatio: "Largest service / critical speed",
  warnCriticalSpeedRatio: "Warn from service / critical speed",
  minTorsionSafetyFactor: "Smallest torsion safety factor",
  balanceGradeMmS: "Balance grade G (mm/s)",
  slipOutMinMm: "Slip yoke out at ride height, least (mm)",
  slipOutMaxMm: "Slip yoke out at ride height, most (mm)",
  slipMinReserveMm: "Spline engagement kept at full droop (mm)",
  lengthToleranceMm: "Length tolerance after welding, ± (mm)",
  runoutEndsMm: "Runout near each end, TIR (mm)",
  runoutCentreMm: "Runout at the centre, TIR (mm)",
  phasingToleranceDeg: "Phasing tolerance, ± (°)",
  centreJointAngleDeg: "Centre-bearing joint angle (°)",
};

/** What the shop engineers and prices with: materials, tubes, end fittings, joints, limits, price book. */
export default async function CataloguePage() {
  await requirePermission("shop.manage", "/overview/catalogue");
  const { catalogue, settings, settingOverrides, priceBook } = await getShopEngineering();
  const material = new Map(catalogue.materials.map((m) => [m.id, m.name]));
  const money = (cents: number) => formatMoney(cents, priceBook.currency);
  return (
    <>
      <PageHeader
        title="Catalogue & prices"
        description="What every design is engineered and priced with. Changes apply to new quotes; placed orders keep the copy they were priced with."
      />
      {catalogue.demo && (
        <div className="mb-6">
          <Alert tone="warning" title="Demonstration catalogue">
            These parts, ratings and prices are invented for the demo shop. Replace them with your own stock
            and the makers’ ratings before quoting real work.
          </Alert>
        </div>
      )}
      <div className="space-y-8">
        <section aria-labelledby="policy" className="space-y-3">
          <h2 id="policy" className="text-lg font-semibold">
            Price book and payment policy
          </h2>
          <dl className="grid grid-cols-2 gap-4 card p-5 text-sm md:grid-cols-3 xl:grid-cols-5">
            {[
              ["Labour per shaft", money(priceBook.labourPerShaftCents)],
              ["Balancing per shaft", money(priceBook.balancingPerShaftCents)],
              ["Shipping per shaft", money(priceBook.shippingCents)],
              ["Tax", `${num(priceBook.taxRatePercent, 2)} %`],
              ["Tube allowance", `${priceBook.tubeAllowanceMm} mm per cut`],
              ["Shortest tube charged", `${priceBook.minimumTubeChargeMm} mm`],
              [
                "Asked up front",
                priceBook.depositPercent >= 100 ? "Full payment" : `${priceBook.depositPercent} % deposit`,
              ],
              ["Lead time", `${priceBook.leadTimeWorkingDays} working days`],
              ["Tube Yokeline picks", `The ${priceBook.tubePreference} that passes every check`],
            ].map(([label, value]) => (
              <div key={label}>
                <dt className="text-ink-muted">{label}</dt>
                <dd className="font-semibold">{value}</dd>
              </div>
            ))}
          </dl>
        </section>

        <section aria-labelledby="limits" className="space-y-3">
          <h2 id="limits" className="text-lg font-semibold">
            Engineering limits
          </h2>
          <TableCard
            caption="Engineering limits with their sources"
            headings={["Limit", { label: "Value", align: "right" }, "Source"]}
          >
            {(Object.entries(settings) as [SettingKey, (typeof settings)[SettingKey]][]).map(
              ([key, limit]) => (
                <tr key={key}>
                  <td className={CELL}>{LIMIT_LABEL[key]}</td>
                  <td className={`${CELL} text-right whitespace-nowrap tabular-nums`}>
                    {limit.value}
                    {key in settingOverrides && <span className="ml-1 text-xs text-brass-700">(shop)</span>}
                  </td>
                  <td className={CELL}>{limit.source}</td>
                </tr>
              ),
            )}
          </TableCard>
        </section>

        <section aria-labelledby="materials" className="space-y-3">
          <h2 id="materials" className="text-lg font-semibold">
            Materials
          </h2>
          <TableCard
            caption="Tube materials"
            headings={[
              "Material",
              { label: "E (GPa)", align: "right" },
              { label: "Density (kg/m³)", align: "right" },
              { label: "Yield (MPa)", align: "right" },
              { label: "Shear yield (MPa)", align: "right" },
              "Source",
            ]}
          >
            {catalogue.materials.map((m) => (
              <tr key={m.id}>
                <td className={`${CELL} font-medium`}>{m.name}</td>
                <td className={`${CELL} text-right whitespace-nowrap tabular-nums`}>
                  {num(m.elasticModulusGPa)}
                </td>
                <td className={`${CELL} text-right whitespace-nowrap tabular-nums`}>
                  {num(m.densityKgM3, 0)}
                </td>
                <td className={`${CELL} text-right whitespace-nowrap tabular-nums`}>
                  {num(m.tensileYieldMPa, 0)}
                </td>
                <td className={`${CELL} text-right whitespace-nowrap tabular-nums`}>
                  {num(m.shearYieldMPa, 0)}
                </td>
                <td className={CELL}>{m.source}</td>
              </tr>
            ))}
          </TableCard>
        </section>

        <section aria-labelledby="tubes" className="space-y-3">
          <h2 id="tubes" className="text-lg font-semibold">
            Tubes ({catalogue.tubes.length})
          </h2>
          <TableCard
            caption="Tube sizes in stock"
            headings={[
              "Part",
              "Material",
              { label: "OD", align: "right" },
              { label: "Wall", align: "right" },
              { label: "Longest piece", align: "right" },
              { label: "Price per metre", align: "right" },
            ]}
          >
            {catalogue.tubes.map((t) => (
              <tr key={t.id}>
                <td className={`${CELL} font-mono text-xs`}>{t.id}</td>
                <td className={CELL}>{material.get(t.materialId) ?? t.materialId}</td>
                <td className={`${CELL} text-right whitespace-nowrap tabular-nums`}>
                  {num(t.odMm)} mm <span className="text-ink-muted">({inchesFromMm(t.odMm, 3)})</span>
                </td>
                <td className={`${CELL} text-right whitespace-nowrap tabular-nums`}>
                  {num(t.wallMm, 2)} mm <span className="text-ink-muted">({inchesFromMm(t.wallMm, 3)})</span>
                </td>
                <td className={`${CELL} text-right whitespace-nowrap tabular-nums`}>
                  {num(t.maxLengthMm, 0)} mm
                </td>
                <td className={`${CELL} text-right whitespace-nowrap tabular-nums`}>
                  {money(t.pricePerMetreCents)}
                </td>
              </tr>
            ))}
          </TableCard>
        </section>

        <section aria-labelledby="fittings" className="space-y-3">
          <h2 id="fittings" className="text-lg font-semibold">
            End fittings ({catalogue.endFittings.length})
          </h2>
          <TableCard
            caption="End fittings"
            headings={[
              "Fitting",
              "Joint series",
              { label: "Tube OD", align: "right" },
              { label: "Joint centre to weld seat", align: "right" },
              { label: "Mass", align: "right" },
              { label: "Torque rating", align: "right" },
              { label: "Price", align: "right" },
            ]}
          >
            {catalogue.endFittings.map((f) => (
              <tr key={f.id}>
                <td className={CELL}>
                  <span className="block font-medium">{f.name}</span>
                  <span className="font-mono text-xs text-ink-muted">{f.id}</span>
                </td>
                <td className={CELL}>{f.jointSeriesId}</td>
                <td className={`${CELL} text-right whitespace-nowrap tabular-nums`}>{num(f.tubeOdMm)} mm</td>
                <td className={`${CELL} text-right whitespace-nowrap tabular-nums`}>
                  {num(f.jointCentreToWeldSeatMm)} mm
                </td>
                <td className={`${CELL} text-right whitespace-nowrap tabular-nums`}>{num(f.massKg, 2)} kg</td>
                <td className={`${CELL} text-right whitespace-nowrap tabular-nums`}>
                  {num(f.torqueRatingNm, 0)} N·m
                </td>
                <td className={`${CELL} text-right whitespace-nowrap tabular-nums`}>{money(f.priceCents)}</td>
              </tr>
            ))}
          </TableCard>
        </section>

        <section aria-labelledby="joints" className="space-y-3">
          <h2 id="joints" className="text-lg font-semibold">
            Universal joints
          </h2>
          <TableCard
            caption="Universal joint series"
            headings={[
              "Series",
              { label: "Torque rating", align: "right" },
              { label: "Largest working angle", align: "right" },
              { label: "Price", align: "right" },
            ]}
          >
            {catalogue.jointSeries.map((j) => (
              <tr key={j.id}>
                <td className={`${CELL} font-medium`}>{j.name}</td>
                <td className={`${CELL} text-right whitespace-nowrap tabular-nums`}>
                  {num(j.torqueRatingNm, 0)} N·m
                </td>
                <td className={`${CELL} text-right whitespace-nowrap tabular-nums`}>
                  {num(j.maxWorkingAngleDeg)}°
                </td>
                <td className={`${CELL} text-right whitespace-nowrap tabular-nums`}>{money(j.priceCents)}</td>
              </tr>
            ))}
          </TableCard>
        </section>
      </div>
    </>
  );
}
