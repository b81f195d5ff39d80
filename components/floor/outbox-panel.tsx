"use client";
import { useCallback, useEffect, useSyncExternalStore } from "react";
import { CloudOff, RefreshCw, XCircle } from "lucide-react";
import {
  dismissRefused,
  flushSignOffs,
  queuedSignOffs,
  refusedSignOffs,
  type QueuedSignOff,
  type RefusedSignOff,
} from "./step-outbox";

const RETRY_MS = 5_000;
const EMPTY: never[] = [];

function subscribe(onChange: () => void): () => void {
  window.addEventListener("yokeline-outbox", onChange);
  window.addEventListener("storage", onChange);
  return () => {
    window.removeEventListener("yokeline-outbox", onChange);
    window.removeEventListener("storage", onChange);
  };
}

/** A snapshot that only changes when the stored text changes (useSyncExternalStore needs that). */
function snapshotOf<T>(read: () => T[]): () => T[] {
  let text = "";
  let value: T[] = [];
  return () => {
    const list = read();
    const next = JSON.stringify(list);
    if (next !== text) {
      text = next;
      value = list;
    }
    return value;
  };
}
const queuedSnapshot = snapshotOf<QueuedSignOff>(queuedSignOffs);
const refusedSnapshot = snapshotOf<RefusedSignOff>(refusedSignOffs);

/**
 * Sign-offs kept on this station while the server could not be reached: sent again when the
 * browser is back online, every few seconds while any wait, and on "Send now".
 */
export function OutboxPanel() {
  const queued = useSyncExternalStore(subscribe, queuedSnapshot, () => EMPTY);
  const refused = useSyncExternalStore(subscribe, refusedSnapshot, () => EMPTY);
  const flush = useCallback(() => void flushSignOffs(), []);

  useEffect(() => {
    flush();
    window.addEventListener("online", flush);
    return () => window.removeEventListener("online", flush);
  }, [flush]);
  useEffect(() => {
    if (queued.length === 0) return;
    const timer = window.setInterval(flush, RETRY_MS);
    return () => window.clearInterval(timer);
  }, [queued.length, flush]);

  if (queued.length === 0 && refused.length === 0) return null;
  return (
    <div className="space-y-3">
      {queued.length > 0 && (
        <section
          aria-labelledby="outbox-title"
          className="rounded-md border-2 border-warn bg-warn-soft p-4 text-ink"
        >
          <div className="flex flex-wrap items-center justify-between gap-2">
            <h2 id="outbox-title" className="flex items-center gap-2 text-lg font-bold text-warn">
              <CloudOff className="size-5" aria-hidden="true" />
              {queued.length === 1 ? "1 sign-off waits" : `${queued.length} sign-offs wait`} to be sent
            </h2>
            <button type="button" className="btn-quiet" onClick={flush}>
              <RefreshCw className="size-4" aria-hidden="true" /> Send now
            </button>
          </div>
          <p className="mt-1">
            The server could not be reached. They are kept on this station and sent as soon as it answers;
            each is recorded once.
          </p>
          <ul className="mt-2 list-disc space-y-1 pl-5 font-mono text-sm">
            {queued.map((q) => (
              <li key={q.idempotencyKey}>{q.label}</li>
            ))}
          </ul>
        </section>
      )}
      {refused.map((r) => (
        <section
          key={r.idempotencyKey}
          role="alert"
          className="flex gap-3 rounded-md border-2 border-fail bg-fail-soft p-4"
        >
          <XCircle className="mt-0.5 size-6 shrink-0 text-fail" aria-hidden="true" />
          <div className="min-w-0 flex-1">
            <p className="font-bold text-fail">Not accepted when it was sent: {r.label}</p>
            <p className="mt-1 text-ink">{r.message} Scan the step again to record it.</p>
          </div>
          <button
            type="button"
            className="btn-quiet self-start"
            onClick={() => dismissRefused(r.idempotencyKey)}
          >
            Dismiss
          </button>
        </section>
      ))}
    </div>
  );
}
