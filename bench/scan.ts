/**
 * The scan route under load: GET /api/floor/scan?code=… (a floor user's session, a step looked up)
 * beside a trivial route handler (GET /api/bench/noop) measured in the same run, both at a fixed
 * 200 requests/s with autocannon. Targets: at least 70 % of the trivial handler's throughput,
 * p99 < 50 ms.
 */
import autocannon from "autocannon";
import { DEMO_PASSWORD, DEMO_STAFF } from "../lib/demo";
import { addRow, httpFigure } from "./table";

const RATE = 200;
const SECONDS = 10;
const TARGET_RATIO = 0.7;
const TARGET_P99_MS = 50;

async function signIn(baseUrl: string): Promise<string> {
  const floor = DEMO_STAFF.find((s) => s.role === "floor")!;
  const res = await fetch(`${baseUrl}/api/auth/sign-in/email`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: baseUrl },
    body: JSON.stringify({ email: floor.email, password: DEMO_PASSWORD }),
  });
  if (!res.ok) throw new Error(`bench sign-in as ${floor.email} failed: ${res.status}`);
  return res.headers
    .getSetCookie()
    .map((c) => c.split(";")[0])
    .join("; ");
}

async function atRate(url: string, cookie: string, duration = SECONDS) {
  return autocannon({ url, connections: 10, overallRate: RATE, duration, headers: { cookie } });
}

/** Runs against the app at `baseUrl`; `scanCode` is a released shaft's step code (bench/floor.ts). */
export async function benchScan(baseUrl: string, scanCode: string | null): Promise<void> {
  console.log(`\nscan route at a fixed ${RATE} requests/s, ${SECONDS} s each, against ${baseUrl}`);
  const cookie = await signIn(baseUrl);
  const noop = `${baseUrl}/api/bench/noop`;
  await atRate(noop, cookie, 3); // warm-up
  const floor = await atRate(noop, cookie);

  if (!scanCode) {
    console.log(
      "  GET /api/floor/scan: skipped (no released shaft to scan: the floor bench needs DATABASE_URL)",
    );
    return;
  }
  const scan = `${baseUrl}/api/floor/scan?code=${encodeURIComponent(scanCode)}`;
  const probe = await fetch(scan, { headers: { cookie } });
  if (!(probe.headers.get("content-type") ?? "").includes("json")) {
    console.log(
      `  GET /api/floor/scan: skipped — not in this build (answered ${probe.status} ${probe.headers.get("content-type") ?? ""}); the scan station adds it`,
    );
    return;
  }
  if (!probe.ok) console.log(`  (the probe of ${scanCode} answered ${probe.status}: ${await probe.text()})`);
  await atRate(scan, cookie, 3); // warm-up
  const result = await atRate(scan, cookie);
  const ratio = result.requests.average / floor.requests.average;
  const ok =
    ratio >= TARGET_RATIO && result.latency.p99 < TARGET_P99_MS && result.non2xx + result.errors === 0;
  addRow({
    what: `GET /api/floor/scan?code=… (floor user), ${RATE} req/s`,
    figure: `${httpFigure(result)} · ${(ratio * 100).toFixed(0)} % of the floor`,
    floor: `noop at ${RATE} req/s: ${httpFigure(floor)}`,
    target: `p99 < ${TARGET_P99_MS} ms, ≥ ${TARGET_RATIO * 100} % of the floor's throughput`,
    met: ok,
  });
}
