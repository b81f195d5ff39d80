// The open-loop load of bench/steady.ts, run in a process of its own so that the bench runner's
// own pauses (its heap holds fonts, PDFs and ORM state) never count as the server's latency.
// Input: one JSON argument (url, rate, seconds, method, headers, body). Output: one JSON line.
import { Agent, request } from "node:http";

const o = JSON.parse(process.argv[2]);
const agent = new Agent({ keepAlive: true, maxSockets: 64 });
const target = new URL(o.url);
const total = Math.round(o.rate * o.seconds);
const gap = 1000 / o.rate;
const TIMEOUT_MS = 10_000;
const latencies = [];
let non2xx = 0;
let errors = 0;
let timeouts = 0;
let done = 0;
let sent = 0;
let finish;
const finished = new Promise((resolve) => (finish = resolve));
const settle = () => {
  if (++done === total) finish();
};

function fire(plannedAt) {
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
}

const start = performance.now();
function tick() {
  const now = performance.now();
  while (sent < total && start + sent * gap <= now) fire(start + sent++ * gap);
  if (sent < total) setTimeout(tick, Math.max(0, start + sent * gap - performance.now()));
}
tick();
await finished;
const elapsed = (performance.now() - start) / 1000;
agent.destroy();
latencies.sort((a, b) => a - b);
const at = (q) =>
  Math.round(latencies[Math.min(latencies.length - 1, Math.floor(q * latencies.length))] ?? NaN);
process.stdout.write(
  JSON.stringify({
    latency: { p50: at(0.5), p99: at(0.99), max: at(1) },
    requests: { average: latencies.length / elapsed },
    non2xx,
    errors,
    timeouts,
  }) + "\n",
);
