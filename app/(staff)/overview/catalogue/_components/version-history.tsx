import type { VersionView } from "@/lib/catalogue/versions";
import { ChangesTable } from "./changes-table";

/** How many changes a version lists before the rest fold away. */
const SHOWN = 8;

const when = (iso: string) =>
  new Date(iso).toLocaleString("en-US", {
    dateStyle: "medium",
    timeStyle: "short",
    timeZone: "UTC",
  }) + " UTC";

function Changes({ version, currency }: { version: VersionView; currency: string }) {
  if (version.changes.length === 0) {
    return (
      <p className="text-sm text-ink-muted">
        {version.version === 1 || version.note === "Starting configuration"
          ? "The configuration before the first edit."
          : "No field changes recorded."}
      </p>
    );
  }
  const table = (changes: typeof version.changes) => (
    <ChangesTable changes={changes} currency={currency} caption={`Changes in version ${version.version}`} />
  );
  const rows = version.changes;
  return (
    <div className="overflow-x-auto">
      {table(rows.slice(0, SHOWN))}
      {rows.length > SHOWN && (
        <details className="mt-1">
          <summary className="cursor-pointer text-sm text-steel-700">
            {rows.length - SHOWN} more {rows.length - SHOWN === 1 ? "change" : "changes"}
          </summary>
          {table(rows.slice(SHOWN))}
        </details>
      )}
    </div>
  );
}

/** Every saved version, newest first: who, when, why, and each change before → after. */
export function VersionHistory({ versions, currency }: { versions: VersionView[]; currency: string }) {
  return (
    <section id="history" aria-labelledby="history-title" className="scroll-mt-24 space-y-3">
      <h2 id="history-title" className="text-lg font-semibold">
        Version history
      </h2>
      {versions.length === 0 ? (
        <p className="card p-5 text-sm text-ink-muted">
          No edits yet: this is the starting configuration (version 1). Each save adds a version here with who
          saved it, when, why and every change.
        </p>
      ) : (
        <ol className="space-y-3">
          {versions.map((v) => (
            <li key={v.version} className="card p-4">
              <div className="mb-2 flex flex-wrap items-baseline justify-between gap-2">
                <h3 className="font-semibold">
                  Version {v.version}
                  {v.current && (
                    <span className="ml-2 rounded-full bg-pass-soft px-2 py-0.5 text-xs font-semibold text-pass">
                      current
                    </span>
                  )}
                </h3>
                <p className="text-sm text-ink-muted">
                  {v.by} · <time dateTime={v.at}>{when(v.at)}</time>
                </p>
              </div>
              <p className="mb-2 text-sm">“{v.note}”</p>
              <Changes version={v} currency={currency} />
            </li>
          ))}
        </ol>
      )}
    </section>
  );
}
