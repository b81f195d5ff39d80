import "server-only";
import { RETUBE_PARTS, RETUBE_PART_LABEL, type RepairBlock } from "@/lib/retube/intake";
import { Order, type WarningAcknowledgement } from "@/entities";
import type { OrderStatus } from "./states";
import type { AcknowledgementView, OrderRow, OrderView, RetubeView, ShaftView } from "./views";
import type { EntityManager } from "@mikro-orm/postgresql";
import type { CurrentUser } from "@/lib/auth/guard";
import type { QuoteLine } from "@/lib/pricing/price-book";
import type { EvaluationReport } from "@/lib/driveline";
import { seesAllOrders } from "./access";
import { orderStatusLabel, type FloorProgress } from "./labels";
import { nextPaymentKind, amountDue } from "./payments";
import { needsEngineeringSignoff } from "./acknowledgements";
import { notesFor } from "./notes";
import { frozenChecks } from "./engineering-signoff";
import { shopToday } from "@/lib/shop/locale";

export type { AcknowledgementView, OrderRow, OrderView, RetubeView, ShaftView } from "./views";

/** The least advanced shaft's step of its step count, once released (work orders populated). */
function floorProgress(o: Order): FloorProgress | null {
  if (!o.workOrders.isInitialized() || o.workOrders.length === 0) return null;
  const wos = o.workOrders.getItems();
  const least = wos.reduce((a, b) => (b.currentPosition < a.currentPosition ? b : a));
  return {
    k: Math.min(least.currentPosition, least.stepCount),
    n: least.stepCount,
    onHold: wos.some((w) => w.state === "on_hold"),
  };
}

function toRow(o: Order, today: string, staff: boolean): OrderRow {
  const floor = floorProgress(o);
  return {
    id: o.id,
    number: o.number,
    customerName: o.customer.name,
    createdAt: o.createdAt.toISOString(),
    promisedDate: o.promisedDate,
    status: o.status,
    paymentState: o.paymentState,
    totalCents: o.totalCents,
    paidCents: o.paidCents,
    currency: o.currency,
    shafts: o.shafts.isInitialized() ? o.shafts.getItems().map((s) => s.name) : [],
    channel: o.channel,
    late: !["shipped", "cancelled"].includes(o.status) && o.promisedDate < today,
    statusLabel: orderStatusLabel(o.status, o.fulfilment, floor, staff),
    onHold: staff && (floor?.onHold ?? false),
  };
}

/** The orders a user may list: a customer's own, newest first; staff see every order, the soonest promise first. */
export async function listOrders(
  em: EntityManager,
  user: CurrentUser,
  filter: { open?: boolean } = {},
): Promise<OrderRow[]> {
  const all = seesAllOrders(user);
  const where = {
    ...(all ? {} : { customer: { user: user.id } }),
    ...(filter.open ? { status: { $nin: ["shipped", "cancelled"] as OrderStatus[] } } : {}),
  };
  const orders = await em.find(Order, where, {
    populate: ["customer", "shafts", "workOrders"],
    orderBy: all ? { promisedDate: "asc", createdAt: "asc" } : { createdAt: "desc" },
    limit: 200,
  });
  const today = await shopToday();
  return orders.map((o) => toRow(o, today, all));
}

/** A re-tube's intake as plain data for the screens. */
export function retubeView(repair: RepairBlock | null | undefined): RetubeView | null {
  if (!repair) return null;
  return {
    weldToWeldMm: repair.weldToWeldMm,
    parts: RETUBE_PARTS.map((part) => ({
      part,
      label: RETUBE_PART_LABEL[part],
      reuse: repair.parts[part].reuse,
      note: repair.parts[part].note,
    })),
    recordedBy: repair.recordedBy.name,
    recordedAt: repair.recordedAt,
  };
}

const fmt = (n: unknown, digits = 0, unit = "") =>
  typeof n === "number" && Number.isFinite(n) ? `${n.toFixed(digits)}${unit}` : "—";

/** What a shaft view is built from: an ordered shaft, or a quoted design. */
export interface ShaftSource {
  id: string;
  position: number;
  name: string;
  application?: { description: string; use: string } | null;
  overall: string;
  priceLines: QuoteLine[];
  priceCents: number;
  evaluation: unknown;
  warningAcknowledgements?: WarningAcknowledgement[];
  failedCheckAcceptances?: { checkId: string }[];
  /** A re-tube's intake (an ordered re-tube, or a quoted draft with one). */
  repair?: RepairBlock | null;
}

/** A two-piece shaft's key numbers: the centre bearing, and each piece's cut length, index and balance (null for one piece). */
function twoPieceFacts(r: Partial<EvaluationReport>): ShaftView["facts"] | null {
  if (r.layout !== "two-piece") return null;
  const pieces = r.pieces ?? [];
  const each = (f: (p: (typeof pieces)[number]) => string) =>
    pieces.map((p) => `${p.piece} ${f(p)}`).join(" / ");
  return [
    { label: "Installed length", value: fmt(r.lengthMm, 1, " mm") },
    {
      label: "Two pieces, centre bearing",
      value: r.centreBearing
        ? `${r.centreBearing.bearingId} at ${fmt(r.centreBearing.fromFrontMm, 1, " mm")} from the front`
        : "—",
    },
    { label: "Cut lengths", value: each((p) => fmt(p.cutLengthMm, 1, " mm")) },
    {
      label: "Tube",
      value: r.tube ? `${fmt(r.tube.odMm, 1)} × ${fmt(r.tube.wallMm, 2)} mm ${r.tube.materialId}` : "—",
    },
    {
      label: "Working angles (front / centre / rear)",
      value: r.joints ? r.joints.map((j) => fmt(j.workingAngleDeg, 2, "°")).join(" / ") : "—",
    },
    { label: "Rear yoke indices", value: each((p) => fmt(p.phaseIndexDeg, 1, "°")) },
    { label: "Critical speed (each piece)", value: each((p) => fmt(p.criticalSpeedRpm, 0, " rpm")) },
    { label: "Torsion safety factor", value: fmt(r.torsion?.safetyFactor, 2) },
    {
      label: "Balance (per plane)",
      value: `${each((p) => fmt(p.balance.perPlaneGmm, 0, " g·mm"))} at G ${fmt(r.balance?.gradeMmS, 1)}`,
    },
  ];
}

/** A shaft's key numbers, checks and price, as plain data for the screens. */
export function shaftView(s: ShaftSource): ShaftView {
  // A frozen EvaluationReport; read defensively, since an older order may predate a field.
  const r = s.evaluation as Partial<EvaluationReport>;
  return {
    id: s.id,
    position: s.position,
    name: s.name,
    application: s.application ?? null,
    overall: s.overall,
    priceLines: s.priceLines,
    priceCents: s.priceCents,
    facts: twoPieceFacts(r) ?? [
      { label: "Installed length", value: fmt(r.lengthMm, 1, " mm") },
      s.repair
        ? { label: "Cut length (re-tube)", value: `${fmt(s.repair.weldToWeldMm, 1, " mm")} weld-to-weld` }
        : { label: "Cut length", value: fmt(r.cutLengthMm, 1, " mm") },
      {
        label: "Tube",
        value: r.tube ? `${fmt(r.tube.odMm, 1)} × ${fmt(r.tube.wallMm, 2)} mm ${r.tube.materialId}` : "—",
      },
      {
        label: "Working angles",
        value: r.joints ? r.joints.map((j) => fmt(j.workingAngleDeg, 2, "°")).join(" / ") : "—",
      },
      { label: "Rear yoke index", value: fmt(r.phasing?.phaseIndexDeg, 1, "°") },
      {
        label: "Critical speed",
        value: `${fmt(r.criticalSpeedRpm, 0, " rpm")} (service ${fmt((r.criticalSpeedRatio ?? NaN) * 100, 0, " %")})`,
      },
      { label: "Torsion safety factor", value: fmt(r.torsion?.safetyFactor, 2) },
      {
        label: "Balance (per plane)",
        value: `${fmt(r.balance?.perPlaneGmm, 0, " g·mm")} at G ${fmt(r.balance?.gradeMmS, 1)}`,
      },
    ],
    checks: (r.checks ?? []).map((c) => ({ id: c.id, status: c.status, message: c.message })),
    cautions: [...(r.cautions ?? [])],
    warningAcknowledgements: (s.warningAcknowledgements ?? []).map((a): AcknowledgementView => ({
      checkId: a.checkId,
      message: a.message,
      byName: a.byName,
      channel: a.channel,
      at: a.at,
    })),
    needsSignoff: needsEngineeringSignoff(r.checks ?? [], s.failedCheckAcceptances),
    retube: retubeView(s.repair),
  };
}

/**
 * Everything an order page shows, as plain data. Customers see only public timeline entries.
 * `today` is the shop's date (`shopToday()`), from which "late" is counted.
 */
export function orderView(order: Order, user: CurrentUser, today: string): OrderView {
  const staff = seesAllOrders(user);
  const kind = nextPaymentKind(order);
  return {
    ...toRow(order, today, staff),
    customerEmail: order.customer.email,
    fulfilment: order.fulfilment,
    shipTo: order.shipTo ?? null,
    notes: order.notes ?? null,
    subtotalCents: order.subtotalCents,
    taxCents: order.taxCents,
    shippingCents: order.shippingCents,
    depositCents: order.depositCents,
    refundedCents: order.refundedCents,
    shaftViews: order.shafts.getItems().map(shaftView),
    payments: order.payments.getItems().map((p) => ({
      id: p.id,
      kind: p.kind,
      amountCents: p.amountCents,
      status: p.status,
      refundedCents: p.refundedCents,
      createdAt: p.createdAt.toISOString(),
      paidAt: p.paidAt?.toISOString() ?? null,
      failureMessage: p.failureMessage ?? null,
      checkoutUrl: p.checkoutUrl ?? null,
      method: p.method,
      reference: p.reference ?? null,
    })),
    shopNotes: order.orderNotes.isInitialized() ? notesFor(order.orderNotes.getItems(), staff) : [],
    needsSignoff:
      order.status !== "cancelled" &&
      order.shafts.getItems().some((s) => needsEngineeringSignoff(frozenChecks(s), s.failedCheckAcceptances)),
    cancelReason: order.cancelReason ?? null,
    events: order.events
      .getItems()
      .filter((e) => staff || e.public)
      .map((e) => ({ id: e.id, at: e.at.toISOString(), kind: e.kind, label: e.label })),
    due: kind ? { kind, amountCents: amountDue(order, kind) } : null,
    asBuiltReady:
      (order.status === "ready" || order.status === "shipped") &&
      order.workOrders.isInitialized() &&
      order.workOrders.length > 0,
  };
}

/** Loads everything an order page needs in one go. */
export async function populateOrder(em: EntityManager, order: Order): Promise<Order> {
  await em.populate(order, ["customer", "shafts", "payments", "events", "workOrders", "orderNotes"]);
  return order;
}
