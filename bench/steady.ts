/**
 * Load at a fixed rate, open loop: request i leaves at start + i / rate whether or not earlier
 * answers came back, and its latency counts from that planned moment (so a stalled server is not
 * hidden by the load tool waiting for it). autocannon's own rate option sends each connection's
 * quota for the second back to back and then waits for the next second (its httpClient.js), which
 * measures a burst of `rate` requests once a second, not a steady rate; flat-out runs still use
 * autocannon. The load runs in a small process of its own (steady-load.mjs).
 */
import { execFile } from "node:child_process";
import { fileURLToPath } from "node:url";
import { promisify } from "node:util";

export interface SteadyOptions {
  readonly url: string;
  readonly rate: number;
  readonly seconds: number;
  readonly method?: "GET" | "POST";
  readonly headers?: Record<string, string>;
  readonly body?: string;
}

/** The same shape as the parts of autocannon's result that bench/table.ts prints. */
export interface SteadyResult {
  latency: { p50: number; p99: number; max: number };
  requests: { average: number };
  non2xx: number;
  errors: number;
  timeouts: number;
}

const script = fileURLToPath(new URL("./steady-load.mjs", import.meta.url));

export async function steady(o: SteadyOptions): Promise<SteadyResult> {
  const { stdout } = await promisify(execFile)(process.execPath, [script, JSON.stringify(o)]);
  return JSON.parse(stdout) as SteadyResult;
}
