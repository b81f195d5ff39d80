import "server-only";
import type { EntityManager } from "@mikro-orm/postgresql";
import { USES, type Use } from "@/lib/driveline/schema";
import { Customer, Design, Order, OrderEvent, OrderShaft, User } from "@/entities";
import { AccessError, type CurrentUser } from "@/lib/auth/access";
import { can } from "@/lib/auth/permissions";
import { recordAudit } from "@/lib/audit";
import { inTransaction } from "@/lib/db/orm";
import { evaluateDesign, parseDesign, type EvaluationReport } from "@/lib/driveline";
import { AppError } from "@/lib/http/errors";
import {
  promisedDate,
  quoteOrder,
  quoteShaft,
  type OrderQuote,
  type QuoteLine,
} from "@/lib/pricing/price-book";
import { getShopEngineering, type ShopEngineering } from "@/lib/shop/config";
import { linkCustomerToUser } from "@/lib/customers";
import { afterCommit, notifyOrderReceived } from "./notify";
import type { PlaceOrderBody } from "./schemas";
import {
  failedChecks,
  missingAcknowledgements,
  needsEngineeringSignoff,
  warningsToAcknowledge,
  type AckItem,
} from "./acknowledgements";
import type { WarningAcknowledgement } from "@/entities";
import { retubeCutLengthMm, reusedForPrice } from "@/lib/retube/intake";
import type { Fulfilment } from "./states";

/** What a quote is made from: a saved design, or a design file sent as is. */
export type QuoteSource = Pick<Design, "name" | "design"> &
  Partial<Pick<Design, "id" | "application" | "repair">>;

export interface QuotedShaft<S extends QuoteSource = QuoteSource> {
  design: S;
  report: EvaluationReport;
  lines: QuoteLine[];
  priceCents: number;
}

/**
 * Re-evaluates and prices saved designs with the shop's current catalogue, limits and price
 * book. The browser's own evaluation is never trusted for money or safety.
 */
export function quoteDesigns<S extends QuoteSource>(
  designs: S[],
  shop: ShopEngineering,
  fulfilment: Fulfilment,
): { shafts: QuotedShaft<S>[]; quote: OrderQuote } {
  const shafts = designs.map((design) => {
    const parsed = parseDesign(design.design, { catalogue: shop.catalogue });
    if (!parsed.ok) {
      throw new AppError(
        "invalid",
        `"${design.name}" has fields to fix: ${parsed.issues.map((i) => `${i.path}: ${i.message}`).join("; ")}`,
      );
    }
    // A draft saved before the design file carried `use` still has it on its application.
    const applicationUse = design.application?.use;
    const report = evaluateDesign(parsed.design, {
      catalogue: shop.catalogue,
      settings: shop.settings,
      tubePreference: shop.priceBook.tubePreference,
      ...((USES as readonly string[]).includes(applicationUse ?? "") ? { use: applicationUse as Use } : {}),
    });
    const tubePrice = shop.catalogue.tubes.find((t) => t.id === report.tube.tubeId)?.pricePerMetreCents;
    if (tubePrice === undefined) {
      throw new AppError(
        "invalid",
        `"${design.name}" uses a tube the shop does not stock; the counter will price it by phone.`,
      );
    }
    // A re-tube (the counter's intake on the draft) does not charge the parts reused and adds teardown.
    // Its new tube is cut to the customer's weld-to-weld, so that is the length charged.
    const reused = design.repair ? reusedForPrice(design.repair) : null;
    const priced = design.repair
      ? { ...report, tube: { ...report.tube, tubeLengthMm: retubeCutLengthMm(design.repair) } }
      : report;
    const lines = quoteShaft(priced, shop.priceBook, tubePrice, shop.catalogue.jointSeries, reused);
    return { design, report, lines, priceCents: lines.reduce((s, l) => s + l.totalCents, 0) };
  });
  return {
    shafts,
    quote: quoteOrder(
      shafts.map((s) => s.lines),
      fulfilment,
      shop.priceBook,
    ),
  };
}

/** The customer an order is for: the caller's own record, or (counter) the one they chose. */
async function orderCustomer(
  em: EntityManager,
  user: CurrentUser,
  customerId: string | undefined,
): Promise<Customer> {
  if (customerId && can(user.role, "orders.desk")) {
    const chosen = await em.findOne(Customer, { id: customerId });
    if (!chosen) throw new AppError("not_found", "No such customer.", { customerId: "Choose a customer." });
    return chosen;
  }
  if (can(user.role, "orders.desk"))
    throw new AppError("invalid", "Choose the customer this order is for.", { customerId: "Required." });
  if (!can(user.role, "orders.own")) throw new AccessError(403);
  return (await em.findOne(Customer, { user: user.id })) ?? em.merge(await linkCustomerToUser(user));
}

/** ", a re-tube of your shaft" / ", 2 re-tubes" for the customer's timeline; nothing for new shafts. */
function retubeNote(retubes: number, shafts: number): string {
  if (retubes === 0) return "";
  if (shafts === 1) return ", a re-tube of your shaft";
  return retubes === 1 ? ", 1 re-tube" : `, ${retubes} re-tubes`;
}

async function nextOrderNumber(em: EntityManager, at: Date): Promise<string> {
  const prefix = `Y${String(at.getUTCFullYear()).slice(2)}-`;
  const rows = await em
    .getConnection()
    .execute<{ n: number }[]>(
      `select coalesce(max(substring(number from ${prefix.length + 1})::int), 0) + 1 as n from shop_order where number like ?`,
      [`${prefix}%`],
      "all",
      em.getTransactionContext(),
    );
  return `${prefix}${String(rows[0]?.n ?? 1).padStart(4, "0")}`;
}

/**
 * Checks that every warning of each shaft's fresh evaluation was acknowledged (and, at the counter,
 * every failed check); customers online cannot order a shaft that fails a check. Returns what is
 * stored with each shaft. Refuses with 422 naming `shafts[<i>].acknowledgements` (the house form of a field path).
 */
function checkAcknowledgements(
  shafts: QuotedShaft[],
  body: PlaceOrderBody,
  user: CurrentUser,
  counter: boolean,
  now: Date,
): { warnings: WarningAcknowledgement[]; failures: AckItem[] }[] {
  const failing = shafts.filter((s) => s.report.overall === "fail");
  if (failing.length > 0 && !counter) {
    throw new AppError(
      "invalid",
      `A shaft that fails a check cannot be ordered online: ${failing.map((s) => `"${s.design.name}"`).join(", ")}. Fix it in the shaft builder, or phone the shop.`,
    );
  }
  const fields: Record<string, string> = {};
  const out = shafts.map((s, i) => {
    const given = body.shafts?.[i]?.acknowledgements ?? [];
    const warnings = warningsToAcknowledge(s.report.checks);
    const failures = counter ? failedChecks(s.report.checks) : [];
    const missing = missingAcknowledgements([...failures, ...warnings], given);
    if (missing.length > 0) {
      fields[`shafts[${i}].acknowledgements`] =
        `Acknowledge each ${missing.some((m) => m.status === "fail") ? "failed check and warning" : "warning"} of "${s.design.name}": ${missing.map((m) => m.message).join("; ")}`;
    }
    return {
      failures,
      warnings: warnings.map((w): WarningAcknowledgement => ({
        checkId: w.checkId,
        message: w.message,
        byUserId: user.id,
        byName: user.name,
        channel: counter ? "counter" : "online",
        at: now.toISOString(),
      })),
    };
  });
  const missingCount = Object.keys(fields).length;
  if (missingCount > 0) {
    throw new AppError(
      "invalid",
      `Acknowledge each warning before ordering (${missingCount === 1 ? "one shaft has" : `${missingCount} shafts have`} some not yet acknowledged).`,
      fields,
    );
  }
  return out;
}

/**
 * Places an order: each shaft keeps a frozen copy of its design, evaluation and price; the
 * order gets its promised date from the lead time and what the policy asks up front.
 */
export async function placeOrder(user: CurrentUser, body: PlaceOrderBody): Promise<Order> {
  const shop = await getShopEngineering();
  const order = await inTransaction(async (em) => {
    // Orders are numbered in sequence; one placement at a time keeps the numbers unique.
    await em
      .getConnection()
      .execute("select pg_advisory_xact_lock(7301)", [], "all", em.getTransactionContext());
    const customer = await orderCustomer(em, user, body.customerId);
    const designs = await em.find(Design, { id: { $in: body.designIds }, customer });
    if (designs.length !== new Set(body.designIds).size)
      throw new AppError("not_found", "One of those designs is not yours or no longer exists.");
    const ordered = body.designIds.map((id) => designs.find((d) => d.id === id)!);

    const { shafts, quote } = quoteDesigns(ordered, shop, body.fulfilment);
    const counter = can(user.role, "orders.desk");
    const now = new Date();
    const acknowledgements = checkAcknowledgements(shafts, body, user, counter, now);
    const order = em.create(Order, {
      number: await nextOrderNumber(em, now),
      customer,
      placedBy: em.getReference(User, user.id),
      channel: counter ? "counter" : "online",
      status: "awaiting_payment",
      paymentState: "unpaid",
      fulfilment: body.fulfilment,
      shipTo: body.fulfilment === "ship" ? (body.shipTo ?? null) : null,
      currency: quote.currency,
      subtotalCents: quote.subtotalCents,
      taxCents: quote.taxCents,
      shippingCents: quote.shippingCents,
      totalCents: quote.totalCents,
      depositCents: quote.dueNowCents,
      promisedDate: promisedDate(now, shop.priceBook.leadTimeWorkingDays),
      configVersion: shop.version,
      notes: body.notes ?? null,
      createdAt: now,
      updatedAt: now,
    });
    shafts.forEach((s, i) =>
      em.create(OrderShaft, {
        order,
        position: i + 1,
        name: s.design.name,
        application: s.design.application ?? null,
        design: s.design.design,
        evaluation: JSON.parse(JSON.stringify(s.report)) as Record<string, unknown>,
        overall: s.report.overall,
        priceLines: s.lines,
        priceCents: s.priceCents,
        warningAcknowledgements: acknowledgements[i]!.warnings,
        job: s.design.repair ? "retube" : "new",
        repair: s.design.repair ?? null,
      }),
    );
    const retubes = shafts.filter((s) => s.design.repair).length;
    const signoff = shafts.filter((s) => needsEngineeringSignoff(s.report.checks));
    em.create(OrderEvent, {
      order,
      kind: "received",
      label: `Order received (${shafts.length} shaft${shafts.length === 1 ? "" : "s"}${retubeNote(retubes, shafts.length)})`,
      actor: em.getReference(User, user.id),
      at: now,
    });
    if (signoff.length > 0) {
      em.create(OrderEvent, {
        order,
        kind: "note",
        label: `Placed by the counter with a failed check (${signoff.map((s) => s.design.name).join(", ")}): needs the owner's engineering sign-off`,
        actor: em.getReference(User, user.id),
        at: now,
        public: false,
      });
    }
    await recordAudit(
      {
        actorId: user.id,
        action: "order.place",
        subjectType: "order",
        subjectId: order.id,
        details: {
          number: order.number,
          totalCents: order.totalCents,
          // What was acknowledged on ordering: warnings (also kept on each shaft) and, at the counter, failures.
          acknowledged: acknowledgements.map((a, i) => ({
            position: i + 1,
            warnings: a.warnings.map((w) => w.checkId),
            failures: a.failures.map((f) => f.checkId),
          })),
          needsEngineeringSignoff: signoff.length > 0,
          // Re-tubes: the counter's intake frozen on the shaft (parts reused are not charged).
          retubes: shafts.flatMap((s, i) =>
            s.design.repair
              ? [
                  {
                    position: i + 1,
                    weldToWeldMm: s.design.repair.weldToWeldMm,
                    parts: s.design.repair.parts,
                  },
                ]
              : [],
          ),
        },
      },
      em,
    );
    await notifyOrderReceived(em, order);
    return order;
  });
  await afterCommit();
  return order;
}
