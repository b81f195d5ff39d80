/** API latency under load: evaluate and quote, 50 concurrent connections, with autocannon. */
import autocannon from "autocannon";
import { readFileSync } from "node:fs";

const TARGET_P99_MS = 25;
const design = JSON.parse(readFileSync("examples/street-truck.json", "utf8")) as unknown;

async function run(title: string, url: string, body: unknown, connections = 50) {
  const result = await autocannon({
    url,
    method: "POST",
    connections,
    duration: 8,
    headers: { "content-type": "application/json" },
    body: JSON.stringify(body),
  });
  const bad = result.non2xx + result.errors + result.timeouts;
  console.log(
    `${`${title} ×${connections}`.padEnd(38)} p50 ${String(result.latency.p50).padStart(4)} ms  p99 ${String(result.latency.p99).padStart(4)} ms  ` +
      `(${connections === 50 ? `target p99 < ${TARGET_P99_MS} ms` : "for comparison"})  ${Math.round(result.requests.average)} req/s  ${bad ? `${bad} failed!` : "all 2xx"}`,
  );
}

/** Runs against the app at `baseUrl` (scripts/bench.sh starts one of its own). */
export async function benchApi(baseUrl: string): Promise<void> {
  console.log(`\nAPI latency, 8 s per run (×N = concurrent connections), against ${baseUrl}`);
  // Warm the server (route chunks, JIT, connection pool) before measuring.
  for (const path of ["evaluate", "quote"]) {
    await autocannon({
      url: `${baseUrl}/api/designs/${path}`,
      method: "POST",
      connections: 10,
      duration: 3,
      headers: { "content-type": "application/json" },
      body: JSON.stringify(path === "quote" ? { design } : design),
    });
  }
  await run("POST /api/designs/evaluate", `${baseUrl}/api/designs/evaluate`, design);
  await run("POST /api/designs/quote", `${baseUrl}/api/designs/quote`, { design, fulfilment: "ship" });
  // The same at 10 connections: how much of the 50-connection figure is queueing.
  await run("POST /api/designs/evaluate", `${baseUrl}/api/designs/evaluate`, design, 10);
}
