/**
 * Load at a fixed rate, open loop: request i leaves at start + i / rate whether or not earlier
 * answers came back, and its latency counts from that planned moment (so a stalled server is not
 * hidden by the load tool waiting for it). autocannon's own rate option sends each connection's
 * quota for the second back to back and then waits for the next second (its httpClient.js), which
 * measures a burst of `rate` requests once a second, not a steady rate; flat-out runs still use
 * autocannon.
 */
import { Agent, request } from "node:http";

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

const TIMEOUT_MS = 10_000;

export async function steady(o: SteadyOptions): Promise<SteadyResult> {
  const agent = new Agent({ keepAlive: true, maxSockets: 64 });
  const target = new URL(o.url);
  const total = Math.round(o.rate * o.seconds);
  const gap = 1000 / o.rate;
  const latencies: number[] = [];
  let non2xx = 0;
  let errors = 0;
  let timeouts = 0;
  let done = 0;
  let sent = 0;
  let finish!: () => void;
  const finished = new Promise<void>((resolve) => (finish = resolve));
  const settle = () => {
    if (++done === total) finish();
  };

  const fire = (plannedAt: number) => {
    const req = request(
      {
        agent,
        host: target.hostname,
        port: target.port,
        path: target.pathname + target.search,
        method: o.method ?? "GET",
        headers: {
          ...o.headers,
          ...(o.body === undefined ? {} : { "content-length": Buffer.byteLength(o.body) }),
        },
        timeout: TIMEOUT_MS,
      },
      (res) => {
        res.resume();
        res.on("end", () => {
          latencies.push(performance.now() - plannedAt);
          if ((res.statusCode ?? 0) >= 300) non2xx++;
          settle();
        });
      },
    );
    let timedOut = false;
    req.on("timeout", () => {
      timedOut = true;
      timeouts++;
      req.destroy(new Error("timeout"));
    });
    req.on("error", () => {
      if (!timedOut) errors++;
      settle();
    });
    req.end(o.body);
  };

  const start = performance.now();
  const tick = () => {
    const now = performance.now();
    while (sent < total && start + sent * gap <= now) fire(start + sent++ * gap);
    if (sent < total) setTimeout(tick, Math.max(0, start + sent * gap - performance.now()));
  };
  tick();
  await finished;
  const elapsed = (performance.now() - start) / 1000;
  agent.destroy();

  latencies.sort((a, b) => a - b);
  const at = (q: number) =>
    Math.round(latencies[Math.min(latencies.length - 1, Math.floor(q * latencies.length))] ?? NaN);
  return {
    latency: { p50: at(0.5), p99: at(0.99), max: at(1) },
    requests: { average: latencies.length / elapsed },
    non2xx,
    errors,
    timeouts,
  };
}
