import "server-only";
/**
 * The customer's papers of an order (lib/traveller/papers.ts draws them): the install sheet from
 * the frozen evaluations and the shop's catalogue, and the as-built certificate from each shaft's
 * records once final inspection has passed on every shaft. The caller has already scoped the
 * order to the user (loadOrderForUser).
 */
import type { EntityManager } from "@mikro-orm/postgresql";
import { OrderShaft, Shop, WorkOrder, type Order } from "@/entities";
import type { EvaluationReport } from "@/lib/driveline/report";
import { AppError } from "@/lib/http/errors";
import { getShopEngineering } from "@/lib/shop/config";
import {
  renderAsBuiltCertificate,
  renderInstallSheet,
  type AsBuiltView,
  type InstallEnd,
  type InstallSheetView,
  type PapersHeader,
} from "@/lib/traveller/papers";
import { asBuiltRecord } from "./queries";

async function headerFor(em: EntityManager, order: Order): Promise<PapersHeader> {
  await em.populate(order, ["customer"]);
  const [shop, engineering] = await Promise.all([em.findOne(Shop, { id: 1 }), getShopEngineering()]);
  return {
    shop: {
      name: shop?.name ?? "Yokeline",
      phone: shop?.phone ?? null,
      timeZone: engineering.priceBook.timeZone,
    },
    order: { number: order.number, customerName: order.customer.name, fulfilment: order.fulfilment },
    units: engineering.floor.units,
    paperSize: engineering.floor.paperSize,
  };
}

/** The install sheet's data: each shaft's ends with their torques as the catalogue gives them. */
export async function installSheetView(em: EntityManager, order: Order): Promise<InstallSheetView> {
  const [head, shafts, wos, { catalogue }] = await Promise.all([
    headerFor(em, order),
    em.find(OrderShaft, { order: order.id }, { orderBy: { position: "asc" } }),
    em.find(WorkOrder, { order: order.id }),
    getShopEngineering(),
  ]);
  return {
    ...head,
    shafts: shafts.map((s) => {
      const report = s.evaluation as unknown as EvaluationReport;
      const ends: InstallEnd[] = (["front", "rear"] as const).flatMap((position) => {
        const end = report.ends?.[position];
        if (!end) return [];
        const fitting = catalogue.endFittings.find((x) => x.id === end.fittingId);
        const series = catalogue.jointSeries.find((x) => x.id === end.jointSeriesId);
        return [
          {
            position,
            fittingName: end.name,
            fittingId: end.fittingId,
            kind: end.kind,
            jointSeriesId: end.crossSeriesId ?? end.jointSeriesId,
            strap:
              series?.strapTorqueNm != null
                ? { nm: series.strapTorqueNm, source: series.strapTorqueSource ?? "shop catalogue" }
                : null,
            fastener:
              fitting?.fastenerTorqueNm != null
                ? { nm: fitting.fastenerTorqueNm, source: fitting.fastenerTorqueSource ?? "shop catalogue" }
                : null,
          },
        ];
      });
      return {
        serial: wos.find((w) => w.orderShaft.id === s.id)?.serial ?? null,
        name: s.name,
        position: s.position,
        count: shafts.length,
        application: s.application ?? null,
        report,
        ends,
      };
    }),
  };
}

/** The as-built certificate's data; 409 until final inspection has passed on every shaft. */
export async function asBuiltView(em: EntityManager, order: Order): Promise<AsBuiltView> {
  const [head, wos, count] = await Promise.all([
    headerFor(em, order),
    em.find(WorkOrder, { order: order.id }, { orderBy: { serialSequence: "asc" } }),
    em.count(OrderShaft, { order: order.id }),
  ]);
  const records = await Promise.all(wos.map((w) => asBuiltRecord(em, w.serial)));
  const passed = (r: (typeof records)[number]) =>
    r.steps.some((s) => s.spec.kind === "final-inspection" && s.state === "done");
  if (!records.length || records.length < count || !records.every(passed))
    throw new AppError(
      "conflict",
      `The as-built certificate of order ${order.number} is issued once final inspection has passed on every shaft.`,
    );
  const shafts = await em.find(OrderShaft, { order: order.id }, { orderBy: { position: "asc" } });
  return {
    ...head,
    shafts: records.map((r, i) => {
      const shaft = shafts.find((s) => s.id === wos[i]!.orderShaft.id)!;
      return {
        serial: r.serial,
        revision: r.revision,
        name: r.shaft.name,
        position: shaft.position,
        count,
        application: r.shaft.application,
        report: r.evaluation as unknown as EvaluationReport,
        steps: r.steps.map((s) => {
          const done = s.records.findLast((x) => x.outcome !== "hold");
          return {
            spec: s.spec,
            completion: s.completion ?? null,
            completedAt: s.completedAt,
            byName: done?.byName ?? null,
            values: done?.values ?? {},
            reason: done?.reason ?? null,
          };
        }),
      };
    }),
  };
}

export async function installSheetPdf(em: EntityManager, order: Order): Promise<Uint8Array> {
  return renderInstallSheet(await installSheetView(em, order));
}

export async function asBuiltPdf(em: EntityManager, order: Order): Promise<Uint8Array> {
  return renderAsBuiltCertificate(await asBuiltView(em, order));
}
