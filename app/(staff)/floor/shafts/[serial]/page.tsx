import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requireRole } from "@/lib/auth/guard";
import { can } from "@/lib/auth/permissions";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { reorderShaftAction } from "@/lib/actions/reorder-shaft";
import { getEm } from "@/lib/db/orm";
import { asBuiltRecord } from "@/lib/floor/queries";
import { triageViewFor } from "@/lib/floor/triage";
import { AppError } from "@/lib/http/errors";
import { getShopEngineering } from "@/lib/shop/config";
import { PageHeader } from "@/components/ui/page-header";
import { AsBuiltView } from "@/components/floor/as-built-view";
import { ReorderButton } from "@/components/floor/reorder-button";
import { SerialSearch } from "../../_components/serial-search";
import { VibrationTriage } from "./_components/vibration-triage";

export const metadata: Metadata = { title: "As-built record" };

export default async function StaffAsBuiltPage({ params }: PageProps<"/floor/shafts/[serial]">) {
  const { serial } = await params;
  const user = await requireRole(STAFF_ROLES, `/floor/shafts/${serial}`);
  const [record, { floor, settings }] = await Promise.all([
    getEm()
      .then((em) => asBuiltRecord(em, decodeURIComponent(serial)))
      .catch((e: unknown) => {
        if (e instanceof AppError && (e.code === "not_found" || e.code === "invalid")) notFound();
        throw e;
      }),
    getShopEngineering(),
  ]);
  const desk = can(user.role, "orders.desk");
  return (
    <>
      <PageHeader
        title={`Shaft ${record.serial}`}
        description={
          <>
            {record.shaft.name} · order{" "}
            {desk ? (
              <Link className="underline" href={`/desk/orders/${record.orderId}`}>
                {record.orderNumber}
              </Link>
            ) : (
              record.orderNumber
            )}
          </>
        }
        actions={
          <>
            <SerialSearch />
            {desk && <ReorderButton serial={record.serial} action={reorderShaftAction} />}
          </>
        }
      />
      <AsBuiltView
        record={record}
        units={floor.units}
        audience="staff"
        afterDesign={<VibrationTriage view={triageViewFor(record, settings)} units={floor.units} />}
      />
    </>
  );
}
