/** Engineering-core benchmark: evaluations per second and ranking time, with the targets. */
import { readFileSync } from "node:fs";
import {
  criticalSpeedRpm,
  defaultCatalogue,
  evaluateDesign,
  parseDesign,
  permissibleUnbalanceGmm,
  rankTubes,
  torsionShearStressMPa,
  type DesignFile,
} from "../lib/driveline";
import { addRow, median } from "./table";

const TARGET_EVAL_US = 20;
const TARGET_RANK_MS = 2;

function loadExample(name: string): DesignFile {
  const parsed = parseDesign(
    JSON.parse(readFileSync(new URL(`../examples/${name}`, import.meta.url), "utf8")),
  );
  if (!parsed.ok) throw new Error(parsed.issues.map((i) => i.message).join("\n"));
  return parsed.design;
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

/** Print evaluation and ranking figures beside their targets. */
export async function benchDriveline(): Promise<void> {
  const street = loadExample("street-truck.json");
  const compound = loadExample("compound-offset.json");
  // Three passes over both designs, a few seconds apart; each figure is its best pass's median, so
  // a slow spell of this shared machine (the app starting beside it, a vacuum) spoils one pass at most.
  let evalUs = Infinity;
  let compoundUs = Infinity;
  for (let pass = 0; pass < 3; pass++) {
    evalUs = Math.min(
      evalUs,
      timeUs(() => evaluateDesign(street), 2000, 25),
    );
    compoundUs = Math.min(
      compoundUs,
      timeUs(() => evaluateDesign(compound), 2000, 25),
    );
  }
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
  // The floor: the closed forms alone (critical speed, torsion, balance) for the same tube.
  const tube = { odMm: 88.9, wallMm: 2.108 };
  const closedUs = timeUs(
    () =>
      criticalSpeedRpm({ ...tube, spanMm: 1320.8, elasticModulusGPa: 200, densityKgM3: 7870 }) +
      torsionShearStressMPa(tube, 3366) +
      permissibleUnbalanceGmm(16, 9.8, 5566),
    20000,
    25,
  );
  const floor = `closed forms: ${closedUs.toFixed(3)} µs`;
  console.log("\ndriveline core (one core)");
  addRow({
    what: "evaluateDesign, tube given (street truck)",
    figure: `${evalUs.toFixed(2)} µs/eval · ${(1e6 / evalUs).toFixed(0)} evals/s`,
    floor,
    target: `≤ ${TARGET_EVAL_US} µs`,
    met: evalUs <= TARGET_EVAL_US,
  });
  addRow({
    what: "evaluateDesign, compound offset + slip",
    figure: `${compoundUs.toFixed(2)} µs/eval`,
    floor,
    target: `≤ ${TARGET_EVAL_US} µs`,
    met: compoundUs <= TARGET_EVAL_US,
  });
  addRow({
    what: "evaluateDesign, tube picked (ranking included)",
    figure: `${(pickUs / 1000).toFixed(3)} ms/eval`,
    floor,
    target: "",
    met: null,
  });
  addRow({
    what: `rankTubes, ${defaultCatalogue.tubes.length} tubes`,
    figure: `${(rankUs / 1000).toFixed(3)} ms`,
    floor,
    target: `≤ ${TARGET_RANK_MS} ms`,
    met: rankUs / 1000 <= TARGET_RANK_MS,
  });
}
