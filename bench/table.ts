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

/** The middle value (the lower of the two middle ones for an even count). */
export function median(xs: readonly number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor((s.length - 1) / 2)]!;
}

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

/** What httpFigure reads of an autocannon (or bench/steady.ts) result. */
interface HttpRun {
  latency: { p50: number; p99: number };
  requests: { average: number };
  non2xx: number;
  errors: number;
  timeouts: number;
}

/** "p50 4 ms · p99 12 ms · 298 req/s" (+ failures) from an autocannon result. */
export function httpFigure(r: HttpRun): string {
  const bad = r.non2xx + r.errors + r.timeouts;
  return `p50 ${r.latency.p50} ms · p99 ${r.latency.p99} ms · ${Math.round(r.requests.average)} req/s${bad ? ` · ${bad} FAILED` : ""}`;
}

/** How many rounds a latency target is measured in (see `rounds`). */
export const ROUNDS = 3;

/**
 * Runs one load ROUNDS times. The machine is shared and its speed jumps within a run (a stall of
 * half a second spoils one window's p99), so a latency target is judged on the round with the
 * median p99, every round's p99 printed beside it (`roundsFigure`).
 */
export async function rounds<T extends HttpRun>(load: () => Promise<T>): Promise<T[]> {
  const runs: T[] = [];
  for (let i = 0; i < ROUNDS; i++) runs.push(await load());
  return runs;
}

/** The round with the median p99. */
export function medianRound<T extends HttpRun>(runs: readonly T[]): T {
  const p99s = runs.map((r) => r.latency.p99);
  return runs[p99s.indexOf(median(p99s))]!;
}

/** httpFigure of the median round, with every round's p99 beside it. */
export function roundsFigure(runs: readonly HttpRun[]): string {
  return `${httpFigure(medianRound(runs))} (median of ${runs.length} rounds; p99 ${runs.map((r) => r.latency.p99).join(" / ")} ms)`;
}

/** No round had a failed request. */
export const allClean = (runs: readonly HttpRun[]): boolean =>
  runs.every((r) => r.non2xx + r.errors + r.timeouts === 0);
