import type { Metadata } from "next";
import { ScanLine } from "lucide-react";
import { requirePermission } from "@/lib/auth/guard";
import { PageHeader } from "@/components/ui/page-header";

export const metadata: Metadata = { title: "Scan station" };

export default async function ScanStationPage() {
  await requirePermission("floor.scan", "/floor");
  return (
    <>
      <PageHeader
        title="Scan station"
        description="Scan a traveller's step barcode to sign it off and record what you measured."
      />
      <form className="max-w-xl card p-6" aria-describedby="scan-help">
        <label htmlFor="scan" className="field-label">
          Traveller barcode
        </label>
        <div className="flex gap-2">
          <input
            id="scan"
            name="code"
            className="field-input font-mono"
            autoFocus
            autoComplete="off"
            placeholder="Scan or type the code"
            disabled
          />
          <button type="submit" className="btn-primary" disabled>
            <ScanLine className="size-4" aria-hidden="true" />
            Open
          </button>
        </div>
        <p id="scan-help" className="field-hint">
          Travellers are printed by the counter when an order is paid. Scanning opens once the first traveller
          exists.
        </p>
      </form>
    </>
  );
}
