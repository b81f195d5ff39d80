import { AuditEvent, Customer, Order, Payment, User } from "@/entities";
import { getEm } from "@/lib/db/orm";

export interface OverviewFigures {
  openOrders: number;
  lateOrders: number;
  awaitingPayment: number;
  customers: number;
  staff: number;
  /** Money taken in the last 30 days, and still owed on open orders (cents). */
  takenLast30DaysCents: number;
  outstandingCents: number;
  recent: { id: string; at: string; actor: string; action: string; subject: string }[];
}

const OPEN = { status: { $nin: ["shipped", "cancelled"] } } as const;

/** What the owner sees first: orders in hand, lateness, money, and the latest audit entries. */
export async function overviewFigures(): Promise<OverviewFigures> {
  const em = await getEm();
  const today = new Date().toISOString().slice(0, 10);
  const since = new Date(Date.now() - 30 * 86_400_000);
  const [openOrders, lateOrders, awaitingPayment, customers, staff, taken, open, events] = await Promise.all([
    em.count(Order, OPEN),
    em.count(Order, { ...OPEN, promisedDate: { $lt: today } }),
    em.count(Order, { status: "awaiting_payment" }),
    em.count(Customer, {}),
    em.count(User, { role: { $ne: "customer" } }),
    em.find(
      Payment,
      { status: "succeeded", paidAt: { $gte: since } },
      { fields: ["amountCents", "refundedCents"] },
    ),
    em.find(Order, OPEN, { fields: ["totalCents", "paidCents"] }),
    em.find(AuditEvent, {}, { orderBy: { at: "desc" }, limit: 10, populate: ["actor"] }),
  ]);
  return {
    openOrders,
    lateOrders,
    awaitingPayment,
    customers,
    staff,
    takenLast30DaysCents: taken.reduce((s, p) => s + p.amountCents - p.refundedCents, 0),
    outstandingCents: open.reduce((s, o) => s + Math.max(0, o.totalCents - o.paidCents), 0),
    recent: events.map((e) => ({
      id: e.id,
      at: e.at.toISOString(),
      actor: e.actor?.name ?? "system",
      action: e.action,
      subject:
        typeof e.details?.email === "string"
          ? `${e.subjectType} ${e.details.email}`
          : typeof e.details?.number === "string"
            ? `${e.subjectType} ${e.details.number}`
            : `${e.subjectType} ${e.subjectId.slice(0, 8)}`,
    })),
  };
}
