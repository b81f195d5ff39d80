/**
 * The orders table on 10k orders: GET /api/tables/orders (the JSON route handler behind the
 * orders table: the same parse and the same single statement as the page) at 20 concurrent
 * connections with autocannon, beside the trivial GET /api/bench/noop in the same run; the page
 * /desk/orders itself is shown for comparison. Target: p99 < 100 ms for the table route, in the
 * median of three rounds (every round's p99 is printed).
 */
import autocannon from "autocannon";
import { DEMO_PASSWORD, DEMO_STAFF } from "../lib/demo";
import { addRow, allClean, httpFigure, medianRound, ROUNDS, roundsFigure } from "./table";
import { insertBenchOrders } from "./tables-data";

const ORDERS = 10_000;
const CONNECTIONS = 20;
const SECONDS = 10;
const FLOOR_SECONDS = 5;
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
    `\norders table on ${ORDERS.toLocaleString("en-US")} orders, ${CONNECTIONS} connections, ${SECONDS} s a window, ${ROUNDS} rounds`,
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

  const noop = { title: "GET /api/bench/noop (trivial handler)", path: "/api/bench/noop" };
  const routes = [
    { title: "GET /api/tables/orders (newest, 50 rows)", path: "/api/tables/orders" },
    {
      title: "GET /api/tables/orders?late=1&sort=promised",
      path: "/api/tables/orders?late=1&sort=promised&dir=asc",
    },
    {
      title: "GET /api/tables/orders?q=Bench%20customer%2042",
      path: "/api/tables/orders?q=Bench%20customer%2042&size=100",
    },
  ];
  const label = (title: string) =>
    `${title}, ${CONNECTIONS} connections, ${ORDERS.toLocaleString("en-US")} orders`;
  for (const r of [noop, ...routes]) await load(`${baseUrl}${r.path}`, cookie, 2); // warm-up
  // Rounds of the trivial handler then each route, so that a slow spell of the machine falls on one
  // round of each rather than on one route (bench/table.ts `rounds`).
  type Run = Awaited<ReturnType<typeof load>>;
  const floors: Run[] = [];
  const runs: Run[][] = routes.map(() => []);
  for (let round = 0; round < ROUNDS; round++) {
    floors.push(await load(`${baseUrl}${noop.path}`, cookie, FLOOR_SECONDS));
    for (const [i, r] of routes.entries()) runs[i]!.push(await load(`${baseUrl}${r.path}`, cookie));
  }
  const floor = httpFigure(medianRound(floors));
  addRow({ what: label(noop.title), figure: floor, floor: "(the floor)", target: "", met: null });
  for (const [i, r] of routes.entries())
    addRow({
      what: label(r.title),
      figure: roundsFigure(runs[i]!),
      floor,
      target: `p99 < ${TARGET_P99_MS} ms`,
      met: medianRound(runs[i]!).latency.p99 < TARGET_P99_MS && allClean(runs[i]!),
    });
  // The page itself, once, for comparison (no target).
  const page = await load(`${baseUrl}/desk/orders`, cookie);
  addRow({
    what: label("GET /desk/orders (the page, for comparison)"),
    figure: httpFigure(page),
    floor,
    target: "",
    met: null,
  });
}
