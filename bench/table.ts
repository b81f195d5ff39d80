/**
 * The one table `npm run bench` prints: each figure beside the floor measured in the same run
 * (the trivial route handler for routes, `select 1` for queries, the closed forms for the core, a
 * blank page with the same fonts for the PDF) and its target. Benches add rows; run.ts prints.
 */
export interface BenchRow {
  /** What was measured ("POST /api/designs/evaluate, 300 req/s"). */
  readonly what: string;
  /** The figure(s), already formatted ("p50 4 ms · p99 12 ms · 298 req/s"). */
  readonly figure: string;
  /** The floor measured in the same run, formatted; "" when none applies. */
  readonly floor: string;
  /** The target in words; "" for rows shown for comparison. */
  readonly target: string;
  /** Whether the target was met; null for comparison rows. */
  readonly met: boolean | null;
}

const rows: BenchRow[] = [];

export function addRow(row: BenchRow): void {
  rows.push(row);
  // Progress while the run goes on (the table comes at the end).
  console.log(`  ${row.what}: ${row.figure}${row.met === false ? "  (over target)" : ""}`);
}

const cell = (t: string): string => t.replace(/\|/g, "\\|");

/** The markdown table of every row so far (pasted into the README after a run). */
export function benchTable(): string {
  const lines = ["| what | figure | floor, same run | target | met |", "|---|---|---|---|---|"];
  for (const r of rows) {
    const met = r.met === null ? "–" : r.met ? "yes" : "**no**";
    lines.push(`| ${cell(r.what)} | ${cell(r.figure)} | ${cell(r.floor)} | ${cell(r.target)} | ${met} |`);
  }
  return lines.join("\n");
}

/** "p50 4 ms · p99 12 ms · 298 req/s" (+ failures) from an autocannon result. */
export function httpFigure(r: {
  latency: { p50: number; p99: number };
  requests: { average: number };
  non2xx: number;
  errors: number;
  timeouts: number;
}): string {
  const bad = r.non2xx + r.errors + r.timeouts;
  return `p50 ${r.latency.p50} ms · p99 ${r.latency.p99} ms · ${Math.round(r.requests.average)} req/s${bad ? ` · ${bad} FAILED` : ""}`;
}
