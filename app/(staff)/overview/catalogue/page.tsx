import type { Metadata } from "next";
import { requirePermission } from "@/lib/auth/guard";
import { currentShopConfig, versionHistory } from "@/lib/catalogue/versions";
import { PageHeader } from "@/components/ui/page-header";
import { Alert } from "@/components/ui/alert";
import { CatalogueEditor } from "./_components/catalogue-editor";
import { VersionHistory } from "./_components/version-history";

export const metadata: Metadata = { title: "Catalogue & prices" };

const SECTIONS = [
  { id: "policy", label: "Price book & policy" },
  { id: "materials", label: "Materials" },
  { id: "tubes", label: "Tubes" },
  { id: "fittings", label: "End fittings" },
  { id: "joints", label: "Joints" },
  { id: "limits", label: "Limits" },
  { id: "floor", label: "Floor routing & tolerances" },
  { id: "history", label: "History" },
] as const;

/** The owner edits what the shop engineers and prices with; each save is a new version. */
export default async function CataloguePage({ searchParams }: PageProps<"/overview/catalogue">) {
  await requirePermission("shop.manage", "/overview/catalogue");
  const [{ version, document }, versions, { saved }] = await Promise.all([
    currentShopConfig(),
    versionHistory(),
    searchParams,
  ]);
  const latest = versions.find((v) => v.current);
  return (
    <>
      <PageHeader
        title="Catalogue & prices"
        description={
          <>
            What every design is engineered and priced with: version {version}
            {latest ? `, saved by ${latest.by}` : ""}. Each save is a new version; quotes and the builder use
            the newest, placed orders keep the copy they were priced with.
          </>
        }
      />
      <div className="mb-6 space-y-3">
        {saved === String(version) && (
          <Alert tone="success" title={`Saved as version ${version}`}>
            New quotes and orders use it now. The change is in the history below.
          </Alert>
        )}
        {document.catalogue.demo && (
          <Alert tone="warning" title="Demonstration catalogue">
            These parts, ratings and prices are invented for the demo shop. Replace them with your own stock
            and the makers’ ratings before quoting real work.
          </Alert>
        )}
      </div>
      <nav aria-label="Sections" className="no-print mb-8 flex flex-wrap gap-2 text-sm">
        {SECTIONS.map((s) => (
          <a
            key={s.id}
            href={`#${s.id}`}
            className="rounded-full border border-line-strong px-3 py-1 hover:bg-paper-sunk"
          >
            {s.label}
          </a>
        ))}
      </nav>
      <div className="space-y-10 pb-24">
        <CatalogueEditor
          key={version}
          version={version}
          document={document}
          currency={document.priceBook.currency}
        />
        <VersionHistory versions={versions} currency={document.priceBook.currency} />
      </div>
    </>
  );
}
