import type { Metadata } from "next";
import Link from "next/link";
import { forbidden, notFound, redirect } from "next/navigation";
import { requirePermission } from "@/lib/auth/guard";
import { can } from "@/lib/auth/permissions";
import { reorderMyShaftAction } from "@/lib/actions/reorder-shaft";
import { getEm } from "@/lib/db/orm";
import { asBuiltRecord } from "@/lib/floor/queries";
import { loadShaftForUser } from "@/lib/floor/reorder";
import { asBuiltHref } from "@/lib/floor/scan";
import { AppError } from "@/lib/http/errors";
import { seesAllOrders } from "@/lib/orders/access";
import { getShopEngineering } from "@/lib/shop/config";
import { PageHeader } from "@/components/ui/page-header";
import { AsBuiltView } from "@/components/floor/as-built-view";
import { ReorderButton } from "@/components/floor/reorder-button";

export const metadata: Metadata = { title: "Your shaft" };

/** The customer's as-built record of one of their own shafts (404 for anyone else's). */
export default async function CustomerAsBuiltPage({ params }: PageProps<"/shafts/[serial]">) {
  const { serial: raw } = await params;
  const serial = decodeURIComponent(raw);
  const user = await requirePermission(null, `/shafts/${raw}`);
  if (seesAllOrders(user)) redirect(asBuiltHref(serial));
  if (!can(user.role, "orders.own")) forbidden();
  const wo = await loadShaftForUser(user, serial).catch((e: unknown) => {
    if (e instanceof AppError && e.code === "not_found") notFound();
    throw e;
  });
  const [record, { floor }] = await Promise.all([
    getEm().then((em) => asBuiltRecord(em, wo.serial)),
    getShopEngineering(),
  ]);
  return (
    <>
      <PageHeader
        title={`Your shaft ${record.serial}`}
        description={
          <>
            {record.shaft.name} · order{" "}
            <Link className="underline" href={`/orders/${record.orderId}`}>
              {record.orderNumber}
            </Link>
          </>
        }
        actions={<ReorderButton serial={record.serial} action={reorderMyShaftAction} />}
      />
      <AsBuiltView record={record} units={floor.units} audience="customer" />
    </>
  );
}
