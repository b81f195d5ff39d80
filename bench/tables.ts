/**
 * The orders table on 10k orders: GET /api/tables/orders (the JSON route handler behind the
 * orders table: the same parse and the same single statement as the page) at 20 concurrent
 * connections with autocannon, beside the trivial GET /api/bench/noop in the same run; the page
 * /desk/orders itself is shown for comparison. Target: p99 < 100 ms for the table route.
 */
import autocannon from "autocannon";
import { DEMO_PASSWORD, DEMO_STAFF } from "../lib/demo";
import { addRow, httpFigure } from "./table";
import { insertBenchOrders } from "./tables-data";

const ORDERS = 10_000;
const CONNECTIONS = 20;
const SECONDS = 10;
const TARGET_P99_MS = 100;

async function ownerCookie(baseUrl: string): Promise<string> {
  const owner = DEMO_STAFF.find((s) => s.role === "owner")!;
  const res = await fetch(`${baseUrl}/api/auth/sign-in/email`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: baseUrl },
    body: JSON.stringify({ email: owner.email, password: DEMO_PASSWORD }),
  });
  if (!res.ok) throw new Error(`bench sign-in as ${owner.email} failed: ${res.status}`);
  return res.headers
    .getSetCookie()
    .map((c) => c.split(";")[0])
    .join("; ");
}

async function load(url: string, cookie: string, duration = SECONDS) {
  return autocannon({ url, connections: CONNECTIONS, duration, headers: { cookie } });
}

/** Runs against the app at `baseUrl`, whose database is DATABASE_URL. */
export async function benchTables(baseUrl: string): Promise<void> {
  console.log(
    `\norders table on ${ORDERS.toLocaleString("en-US")} orders, ${CONNECTIONS} connections, ${SECONDS} s each`,
  );
  if (!process.env.DATABASE_URL) {
    console.log("  skipped (needs DATABASE_URL; run through `npm run bench`)");
    return;
  }
  const added = await insertBenchOrders(process.env.DATABASE_URL, ORDERS);
  console.log(`  ${added ? `inserted ${added} bench orders` : "bench orders already there"}`);
  const cookie = await ownerCookie(baseUrl);
  const probe = await fetch(`${baseUrl}/api/tables/orders`, { headers: { cookie } });
  if (!(probe.headers.get("content-type") ?? "").includes("json")) {
    console.log(`  skipped — GET /api/tables/orders is not in this build (answered ${probe.status})`);
    return;
  }
  const { total } = (await probe.json()) as { total: number };
  console.log(`  the table counts ${total.toLocaleString("en-US")} orders`);

  const runs: [string, string, boolean][] = [
    ["GET /api/bench/noop (trivial handler)", "/api/bench/noop", false],
    ["GET /api/tables/orders (newest, 50 rows)", "/api/tables/orders", true],
    ["GET /api/tables/orders?late=1&sort=promised", "/api/tables/orders?late=1&sort=promised&dir=asc", true],
    [
      "GET /api/tables/orders?q=Bench%20customer%2042",
      "/api/tables/orders?q=Bench%20customer%2042&size=100",
      true,
    ],
    ["GET /desk/orders (the page, for comparison)", "/desk/orders", false],
  ];
  let floor = "";
  for (const [title, path, target] of runs) {
    await load(`${baseUrl}${path}`, cookie, 2); // warm-up
    const r = await load(`${baseUrl}${path}`, cookie);
    const pass = r.latency.p99 < TARGET_P99_MS && r.non2xx + r.errors + r.timeouts === 0;
    if (!floor) floor = httpFigure(r);
    addRow({
      what: `${title}, ${CONNECTIONS} connections, ${ORDERS.toLocaleString("en-US")} orders`,
      figure: httpFigure(r),
      floor: path === "/api/bench/noop" ? "(the floor)" : floor,
      target: target ? `p99 < ${TARGET_P99_MS} ms` : "",
      met: target ? pass : null,
    });
  }
}
