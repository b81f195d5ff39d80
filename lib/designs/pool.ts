import "server-only";
import { availableParallelism } from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { Worker } from "node:worker_threads";
import { readJsonText } from "@/lib/http/body";
import { logger } from "@/lib/logger";
import { getShopEngineering } from "@/lib/shop/config";
import type { DesignRoute, DesignShop } from "./answers";
import type { DesignBatch, DesignBatchResult } from "./worker";

/**
 * The design routes' worker threads. Parsing, checking, evaluating and writing a design's JSON take
 * a few hundred microseconds of CPU and most of a request's garbage; done here, they leave the
 * server's one event loop free for the requests around them (scans, pages) and use the other cores.
 * DESIGN_WORKERS sets how many (default: one fewer than the cores, at least one, at most four).
 */
export function designWorkerCount(env: Record<string, string | undefined> = process.env): number {
  const given = env.DESIGN_WORKERS;
  if (given !== undefined && given !== "") {
    const n = Number(given);
    if (!Number.isInteger(n) || n < 1 || n > 64)
      throw new Error(`DESIGN_WORKERS must be a whole number from 1 to 64 (it is "${given}").`);
    return n;
  }
  return Math.min(4, Math.max(1, availableParallelism() - 1));
}

interface Pending {
  resolve: (answer: { status: number; bytes: Uint8Array }) => void;
  reject: (error: Error) => void;
}

interface Slot {
  worker: Worker;
  pending: Map<number, Pending>;
  /** Jobs waiting for this turn of the event loop to end; they go to the worker as one message. */
  queue: DesignBatch["jobs"];
  /** The shop configuration this worker holds, or is about to (sent again when it changes). */
  shop: DesignShop | null;
  /** The shop to send with the next batch. */
  sendShop: DesignShop | null;
}

// One pool per process: Next may load this module once per route bundle (and the start-up hook's).
const state = globalThis as unknown as { yokelineDesignPool?: { slots: (Slot | null)[]; nextId: number } };
const pool = (state.yokelineDesignPool ??= { slots: [], nextId: 1 });

function startSlot(index: number): Slot {
  // Next's server build bundles the worker from this URL; under Vitest it is TypeScript, run by tsx.
  const worker = process.env.VITEST
    ? new Worker(
        `require("tsx/cjs/api").register(); require(${JSON.stringify(path.join(/* turbopackIgnore: true */ path.dirname(fileURLToPath(import.meta.url)), "worker.ts"))});`,
        { eval: true },
      )
    : new Worker(new URL("./worker.ts", import.meta.url));
  worker.unref(); // an idle pool never keeps the process (a test run, a script) alive
  const slot: Slot = { worker, pending: new Map(), queue: [], shop: null, sendShop: null };
  const fail = (error: Error) => {
    if (pool.slots[index] === slot) pool.slots[index] = null;
    for (const job of slot.pending.values()) job.reject(error);
    slot.pending.clear();
  };
  worker.on("message", ({ results }: DesignBatchResult) => {
    for (const result of results) {
      const job = slot.pending.get(result.id);
      if (!job) continue;
      slot.pending.delete(result.id);
      if ("error" in result) job.reject(new Error(`design worker: ${result.error}`));
      else job.resolve(result);
    }
    if (slot.pending.size === 0) worker.unref();
  });
  worker.on("error", (error) => {
    logger.error({ err: error }, "design worker failed; starting another");
    fail(error);
  });
  worker.on("exit", (code) => fail(new Error(`design worker exited (code ${code})`)));
  return slot;
}

/**
 * Starts the workers ahead of the first request (the server's start-up hook calls it, so a bad
 * DESIGN_WORKERS stops the start with its message). Requests start them too when needed.
 */
export function startDesignWorkers(): void {
  if (pool.slots.length === 0) pool.slots = Array.from({ length: designWorkerCount() }, () => null);
  for (let i = 0; i < pool.slots.length; i++) pool.slots[i] ??= startSlot(i);
}

/** At start-up: the workers, or (a bad DESIGN_WORKERS) its message on stderr and exit 1. */
export function startDesignWorkersOrStop(what: string): void {
  try {
    startDesignWorkers();
  } catch (error) {
    process.stderr.write(`${what} cannot start: ${(error as Error).message}\n`);
    process.exit(1);
  }
}

/** The least busy worker, started (or restarted after a failure) when needed. */
function pickSlot(): Slot {
  startDesignWorkers();
  let best: Slot | null = null;
  for (const slot of pool.slots) if (slot && (!best || slot.pending.size < best.pending.size)) best = slot;
  return best!;
}

/**
 * Sends a worker the jobs queued during this turn of the event loop as one message: each message
 * wakes a thread on another core, which costs more than the copying, so under load many requests
 * share one wake-up (and the worker answers them in one message too).
 */
function flush(slot: Slot): void {
  const batch: DesignBatch = { jobs: slot.queue };
  slot.queue = [];
  if (slot.sendShop) {
    const shop = slot.sendShop;
    batch.shop = { catalogue: shop.catalogue, settings: shop.settings, priceBook: shop.priceBook };
    slot.sendShop = null;
  }
  try {
    slot.worker.postMessage(batch);
  } catch (error) {
    if (batch.shop) slot.shop = null; // it never arrived
    for (const job of batch.jobs) {
      slot.pending.get(job.id)?.reject(error as Error);
      slot.pending.delete(job.id);
    }
  }
}

/**
 * A design route's answer from a worker: the status and the JSON's bytes. Bad input is an answer
 * (a 4xx naming the field); a worker that fails or exits rejects its jobs (the route logs a 500)
 * and is replaced on the next call.
 */
export function answerInWorker(
  route: DesignRoute,
  text: string,
  shop: DesignShop,
): Promise<{ status: number; bytes: Uint8Array }> {
  const slot = pickSlot();
  const id = pool.nextId++;
  if (slot.shop !== shop) {
    if (slot.queue.length > 0) flush(slot); // jobs already queued keep the shop they came with
    slot.shop = slot.sendShop = shop;
  }
  return new Promise((resolve, reject) => {
    slot.pending.set(id, { resolve, reject });
    if (slot.pending.size === 1) slot.worker.ref(); // an answer is awaited: keep the process up
    slot.queue.push({ id, route, text });
    if (slot.queue.length === 1) setImmediate(flush, slot);
  });
}

/**
 * POST /api/designs/evaluate and /quote: the body is read here (capped, 413 past the limit), then
 * parsed, checked, evaluated and written in a worker; the bytes go out as they came back.
 */
export async function designRouteResponse(route: DesignRoute, req: Request): Promise<Response> {
  const text = await readJsonText(req);
  const shop = await getShopEngineering();
  const { status, bytes } = await answerInWorker(route, text, shop);
  return new Response(bytes as Uint8Array<ArrayBuffer>, {
    status,
    headers: { "content-type": "application/json" },
  });
}

/** Stops every worker (tests; the process's own exit needs nothing). */
export async function stopDesignWorkers(): Promise<void> {
  const running = pool.slots.filter((s): s is Slot => s !== null);
  pool.slots = [];
  await Promise.all(running.map((s) => s.worker.terminate()));
}
