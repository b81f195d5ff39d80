import { AuditEvent, Customer, User } from "@/entities";
import { getEm } from "@/lib/db/orm";

export interface OverviewFigures {
  customers: number;
  staff: number;
  recent: { id: string; at: string; actor: string; action: string; subject: string }[];
}

/** What the owner sees first: counts and the latest entries in the audit log. */
export async function overviewFigures(): Promise<OverviewFigures> {
  const em = await getEm();
  const [customers, staff, events] = await Promise.all([
    em.count(Customer, {}),
    em.count(User, { role: { $ne: "customer" } }),
    em.find(AuditEvent, {}, { orderBy: { at: "desc" }, limit: 10, populate: ["actor"] }),
  ]);
  return {
    customers,
    staff,
    recent: events.map((e) => ({
      id: e.id,
      at: e.at.toISOString(),
      actor: e.actor?.name ?? "system",
      action: e.action,
      subject:
        typeof e.details?.email === "string"
          ? `${e.subjectType} ${e.details.email}`
          : `${e.subjectType} ${e.subjectId.slice(0, 8)}`,
    })),
  };
}
