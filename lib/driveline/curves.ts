/** Speed ratio against rotation over one turn, for plotting. */
import { designDirections } from "./design-geometry";
import { makeChain, chainSpeedRatiosAt, type Chain } from "./phasing";
import type { DesignFile } from "./schema";

export interface CurveSet {
  /** Input (transmission) rotation, deg, from the front joint's plane, 0..360. */
  readonly angleDeg: readonly number[];
  /** ω(out)/ω(in) of each joint within the chain, front to rear. */
  readonly joints: readonly { readonly position: string; readonly speedRatio: readonly number[] }[];
  /** ω(tube)/ω(transmission) for each tube. */
  readonly tubes: readonly (readonly number[])[];
  /** ω(pinion)/ω(transmission). */
  readonly output: readonly number[];
}

/** Sample a chain over one turn at `points` evenly spaced angles (both ends included). */
export function sampleChainCurves(chain: Chain, points = 181): CurveSet {
  const n = Math.max(2, Math.floor(points));
  const nJoints = chain.shafts.length - 1;
  const positions =
    nJoints === 2
      ? ["front", "rear"]
      : ["front", ...Array.from({ length: nJoints - 2 }, () => "centre"), "rear"];
  const angleDeg: number[] = [];
  const joints = positions.map((position) => ({ position, speedRatio: [] as number[] }));
  const tubes: number[][] = Array.from({ length: nJoints - 1 }, () => []);
  const output: number[] = [];
  for (let k = 0; k < n; k++) {
    const deg = (360 * k) / (n - 1);
    const r = chainSpeedRatiosAt(chain, (deg * Math.PI) / 180);
    angleDeg.push(deg);
    r.joints.forEach((v, i) => joints[i]!.speedRatio.push(v));
    for (let t = 0; t < tubes.length; t++) tubes[t]!.push(r.shafts[t + 1]!);
    output.push(r.shafts[nJoints]!);
  }
  return { angleDeg, joints, tubes, output };
}

/**
 * Curves of a one-piece design at its phase index (the design's phaseIndexDeg when given,
 * else the best index).
 */
export function sampleCurves(design: DesignFile, options?: { points?: number }): CurveSet {
  const u = designDirections(design);
  const shafts = [u.transmission, u.driveshaft, u.pinion];
  const chain =
    design.phaseIndexDeg != null
      ? makeChain(shafts, [(design.phaseIndexDeg * Math.PI) / 180])
      : makeChain(shafts);
  return sampleChainCurves(chain, options?.points);
}
