import { FileText } from "lucide-react";
import type { OrderView } from "@/lib/orders/views";

/** The customer's papers: the install sheet always, the as-built certificate once every shaft passed final inspection. */
export function OrderPapers({ order }: { order: OrderView }) {
  const base = `/api/orders/${order.id}/papers`;
  return (
    <section className="no-print space-y-2 card p-5" aria-labelledby="papers">
      <h2 id="papers" className="text-lg font-semibold">
        Papers
      </h2>
      <ul className="space-y-1.5 text-sm">
        <li>
          <a href={`${base}/install-sheet`} download className="inline-flex items-center gap-2">
            <FileText className="size-4" aria-hidden="true" /> Install sheet (PDF)
          </a>
        </li>
        <li>
          {order.asBuiltReady ? (
            <a href={`${base}/as-built`} download className="inline-flex items-center gap-2">
              <FileText className="size-4" aria-hidden="true" /> As-built certificate (PDF)
            </a>
          ) : (
            <span className="text-ink-muted">As-built certificate: after final inspection</span>
          )}
        </li>
      </ul>
    </section>
  );
}
