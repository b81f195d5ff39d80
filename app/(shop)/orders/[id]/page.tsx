import type { Metadata } from "next";
import { forbidden, notFound, redirect } from "next/navigation";
import { requirePermission } from "@/lib/auth/guard";
import { getEm } from "@/lib/db/orm";
import { orderPageTitle } from "@/lib/orders/order-title";
import { loadOrderForUser, seesAllOrders } from "@/lib/orders/access";
import { can } from "@/lib/auth/permissions";
import { shopToday } from "@/lib/shop/locale";
import { orderView, populateOrder } from "@/lib/orders/queries";
import { AppError } from "@/lib/http/errors";
import { PageHeader } from "@/components/ui/page-header";
import { ShopTime } from "@/components/shop-locale";
import { OrderPage } from "@/components/orders/order-page";
import { OrderFiles } from "@/components/order-files";
import { listOrderUploads, mayAttachFiles } from "@/lib/uploads";
import Link from "next/link";
import { asBuiltHref } from "@/lib/floor/scan";
import { orderShaftSerials } from "@/lib/floor/queries";

// The browser tab and history name the order (for those who may see it).
export async function generateMetadata({ params }: PageProps<"/orders/[id]">): Promise<Metadata> {
  return { title: await orderPageTitle((await params).id, "orders.own") };
}

export default async function CustomerOrderPage({ params, searchParams }: PageProps<"/orders/[id]">) {
  const { id } = await params;
  const query = await searchParams;
  const user = await requirePermission(null, `/orders/${id}`);
  // Staff follow the same links (e.g. back from a checkout they took by phone) to their own view.
  if (seesAllOrders(user)) {
    const rest = new URLSearchParams(
      Object.entries(query).flatMap(([k, v]) => (typeof v === "string" ? [[k, v]] : [])),
    );
    redirect(`/desk/orders/${id}${rest.size ? `?${rest}` : ""}`);
  }
  if (!can(user.role, "orders.own")) forbidden();
  const em = await getEm();
  const order = await loadOrderForUser(em, user, id).catch((e: unknown) => {
    if (e instanceof AppError && e.code === "not_found") notFound();
    throw e;
  });
  await populateOrder(em, order);
  const view = orderView(order, user, await shopToday());
  const [serials, files] = await Promise.all([orderShaftSerials(em, order.id), listOrderUploads(em, order)]);
  return (
    <>
      <PageHeader
        title={`Order ${view.number}`}
        description={
          <>
            Placed <ShopTime at={view.createdAt} format="date" />
          </>
        }
      />
      <OrderPage
        order={view}
        returnedFromCheckout={Boolean(query.paid)}
        cancelledCheckout={Boolean(query.cancelled)}
        checkoutUnavailable={Boolean(query["checkout-unavailable"])}
        files={<OrderFiles orderId={view.id} files={files} canUpload={mayAttachFiles(user)} />}
      />
      {serials.length > 0 && (
        <section aria-labelledby="shaft-records" className="mt-6 card p-5">
          <h2 id="shaft-records" className="mb-2 text-lg font-semibold">
            Your shafts&apos; records
          </h2>
          <p className="mb-2 text-sm text-ink-muted">
            What the shop measured on each shaft as it was built; reorder the same shaft from its record.
          </p>
          <ul className="space-y-1">
            {serials.map((serial) => (
              <li key={serial}>
                <Link href={asBuiltHref(serial, "customer")} className="font-mono underline">
                  {serial}
                </Link>
              </li>
            ))}
          </ul>
        </section>
      )}
    </>
  );
}
