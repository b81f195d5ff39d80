/**
 * The scan route under load: GET /api/floor/scan?code=… (a floor user's session, a step looked up)
 * beside a trivial route handler (GET /api/bench/noop) measured in the same run, both at a steady
 * 200 requests/s (bench/steady.ts; the scan in three rounds, judged on the median one). Targets: at
 * that rate, at least 70 % of the trivial handler's throughput and p99 < 50 ms. The flat-out
 * throughput (autocannon, 10 connections) is printed for comparison.
 */
import autocannon from "autocannon";
import { steady } from "./steady";
import { DEMO_PASSWORD, DEMO_STAFF } from "../lib/demo";
import { addRow, allClean, httpFigure, medianRound, rounds, roundsFigure } from "./table";

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

const flatOut = (url: string, cookie: string, duration = SECONDS) =>
  autocannon({ url, connections: 10, duration, headers: { cookie } });
const atRate = (url: string, cookie: string) =>
  steady({ url, rate: RATE, seconds: SECONDS, headers: { cookie } });

/** Runs against the app at `baseUrl`; `scanCode` is a released shaft's step code (bench/floor.ts). */
export async function benchScan(baseUrl: string, scanCode: string | null): Promise<void> {
  console.log(`\nscan route at a fixed ${RATE} requests/s, ${SECONDS} s each, against ${baseUrl}`);
  const cookie = await signIn(baseUrl);
  const noop = `${baseUrl}/api/bench/noop`;
  await flatOut(noop, cookie, 3); // warm-up
  const floorMax = await flatOut(noop, cookie);
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
  await flatOut(scan, cookie, 3); // warm-up
  const max = await flatOut(scan, cookie);
  const results = await rounds(() => atRate(scan, cookie));
  const result = medianRound(results);
  const ratio = result.requests.average / floor.requests.average;
  addRow({
    what: `GET /api/floor/scan?code=… (floor user), steady ${RATE} req/s`,
    figure: `${roundsFigure(results)} · ${(ratio * 100).toFixed(0)} % of the floor`,
    floor: `noop at ${RATE} req/s: ${httpFigure(floor)}`,
    target: `p99 < ${TARGET_P99_MS} ms, ≥ ${TARGET_RATIO * 100} % of the floor's throughput`,
    met: ratio >= TARGET_RATIO && result.latency.p99 < TARGET_P99_MS && allClean(results),
  });
  addRow({
    what: "GET /api/floor/scan?code=… (floor user), flat out, 10 connections",
    figure: `${httpFigure(max)} · ${((max.requests.average / floorMax.requests.average) * 100).toFixed(0)} % of the floor`,
    floor: `noop: ${httpFigure(floorMax)}`,
    target: "",
    met: null,
  });
}
