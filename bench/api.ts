/** API latency under load: evaluate and quote, 50 concurrent connections, with autocannon. */
import autocannon from "autocannon";
import { readFileSync } from "node:fs";

const TARGET_P99_MS = 25;
const design = JSON.parse(readFileSync("examples/street-truck.json", "utf8")) as unknown;

async function run(title: string, url: string, body: unknown) {
  const result = await autocannon({
    url,
    method: "POST",
    connections: 50,
    duration: 8,
    headers: { "content-type": "application/json" },
    body: JSON.stringify(body),
  });
  const bad = result.non2xx + result.errors + result.timeouts;
  console.log(
    `${title.padEnd(34)} p50 ${String(result.latency.p50).padStart(4)} ms  p99 ${String(result.latency.p99).padStart(4)} ms  ` +
      `(target p99 < ${TARGET_P99_MS} ms)  ${Math.round(result.requests.average)} req/s  ${bad ? `${bad} failed!` : "all 2xx"}`,
  );
}

/** Runs against the app at `baseUrl` (scripts/bench.sh starts one of its own). */
export async function benchApi(baseUrl: string): Promise<void> {
  console.log(`\nAPI latency, 50 concurrent connections, 8 s each, against ${baseUrl}`);
  // Warm the server (JIT, connection pool) before measuring.
  for (let i = 0; i < 20; i++) {
    await fetch(`${baseUrl}/api/designs/evaluate`, {
      method: "POST",
      body: JSON.stringify(design),
      headers: { "content-type": "application/json" },
    });
  }
  await run("POST /api/designs/evaluate", `${baseUrl}/api/designs/evaluate`, design);
  await run("POST /api/designs/quote", `${baseUrl}/api/designs/quote`, { design, fulfilment: "ship" });
}
