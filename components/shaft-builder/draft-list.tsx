"use client";
import { ShopTime } from "@/components/shop-locale";

import { FolderOpen } from "lucide-react";
import { shaftUseLabel } from "@/lib/driveline/uses";
import type { Drafts } from "./use-drafts";
import { withUnit, type UnitSystem } from "./model";

/** The saved designs: open one into the form or delete it; the open one is marked. */
export function DraftList({
  drafts,
  system,
  onOpen,
}: {
  drafts: Drafts;
  system: UnitSystem;
  onOpen: (id: string) => void;
}) {
  return (
    <section className="card p-4" aria-labelledby="s-drafts">
      <h2 id="s-drafts" className="flex items-center gap-2 text-lg font-semibold">
        <FolderOpen className="size-5 text-steel-500" aria-hidden="true" /> Saved designs
      </h2>
      {drafts.drafts.length === 0 ? (
        <p className="mt-2 text-sm text-ink-muted">
          No saved designs yet. Save this one to come back to it later.
        </p>
      ) : (
        <ul className="mt-2 divide-y divide-line" data-testid="draft-list">
          {drafts.drafts.map((d) => (
            <li key={d.id} className="flex flex-wrap items-center justify-between gap-2 py-2 text-sm">
              <span>
                <span className="font-medium">{d.name}</span>
                {d.id === drafts.draftId && (
                  <span className="ml-2 rounded bg-steel-50 px-1.5 py-0.5 text-xs text-steel-700">open</span>
                )}
                <span className="block text-xs text-ink-muted">
                  {d.lengthMm != null ? withUnit(d.lengthMm, "length", system) : ""} · {shaftUseLabel(d.use)}{" "}
                  · saved <ShopTime at={d.updatedAt} />
                </span>
              </span>
              <span className="flex gap-1">
                <button
                  type="button"
                  className="btn-quiet px-3 py-1 text-xs"
                  onClick={() => onOpen(d.id)}
                  disabled={drafts.busy}
                  aria-label={`Open ${d.name}`}
                >
                  Open
                </button>
                <button
                  type="button"
                  className="btn-quiet px-3 py-1 text-xs"
                  onClick={() => void drafts.remove(d.id, d.name)}
                  disabled={drafts.busy}
                  aria-label={`Delete ${d.name}`}
                >
                  Delete
                </button>
              </span>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
