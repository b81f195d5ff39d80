import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { SearchX } from "lucide-react";
import { requireRole } from "@/lib/auth/guard";
import { STAFF_ROLES } from "@/lib/auth/roles";
import { getEm } from "@/lib/db/orm";
import { parseSerial } from "@/lib/traveller/codes";
import { asBuiltHref } from "@/lib/floor/scan";
import { shaftExists } from "@/lib/floor/queries";
import { PageHeader } from "@/components/ui/page-header";
import { EmptyState } from "@/components/ui/empty-state";
import { SerialSearch } from "../_components/serial-search";

export const metadata: Metadata = { title: "Find a shaft" };

// GET /floor/shafts?serial= — the search form's target: straight to the record, or why not.
export default async function FindShaftPage({ searchParams }: PageProps<"/floor/shafts">) {
  await requireRole(STAFF_ROLES, "/floor/shafts");
  const { serial } = await searchParams;
  const text = typeof serial === "string" ? serial : "";
  const parsed = text ? parseSerial(text) : null;
  let message = "Type or scan a shaft's serial.";
  if (parsed && !parsed.ok) message = parsed.message;
  if (parsed?.ok) {
    if (await shaftExists(await getEm(), parsed.serial)) redirect(asBuiltHref(parsed.serial));
    message = `No shaft with serial ${parsed.serial}.`;
  }
  return (
    <>
      <PageHeader
        title="Find a shaft"
        description="Its as-built record, by serial."
        actions={<SerialSearch />}
      />
      <EmptyState icon={SearchX} title={text ? "Not found" : "Find a shaft"}>
        {message}
      </EmptyState>
    </>
  );
}
