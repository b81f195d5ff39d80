import { parentPort } from "node:worker_threads";
import { answerDesignRoute, type DesignRoute, type DesignShop } from "./answers";

/** Jobs from lib/designs/pool.ts; the shop comes along only when it changed since the last batch. */
export interface DesignBatch {
  jobs: { id: number; route: DesignRoute; text: string }[];
  shop?: DesignShop;
}

/** Each job's answer as UTF-8 bytes (moved, not copied), or why it could not be made. */
export interface DesignBatchResult {
  results: ({ id: number; status: number; bytes: Uint8Array } | { id: number; error: string })[];
}

// The design worker: parses, checks, evaluates (and prices) the design routes' bodies and writes
// their JSON, off the server's event loop. Started by lib/designs/pool.ts.
const port = parentPort;
if (!port) throw new Error("lib/designs/worker.ts runs as a worker thread (lib/designs/pool.ts starts it).");

let shop: DesignShop | null = null;

/** The text's UTF-8 in a buffer of its own (a pooled Buffer's memory could not be moved). */
function utf8(text: string): Uint8Array {
  const bytes = Buffer.allocUnsafeSlow(Buffer.byteLength(text));
  bytes.write(text);
  return bytes;
}

port.on("message", (batch: DesignBatch) => {
  if (batch.shop) shop = batch.shop;
  const results: DesignBatchResult["results"] = [];
  const moved: ArrayBuffer[] = [];
  for (const job of batch.jobs) {
    try {
      if (!shop) throw new Error("the design worker has no shop configuration yet");
      const answer = answerDesignRoute(job.route, job.text, shop);
      const bytes = utf8(answer.json);
      results.push({ id: job.id, status: answer.status, bytes });
      moved.push(bytes.buffer as ArrayBuffer);
    } catch (error) {
      results.push({
        id: job.id,
        error: error instanceof Error ? (error.stack ?? error.message) : String(error),
      });
    }
  }
  port.postMessage({ results } satisfies DesignBatchResult, moved);
});
