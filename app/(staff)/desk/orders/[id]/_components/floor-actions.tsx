"use client";
import { useState } from "react";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { Factory, Printer } from "lucide-react";
import type { OrderFloorSummary } from "@/lib/floor/work-orders";
import { releaseOrderAction } from "@/lib/actions/release-order";
import { reissueTravellerAction } from "@/lib/actions/reissue-traveller";
import { useMutation } from "@/lib/browser/mutation";
import { Alert } from "@/components/ui/alert";

/** The counter's floor actions on an order: release to the shop, print the travellers, void and reissue. */
export function FloorActions({
  orderId,
  depositPaid,
  cancelled,
  blocked = null,
  floor,
}: {
  orderId: string;
  depositPaid: boolean;
  cancelled: boolean;
  /** Why the order cannot be released now (engineering sign-off), or null. */
  blocked?: string | null;
  floor: OrderFloorSummary;
}) {
  const router = useRouter();
  const release = useMutation(releaseOrderAction);
  const reissue = useMutation(reissueTravellerAction);
  const busy = release.pending || reissue.pending;
  const [message, setMessage] = useState<{ tone: "success" | "error"; text: string } | null>(null);
  const released = floor.state !== "not_released";

  return (
    <section className="no-print space-y-4 card p-5" aria-labelledby="floor-actions">
      <h2 id="floor-actions" className="text-lg font-semibold">
        Shop floor
      </h2>
      <p className="font-semibold">{floor.label}</p>
      {message && <Alert tone={message.tone}>{message.text}</Alert>}
      {!released && !cancelled && blocked && <Alert tone="warning">{blocked}</Alert>}
      {!released && !cancelled && !blocked && (
        <form
          className="space-y-3"
          onSubmit={async (e) => {
            e.preventDefault();
            const reason = String(new FormData(e.currentTarget).get("reason") ?? "");
            const res = await release.run({ orderId, reason: reason || undefined });
            setMessage(
              res.ok
                ? { tone: "success", text: `Released: ${res.data.serials.join(", ")}. Print the traveller.` }
                : { tone: "error", text: res.error.fields?.reason ?? res.error.message },
            );
            router.refresh();
          }}
        >
          {!depositPaid && (
            <div>
              <label htmlFor="release-reason" className="field-label">
                The deposit is not paid: why release now?
              </label>
              <input id="release-reason" name="reason" required minLength={3} className="field-input" />
            </div>
          )}
          <button type="submit" className="btn-primary w-full" disabled={busy}>
            <Factory className="size-4" aria-hidden="true" />
            {release.pending ? "Releasing…" : "Release to the shop"}
          </button>
        </form>
      )}
      {released && cancelled && (
        <p className="text-sm text-ink-muted">The order is cancelled: its travellers are void.</p>
      )}
      {released && !cancelled && (
        <>
          <a
            href={`/desk/orders/${orderId}/traveller`}
            target="_blank"
            rel="noopener"
            className="btn-primary w-full"
          >
            <Printer className="size-4" aria-hidden="true" />
            Print traveller
          </a>
          <ul className="space-y-3">
            {floor.shafts.map((s) => (
              <li key={s.workOrderId} className="border-t border-line pt-3 text-sm">
                <Link href={`/floor/shafts/${s.serial}`} className="font-mono font-semibold underline">
                  {s.serial}
                </Link>{" "}
                <span className="text-ink-muted">rev {s.revision}</span>
                <p>
                  {s.hold
                    ? `On hold at ${s.hold.step}`
                    : s.next
                      ? `Next: step ${s.next.position} of ${s.stepCount}, ${s.next.name}`
                      : "Left the shop"}
                </p>
                {s.state !== "shipped" && s.state !== "picked_up" && (
                  <details className="mt-2">
                    <summary className="cursor-pointer text-steel-700 underline">
                      Void and reissue traveller
                    </summary>
                    <form
                      className="mt-2 space-y-2"
                      onSubmit={async (e) => {
                        e.preventDefault();
                        const reason = String(new FormData(e.currentTarget).get("reason") ?? "");
                        if (
                          !window.confirm(
                            `Void ${s.serial} revision ${s.revision}? Its barcodes stop working.`,
                          )
                        )
                          return;
                        const res = await reissue.run({ workOrderId: s.workOrderId, reason });
                        setMessage(
                          res.ok
                            ? {
                                tone: "success",
                                text: `${res.data.serial} revision ${res.data.revision} issued; revision ${res.data.revision - 1} is void. Print the new traveller.`,
                              }
                            : { tone: "error", text: res.error.fields?.reason ?? res.error.message },
                        );
                        router.refresh();
                      }}
                    >
                      <label htmlFor={`reissue-${s.workOrderId}`} className="field-label">
                        Why (the design changed how?)
                      </label>
                      <input
                        id={`reissue-${s.workOrderId}`}
                        name="reason"
                        required
                        minLength={3}
                        className="field-input"
                      />
                      <button type="submit" className="btn-quiet w-full" disabled={busy}>
                        Void and reissue
                      </button>
                    </form>
                  </details>
                )}
              </li>
            ))}
          </ul>
        </>
      )}
    </section>
  );
}
