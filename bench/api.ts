/**
 * Evaluate and quote against the trivial handler (GET /api/bench/noop) in the same run:
 * throughput flat out with autocannon (target ≥ 80 % of the trivial handler's) and latency at a
 * steady 300 requests/s (bench/steady.ts, in three rounds; target p99 < 25 ms in the median one).
 */
import autocannon from "autocannon";
import { steady } from "./steady";
import { readFileSync } from "node:fs";
import { addRow, allClean, httpFigure, median, medianRound, rounds, roundsFigure } from "./table";

const RATE = 300;
const SECONDS = 8;
const CONNECTIONS = 20;
const TARGET_P99_MS = 25;
const TARGET_RATIO = 0.8;
/** Flat-out windows: PAIRS pairs of the trivial handler and the route, WINDOW seconds each. */
const PAIRS = 6;
const WINDOW = 4;
const design = JSON.parse(readFileSync("examples/street-truck.json", "utf8")) as unknown;

type Options = { url: string; body?: unknown; rate?: number; duration?: number };
const asPost = (body: unknown) =>
  body === undefined
    ? {}
    : {
        method: "POST" as const,
        headers: { "content-type": "application/json" },
        body: JSON.stringify(body),
      };
const load = ({ url, body, rate, duration = SECONDS }: Options) =>
  rate
    ? steady({ url, rate, seconds: duration, ...asPost(body) })
    : autocannon({ url, connections: CONNECTIONS, duration, ...asPost(body) });

const flatOut = (url: string, body: unknown, duration: number) =>
  autocannon({ url, connections: CONNECTIONS, duration, ...asPost(body) });

/** Runs against the app at `baseUrl` (scripts/bench.sh starts one of its own). */
export async function benchApi(baseUrl: string): Promise<void> {
  console.log(
    `\nevaluate and quote, ${SECONDS} s per run, ${CONNECTIONS} connections flat out, against ${baseUrl}`,
  );
  const noop = `${baseUrl}/api/bench/noop`;
  // The trivial POST reads the same body as evaluate and answers {ok}: what a request body costs by
  // itself (Next.js hands it to the handler as a web stream), shown beside the GET floor, no target.
  const routes = [
    {
      what: "POST /api/bench/noop (trivial handler, reads the same body)",
      url: noop,
      body: design,
      noTarget: true,
    },
    { what: "POST /api/designs/evaluate", url: `${baseUrl}/api/designs/evaluate`, body: design },
    {
      what: "POST /api/designs/quote",
      url: `${baseUrl}/api/designs/quote`,
      body: { design, fulfilment: "ship" },
    },
  ];
  // Warm the server (route chunks, JIT, connection pool) before measuring.
  await load({ url: noop, duration: 2 });
  for (const r of routes) await load({ url: r.url, body: r.body, duration: 3 });

  const floorMax = await load({ url: noop });
  const floorRate = await load({ url: noop, rate: RATE });
  addRow({
    what: "GET /api/bench/noop (trivial handler), flat out",
    figure: httpFigure(floorMax),
    floor: "(the floor)",
    target: "",
    met: null,
  });
  addRow({
    what: `GET /api/bench/noop (trivial handler), steady ${RATE} req/s`,
    figure: httpFigure(floorRate),
    floor: "(the floor)",
    target: "",
    met: null,
  });
  // The machine is shared and its speed drifts and jumps within a run, so each route's flat-out
  // throughput is taken in short windows alternating with the trivial handler's (noop, route,
  // route, noop, …): each pair gives a ratio, and the median of the pairs is the figure.
  for (const r of routes) {
    const ratios: number[] = [];
    const runs: Awaited<ReturnType<typeof autocannon>>[] = [];
    const floors: number[] = [];
    for (let pair = 0; pair < PAIRS; pair++) {
      const order = pair % 2 === 0 ? ["noop", "route"] : ["route", "noop"];
      let noopRate = 0;
      let routeRun: Awaited<ReturnType<typeof autocannon>> | null = null;
      for (const which of order) {
        if (which === "noop") noopRate = (await flatOut(noop, undefined, WINDOW)).requests.average;
        else routeRun = await flatOut(r.url, r.body, WINDOW);
      }
      ratios.push(routeRun!.requests.average / noopRate);
      runs.push(routeRun!);
      floors.push(noopRate);
    }
    const ratio = median(ratios);
    const max = runs[ratios.indexOf(ratio)]!;
    addRow({
      what: `${r.what}, flat out`,
      figure: `${httpFigure(max)} · ${(ratio * 100).toFixed(0)} % of the floor (median of ${PAIRS} pairs, ${ratios.map((x) => (x * 100).toFixed(0)).join("/")} %)`,
      floor: `${Math.round(floors[ratios.indexOf(ratio)]!)} req/s (trivial handler, the window beside it)`,
      target: r.noTarget ? "" : `≥ ${TARGET_RATIO * 100} % of the floor's throughput`,
      met: r.noTarget ? null : ratio >= TARGET_RATIO && allClean(runs),
    });
    if (r.noTarget) continue;
    const fixed = await rounds(() => load({ url: r.url, body: r.body, rate: RATE }));
    addRow({
      what: `${r.what}, steady ${RATE} req/s`,
      figure: roundsFigure(fixed),
      floor: `p99 ${floorRate.latency.p99} ms`,
      target: `p99 < ${TARGET_P99_MS} ms`,
      met: medianRound(fixed).latency.p99 < TARGET_P99_MS && allClean(fixed),
    });
  }
}
