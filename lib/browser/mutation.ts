"use client";
import { useCallback, useRef, useState } from "react";
import type { ActionResult } from "@/lib/actions/define-action";

/** What a mutation's failure carries: a code, words a person can act on, and field messages. */
export type MutationError = Extract<ActionResult<unknown>, { ok: false }>["error"];

/** Said when the request never got an answer (offline, server restarting, a dropped connection). */
export const UNREACHABLE: MutationError = {
  code: "unreachable",
  message:
    "The server could not be reached. Check the connection, then look at the page again before retrying.",
};

/**
 * Calls a route handler with a JSON body and answers in the same shape as a server action:
 * `{ ok: true, data }` with the parsed body, or `{ ok: false, error }` from the handler's
 * `{ error: { code, message, fields } }`. It never throws: a network failure is `UNREACHABLE`.
 */
export async function sendJson<T>(
  url: string,
  init: { method?: "POST" | "PUT" | "PATCH" | "DELETE"; body?: unknown } = {},
): Promise<ActionResult<T>> {
  let res: Response;
  try {
    res = await fetch(url, {
      method: init.method ?? "POST",
      headers: init.body === undefined ? undefined : { "content-type": "application/json" },
      body: init.body === undefined ? undefined : JSON.stringify(init.body),
    });
  } catch {
    return { ok: false, error: UNREACHABLE };
  }
  const body: unknown = await res.json().catch(() => null);
  if (res.ok) return { ok: true, data: body as T };
  const error = (body as { error?: Partial<MutationError> } | null)?.error;
  return {
    ok: false,
    error: {
      code: typeof error?.code === "string" ? error.code : `http_${res.status}`,
      message:
        typeof error?.message === "string"
          ? error.message
          : `The server answered ${res.status}. Try again in a moment.`,
      fields: error?.fields,
    },
  };
}

/**
 * The one way a browser component changes something: wraps a server action or `sendJson` call,
 * keeps `pending` true only while it runs (a rejected promise, e.g. a dropped connection under a
 * server action, ends it too and becomes `UNREACHABLE`), and keeps the last `error`. A second
 * call while one is running is refused, so a double click never sends twice.
 */
export function useMutation<A extends unknown[], T>(action: (...args: A) => Promise<ActionResult<T>>) {
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<MutationError | null>(null);
  const running = useRef(false);
  const run = useCallback(
    async (...args: A): Promise<ActionResult<T>> => {
      if (running.current)
        return { ok: false, error: { code: "busy", message: "Already sending; wait a moment." } };
      running.current = true;
      setPending(true);
      setError(null);
      let result: ActionResult<T>;
      try {
        result = await action(...args);
      } catch {
        result = { ok: false, error: UNREACHABLE };
      } finally {
        running.current = false;
        setPending(false);
      }
      if (!result.ok) setError(result.error);
      return result;
    },
    [action],
  );
  const reset = useCallback(() => setError(null), []);
  return { run, pending, error, reset };
}

/**
 * A mutation asked for first (a `ConfirmDialog`): `ask(choice)` opens the dialog for one choice
 * (a row and what to do to it), `dialog` is spread onto the `ConfirmDialog` (open, busy, the
 * error inside it, confirm, close). On success the dialog closes and `onDone(choice)` runs; on a
 * failure it stays open with the message and its button usable again.
 */
export function useConfirmedMutation<P>(
  perform: (choice: P) => Promise<ActionResult<unknown>>,
  onDone: (choice: P) => void,
) {
  const [choice, setChoice] = useState<P | null>(null);
  const mutation = useMutation(perform);
  const { reset } = mutation;
  const ask = useCallback(
    (next: P) => {
      reset();
      setChoice(next);
    },
    [reset],
  );
  return {
    choice,
    ask,
    dialog: {
      open: choice !== null,
      busy: mutation.pending,
      error: mutation.error?.message ?? null,
      onClose: () => setChoice(null),
      onConfirm: async () => {
        if (choice === null) return;
        const res = await mutation.run(choice);
        if (!res.ok) return;
        setChoice(null);
        onDone(choice);
      },
    },
  };
}

/**
 * Puts a failed mutation's field messages on a react-hook-form form (`setError` from `useForm`),
 * for the fields the form has; the rest stay in the error's message.
 */
export function showFieldErrors<F extends string>(
  setError: (field: F, error: { message: string }) => void,
  error: MutationError,
  fields: readonly F[],
): void {
  for (const [field, message] of Object.entries(error.fields ?? {})) {
    if ((fields as readonly string[]).includes(field)) setError(field as F, { message });
  }
}
