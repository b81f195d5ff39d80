import type { Metadata } from "next";
import Link from "next/link";
import { PauseCircle, Wrench } from "lucide-react";
import { requireRole } from "@/lib/auth/guard";
import { can } from "@/lib/auth/permissions";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { getEm } from "@/lib/db/orm";
import { workQueue, type QueueItem } from "@/lib/floor/queries";
import { asBuiltHref } from "@/lib/floor/scan";
import { getShopEngineering } from "@/lib/shop/config";
import { shopToday } from "@/lib/shop/locale";
import { PageHeader } from "@/components/ui/page-header";
import { ShopTime } from "@/components/shop-locale";
import { EmptyState } from "@/components/ui/empty-state";
import { SerialSearch } from "../_components/serial-search";

export const metadata: Metadata = { title: "Work queue" };

const STATE_LABEL: Record<QueueItem["state"], string> = {
  released: "Released",
  in_shop: "In the shop",
  on_hold: "On hold",
  ready: "Ready",
  shipped: "Shipped",
  picked_up: "Picked up",
};

function ShaftCard({ item, today, deskLinks }: { item: QueueItem; today: string; deskLinks: boolean }) {
  const late = item.promisedDate < today;
  return (
    <li className="card p-4">
      <div className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1">
        <Link href={asBuiltHref(item.serial)} className="font-mono text-lg font-semibold underline">
          {item.serial}
        </Link>
        <span className={late ? "font-semibold text-fail" : "text-ink-muted"}>
          {late ? "Late — promised " : "Promised "}
          {item.promisedDate}
        </span>
      </div>
      <p className="mt-1">
        {item.shaftName} · {item.customerName} · order{" "}
        {deskLinks ? (
          <Link href={`/desk/orders/${item.orderId}`} className="underline">
            {item.orderNumber}
          </Link>
        ) : (
          item.orderNumber
        )}
        {item.revision > 1 ? ` · traveller rev ${item.revision}` : ""}
      </p>
      <p className="mt-1 font-semibold">
        {item.next
          ? `Next: step ${item.next.position} of ${item.stepCount}, ${item.next.name}`
          : STATE_LABEL[item.state]}
      </p>
      {item.hold && (
        <div className="mt-2 rounded-md bg-warn-soft p-3 text-warn">
          <p className="flex items-center gap-2 font-semibold">
            <PauseCircle className="size-4" aria-hidden="true" /> On hold at {item.hold.step} since{" "}
            <ShopTime at={item.hold.at.toISOString()} />
          </p>
          <ul className="mt-1 list-disc pl-5 text-ink">
            {item.hold.failures.map((f) => (
              <li key={f.key}>{f.message}</li>
            ))}
          </ul>
        </div>
      )}
    </li>
  );
}

export default async function WorkQueuePage() {
  const user = await requireRole(STAFF_ROLES, "/floor/queue");
  const [items, { floor }] = await Promise.all([getEm().then(workQueue), getShopEngineering()]);
  const today = await shopToday();
  const deskLinks = can(user.role, "orders.desk");
  const held = items.filter((i) => i.state === "on_hold");
  // Shafts grouped by the step they wait for, in routing order.
  const groups = floor.routing
    .map((r) => ({
      code: r.code,
      name: r.name,
      items: items.filter((i) => i.state !== "on_hold" && i.next?.code === r.code),
    }))
    .filter((g) => g.items.length > 0);
  const others = items.filter(
    (i) => i.state !== "on_hold" && !floor.routing.some((r) => r.code === i.next?.code),
  );
  return (
    <>
      <PageHeader
        title="Work queue"
        description="Every shaft in the shop by the step it waits for; holds first, earliest promise first."
        actions={<SerialSearch />}
      />
      {items.length === 0 ? (
        <EmptyState icon={Wrench} title="Nothing in the shop">
          Orders join this queue when the counter releases them (or when the deposit is paid).
        </EmptyState>
      ) : (
        <div className="space-y-8">
          <p className="text-lg">
            {items.length} shaft{items.length === 1 ? "" : "s"} in the shop
            {held.length ? `, ${held.length} on hold` : ""}.
          </p>
          {held.length > 0 && (
            <section aria-labelledby="q-hold">
              <h2 id="q-hold" className="mb-3 text-xl font-bold text-warn">
                On hold ({held.length})
              </h2>
              <ul className="grid gap-3 lg:grid-cols-2">
                {held.map((i) => (
                  <ShaftCard key={i.workOrderId} item={i} today={today} deskLinks={deskLinks} />
                ))}
              </ul>
            </section>
          )}
          {[...groups, ...(others.length ? [{ code: "other", name: "Other", items: others }] : [])].map(
            (g) => (
              <section key={g.code} aria-labelledby={`q-${g.code}`}>
                <h2 id={`q-${g.code}`} className="mb-3 text-xl font-bold">
                  {g.name} ({g.items.length})
                </h2>
                <ul className="grid gap-3 lg:grid-cols-2">
                  {g.items.map((i) => (
                    <ShaftCard key={i.workOrderId} item={i} today={today} deskLinks={deskLinks} />
                  ))}
                </ul>
              </section>
            ),
          )}
        </div>
      )}
    </>
  );
}
