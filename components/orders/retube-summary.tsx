import { Wrench } from "lucide-react";
import type { RetubeView } from "@/lib/orders/views";
import { ShopTime } from "@/components/shop-locale";
import { formatQuantity, type FloorUnits } from "@/lib/traveller/units";

/** "Re-tube" beside a shaft's name. */
export function RetubeBadge() {
  return (
    <span
      className="inline-flex items-center gap-1 rounded-full border border-steel-600 bg-white px-2 py-0.5 align-middle text-xs font-semibold text-steel-700"
      data-testid="retube-badge"
    >
      <Wrench className="size-3" aria-hidden="true" /> Re-tube
    </span>
  );
}

/** A re-tube's intake: the weld-to-weld the new tube is cut to and the parts reused, with their notes. */
export function RetubeSummary({
  retube,
  shaftName,
  units,
}: {
  retube: RetubeView;
  shaftName: string;
  /** The floor's units (the as-built record); mm elsewhere, like the shaft's other figures. */
  units?: FloorUnits;
}) {
  const reused = retube.parts.filter((p) => p.reuse);
  return (
    <section
      className="mt-4 rounded-md border border-line bg-paper-sunk p-3 text-sm"
      aria-label={`Re-tube of ${shaftName}`}
    >
      <h4 className="font-semibold">Re-tube of the customer&apos;s shaft</h4>
      <p className="mt-1">
        Weld-to-weld{" "}
        <strong className="tabular-nums">
          {units
            ? formatQuantity("length", units, retube.weldToWeldMm)
            : `${retube.weldToWeldMm.toFixed(1)} mm`}
        </strong>
        <span className="text-ink-muted"> (the new tube is cut to it)</span>
      </p>
      {reused.length > 0 ? (
        <ul className="mt-1 space-y-0.5">
          {reused.map((p) => (
            <li key={p.part}>
              <span className="font-medium">{p.label}</span>: reused if it passes inspection
              {p.note ? <span className="text-ink-muted"> — {p.note}</span> : null}
            </li>
          ))}
        </ul>
      ) : (
        <p className="mt-1">No part reused: all new parts.</p>
      )}
      <p className="mt-1 text-xs text-ink-muted">
        Recorded by {retube.recordedBy} on <ShopTime at={retube.recordedAt} />
      </p>
    </section>
  );
}
