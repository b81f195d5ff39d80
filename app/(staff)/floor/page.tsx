import type { Metadata } from "next";
import Link from "next/link";
import { requirePermission } from "@/lib/auth/guard";
import { can } from "@/lib/auth/permissions";
import { PageHeader } from "@/components/ui/page-header";
import { ScanStation } from "./_components/scan-station";

export const metadata: Metadata = { title: "Scan station" };

export default async function ScanStationPage() {
  const user = await requirePermission("floor.scan", "/floor");
  return (
    <>
      <PageHeader
        title="Scan station"
        description="Scan a traveller's step barcode to record what you measured and sign the step off."
        actions={
          <Link href="/floor/queue" className="btn-quiet min-h-12">
            Work queue
          </Link>
        }
      />
      <div className="max-w-4xl">
        <ScanStation canConcede={can(user.role, "shop.manage")} />
      </div>
    </>
  );
}
