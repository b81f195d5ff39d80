/**
 * The scan station's outbox: a step sign-off that could not reach the server is kept in this
 * browser (localStorage) and sent again when the server answers, with the same idempotency key,
 * so the server records it once however many times it arrives. Client-side only.
 */

export interface QueuedSignOff {
  readonly code: string;
  readonly values: Record<string, unknown>;
  readonly idempotencyKey: string;
  /** What the technician sees: "TGW-26-00042-7 · step 2 of 6: Weld and phase". */
  readonly label: string;
  /** When it was taken (ISO). */
  readonly at: string;
}

/** A queued sign-off the server refused when it was sent (kept until the technician dismisses it). */
export interface RefusedSignOff extends QueuedSignOff {
  readonly message: string;
}

const QUEUE_KEY = "yokeline.floor.outbox";
const REFUSED_KEY = "yokeline.floor.refused";

function read<T>(key: string): T[] {
  try {
    const raw = window.localStorage.getItem(key);
    const list = raw ? (JSON.parse(raw) as unknown) : [];
    return Array.isArray(list) ? (list as T[]) : [];
  } catch {
    return [];
  }
}

function write<T>(key: string, list: readonly T[]): void {
  window.localStorage.setItem(key, JSON.stringify(list));
  window.dispatchEvent(new Event("yokeline-outbox"));
}

export const queuedSignOffs = (): QueuedSignOff[] => read<QueuedSignOff>(QUEUE_KEY);
export const refusedSignOffs = (): RefusedSignOff[] => read<RefusedSignOff>(REFUSED_KEY);

/** Keep a sign-off for later; a second copy with the same key is not added. */
export function enqueueSignOff(item: QueuedSignOff): void {
  const list = queuedSignOffs();
  if (!list.some((q) => q.idempotencyKey === item.idempotencyKey)) write(QUEUE_KEY, [...list, item]);
}

export function dismissRefused(idempotencyKey: string): void {
  write(
    REFUSED_KEY,
    refusedSignOffs().filter((r) => r.idempotencyKey !== idempotencyKey),
  );
}

/** POST one sign-off: "sent", "refused" (with the server's message) or "unreachable". */
export async function postSignOff(
  item: Pick<QueuedSignOff, "code" | "values" | "idempotencyKey">,
): Promise<
  | { kind: "sent"; body: unknown }
  | { kind: "refused"; status: number; body: unknown }
  | { kind: "unreachable" }
> {
  let res: Response;
  try {
    res = await fetch("/api/floor/steps", {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ code: item.code, values: item.values, idempotencyKey: item.idempotencyKey }),
    });
  } catch {
    return { kind: "unreachable" };
  }
  // 503: the server is up but its database is not; try again later like a network failure.
  if (res.status === 503 || res.status === 502 || res.status === 504) return { kind: "unreachable" };
  const body: unknown = await res.json().catch(() => null);
  return res.ok ? { kind: "sent", body } : { kind: "refused", status: res.status, body };
}

let flushing: Promise<number> | null = null;

async function sendQueued(): Promise<number> {
  let sent = 0;
  for (const item of queuedSignOffs()) {
    const result = await postSignOff(item);
    if (result.kind === "unreachable") break;
    write(
      QUEUE_KEY,
      queuedSignOffs().filter((q) => q.idempotencyKey !== item.idempotencyKey),
    );
    if (result.kind === "sent") sent++;
    else {
      const error = (result.body as { error?: { message?: string } } | null)?.error;
      write(REFUSED_KEY, [
        ...refusedSignOffs(),
        { ...item, message: error?.message ?? `The server answered ${result.status}.` },
      ]);
    }
  }
  return sent;
}

/**
 * Send every queued sign-off in the order they were taken; stop at the first that cannot reach
 * the server. Refused ones move to the refused list with the server's message. Returns how many
 * were sent. One flush at a time: a call during a flush waits for that one.
 */
export function flushSignOffs(): Promise<number> {
  if (flushing) return flushing;
  const run = sendQueued().finally(() => {
    if (flushing === run) flushing = null;
  });
  flushing = run;
  return run;
}
