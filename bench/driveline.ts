/** Engineering-core benchmark: evaluations per second and ranking time, with the targets. */
import { readFileSync } from "node:fs";
import { defaultCatalogue, evaluateDesign, parseDesign, rankTubes, type DesignFile } from "../lib/driveline";

const TARGET_EVAL_US = 20;
const TARGET_RANK_MS = 2;

function loadExample(name: string): DesignFile {
  const parsed = parseDesign(
    JSON.parse(readFileSync(new URL(`../examples/${name}`, import.meta.url), "utf8")),
  );
  if (!parsed.ok) throw new Error(parsed.issues.map((i) => i.message).join("\n"));
  return parsed.design;
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

/** Time `fn` in batches; returns the median µs per call. */
function timeUs(fn: () => unknown, batch: number, rounds: number): number {
  for (let i = 0; i < batch; i++) fn(); // warm-up
  const perCall: number[] = [];
  for (let r = 0; r < rounds; r++) {
    const t0 = process.hrtime.bigint();
    for (let i = 0; i < batch; i++) fn();
    perCall.push(Number(process.hrtime.bigint() - t0) / 1000 / batch);
  }
  return median(perCall);
}

const mark = (ok: boolean): string => (ok ? "ok" : "OVER TARGET");

/** Print evaluation and ranking figures beside their targets. */
export async function benchDriveline(): Promise<void> {
  const street = loadExample("street-truck.json");
  const compound = loadExample("compound-offset.json");
  const evalUs = timeUs(() => evaluateDesign(street), 2000, 25);
  const compoundUs = timeUs(() => evaluateDesign(compound), 2000, 25);
  const { tube: _tube, ...noTube } = street;
  const pickUs = timeUs(() => evaluateDesign(noTube), 500, 15);
  const rankUs = timeUs(
    () =>
      rankTubes({
        spanMm: street.lengthMm,
        maxShaftRpm: 5566,
        peakShaftTorqueNm: 3366,
        catalogue: defaultCatalogue,
      }),
    500,
    15,
  );
  console.log("driveline core (one core)");
  console.log(
    `  evaluateDesign, tube given:     ${(1e6 / evalUs).toFixed(0)} evals/s, median ${evalUs.toFixed(2)} µs/eval (target ≤ ${TARGET_EVAL_US} µs) ${mark(evalUs <= TARGET_EVAL_US)}`,
  );
  console.log(
    `  evaluateDesign, compound+slip:  ${(1e6 / compoundUs).toFixed(0)} evals/s, median ${compoundUs.toFixed(2)} µs/eval (target ≤ ${TARGET_EVAL_US} µs) ${mark(compoundUs <= TARGET_EVAL_US)}`,
  );
  console.log(
    `  evaluateDesign, tube picked:    median ${(pickUs / 1000).toFixed(3)} ms/eval (ranking included)`,
  );
  console.log(
    `  rankTubes, ${defaultCatalogue.tubes.length} tubes:            median ${(rankUs / 1000).toFixed(3)} ms (target ≤ ${TARGET_RANK_MS} ms) ${mark(rankUs / 1000 <= TARGET_RANK_MS)}`,
  );
}
