/**
 * Exact composition of a chain of Cardan joints (two for a one-piece shaft, three with a
 * centre support bearing). Shaft 0 is the transmission output (constant speed), the last
 * shaft is the pinion; the shafts between are driveshaft tubes.
 *
 * Each joint's speed ratio depends only on its input cross-arm's angle θᵢ from the joint
 * plane: rᵢ = cos βᵢ / (1 − sin²βᵢ cos²θᵢ). The arm on the joint's output shaft is normal to
 * both the input arm and the output axis; a tube's rear arm is its front arm turned by the
 * tube's phase index about the tube axis. Following the arms turn by turn is exact in 3-D.
 */
import { equivalentAngleRad } from "./cardan";
import { angleBetweenRad, cross, dot, normalise, phaseIndexRad, sub, scale, type Vec3 } from "./geometry";

/** Per-joint constants of a chain, precomputed once per geometry. */
export interface Chain {
  /** Shaft directions, front to rear (length = joints + 1). */
  readonly shafts: readonly Vec3[];
  /** Phase index of each intermediate shaft (rad), length = joints − 1. */
  readonly phaseIndexRad: readonly number[];
  readonly workingAngleRad: readonly number[];
}

/** Result of one turn of a chain at constant input speed. */
export interface ChainResponse {
  /** (max − min) of ω(output)/ω(input), a fraction. */
  readonly outputPeakToPeak: number;
  readonly outputMaxRatio: number;
  readonly outputMinRatio: number;
  /** Peak |dRⱼ/dθ| of each intermediate shaft j (times ω² → rad/s²). */
  readonly tubePeakRatioDerivative: readonly number[];
  /** Peak |dR/dθ| of the output (last) shaft: the net output's acceleration over ω². */
  readonly outputPeakRatioDerivative: number;
}

const SAMPLES_PER_HALF_TURN = 90;
// The ratio has period π in θ (every term is a square), so half a turn at 2° covers it;
// parabolic refinement of the extremes keeps the error below 1e-4 relative.
const COS_TABLE = new Float64Array(SAMPLES_PER_HALF_TURN);
const SIN_TABLE = new Float64Array(SAMPLES_PER_HALF_TURN);
for (let i = 0; i < SAMPLES_PER_HALF_TURN; i++) {
  COS_TABLE[i] = Math.cos((i * Math.PI) / SAMPLES_PER_HALF_TURN);
  SIN_TABLE[i] = Math.sin((i * Math.PI) / SAMPLES_PER_HALF_TURN);
}

/** Best phase indices (rad) for each intermediate shaft: the angle between its joints' planes. */
export function bestPhaseIndicesRad(shafts: readonly Vec3[]): number[] {
  const out: number[] = [];
  for (let j = 1; j < shafts.length - 1; j++) {
    out.push(phaseIndexRad(shafts[j - 1]!, shafts[j]!, shafts[j + 1]!));
  }
  return out;
}

/** Build a chain from shaft directions; phase indices default to the best ones. */
export function makeChain(shafts: readonly Vec3[], phaseIndicesRad?: readonly number[]): Chain {
  if (shafts.length < 2) throw new RangeError("a chain needs at least two shafts");
  const workingAngleRad: number[] = [];
  for (let i = 1; i < shafts.length; i++) workingAngleRad.push(angleBetweenRad(shafts[i - 1]!, shafts[i]!));
  const phases = phaseIndicesRad ?? bestPhaseIndicesRad(shafts);
  if (phases.length !== shafts.length - 2) throw new RangeError("one phase index per intermediate shaft");
  return { shafts, phaseIndexRad: phases, workingAngleRad };
}

interface JointConstants {
  a: Vec3; // input axis
  b: Vec3; // output axis
  w: Vec3; // unit trace of the joint plane normal to a (θ = 0 direction)
  v: Vec3; // a × w (θ = 90° direction, right-hand about a)
  cosBeta: number;
  sin2Beta: number;
}

/** Any unit vector normal to `a` (used when a joint is straight and has no plane). */
function anyNormal(a: Vec3): Vec3 {
  const t = Math.abs(a.x) < 0.9 ? { x: 1, y: 0, z: 0 } : { x: 0, y: 0, z: 1 };
  return normalise(sub(t, scale(a, dot(t, a))));
}

function jointConstants(chain: Chain): JointConstants[] {
  const out: JointConstants[] = [];
  for (let i = 1; i < chain.shafts.length; i++) {
    const a = chain.shafts[i - 1]!;
    const b = chain.shafts[i]!;
    const trace = sub(b, scale(a, dot(a, b)));
    const w = dot(trace, trace) > 1e-24 ? normalise(trace) : anyNormal(a);
    const beta = chain.workingAngleRad[i - 1]!;
    out.push({ a, b, w, v: cross(a, w), cosBeta: Math.cos(beta), sin2Beta: Math.sin(beta) ** 2 });
  }
  return out;
}

/**
 * State of every joint at input angle θ (measured from the front joint's plane).
 * Calls `visit(i, cosθᵢ, sinθᵢ, armOnOutput)` per joint; used by the sampler and the curves.
 */
function walkChain(
  joints: readonly JointConstants[],
  phases: readonly number[],
  cosTheta: number,
  sinTheta: number,
  visit: (i: number, c: number, s: number) => void,
): void {
  // Input arm on shaft 0: cos θ·w₀ + sin θ·v₀ (right-hand rotation about the input axis).
  const j0 = joints[0]!;
  let ex = cosTheta * j0.w.x + sinTheta * j0.v.x;
  let ey = cosTheta * j0.w.y + sinTheta * j0.v.y;
  let ez = cosTheta * j0.w.z + sinTheta * j0.v.z;
  for (let i = 0; i < joints.length; i++) {
    const j = joints[i]!;
    visit(i, ex * j.w.x + ey * j.w.y + ez * j.w.z, ex * j.v.x + ey * j.v.y + ez * j.v.z);
    if (i === joints.length - 1) break;
    // Arm on the output shaft: b × e, normalised (unit since e ⊥ a, and |b × e| > 0).
    const b = j.b;
    let fx = b.y * ez - b.z * ey;
    let fy = b.z * ex - b.x * ez;
    let fz = b.x * ey - b.y * ex;
    const inv = 1 / Math.sqrt(fx * fx + fy * fy + fz * fz);
    fx *= inv;
    fy *= inv;
    fz *= inv;
    // Rear arm of that shaft: f turned by the phase index about b.
    const d = phases[i]!;
    const cd = Math.cos(d);
    const sd = Math.sin(d);
    const gx = b.y * fz - b.z * fy;
    const gy = b.z * fx - b.x * fz;
    const gz = b.x * fy - b.y * fx;
    ex = cd * fx + sd * gx;
    ey = cd * fy + sd * gy;
    ez = cd * fz + sd * gz;
  }
}

/** Parabolic refinement of a sampled extreme at index k on a periodic grid. */
function refinePeak(y: Float64Array, k: number): number {
  const n = y.length;
  const y0 = y[k]!;
  const ym = y[(k - 1 + n) % n]!;
  const yp = y[(k + 1) % n]!;
  const curvature = yp - 2 * y0 + ym;
  if (curvature === 0) return y0;
  return y0 - ((yp - ym) * (yp - ym)) / (8 * curvature);
}

const STRIDE = 13;
const scratchRatio = new Float64Array(SAMPLES_PER_HALF_TURN);
const scratchOutputDerivative = new Float64Array(SAMPLES_PER_HALF_TURN);
const scratchDerivative: Float64Array[] = [];

/**
 * One turn of the chain at constant input speed: output speed variation and the peak
 * |dR/dθ| of each tube (R = tube speed / input speed). Sampled at 2° over the half-turn
 * period, extremes refined by a parabola through the neighbours.
 */
export function chainResponse(chain: Chain): ChainResponse {
  return sampleChain(chain, true);
}

/**
 * Only the output's speed variation, (max − min) of ω(output)/ω(input): chainResponse's
 * `outputPeakToPeak` without the derivatives (the in-phase comparison reads nothing else).
 */
export function chainOutputPeakToPeak(chain: Chain): number {
  return sampleChain(chain, false).outputPeakToPeak;
}

function sampleChain(chain: Chain, derivatives: boolean): ChainResponse {
  const joints = jointConstants(chain);
  const nJoints = joints.length;
  const nTubes = nJoints - 1;
  while (scratchDerivative.length < nTubes) scratchDerivative.push(new Float64Array(SAMPLES_PER_HALF_TURN));
  // Flatten the per-joint constants: the hot loop then reads one typed array.
  const K = new Float64Array(nJoints * STRIDE);
  for (let i = 0; i < nJoints; i++) {
    const j = joints[i]!;
    const o = i * STRIDE;
    K[o] = j.w.x;
    K[o + 1] = j.w.y;
    K[o + 2] = j.w.z;
    K[o + 3] = j.v.x;
    K[o + 4] = j.v.y;
    K[o + 5] = j.v.z;
    K[o + 6] = j.b.x;
    K[o + 7] = j.b.y;
    K[o + 8] = j.b.z;
    K[o + 9] = j.cosBeta;
    K[o + 10] = j.sin2Beta;
    K[o + 11] = i < nTubes ? Math.cos(chain.phaseIndexRad[i]!) : 1;
    K[o + 12] = i < nTubes ? Math.sin(chain.phaseIndexRad[i]!) : 0;
  }
  const w0x = K[0]!,
    w0y = K[1]!,
    w0z = K[2]!,
    v0x = K[3]!,
    v0y = K[4]!,
    v0z = K[5]!;
  for (let k = 0; k < SAMPLES_PER_HALF_TURN; k++) {
    const ct = COS_TABLE[k]!;
    const st = SIN_TABLE[k]!;
    let ex = ct * w0x + st * v0x;
    let ey = ct * w0y + st * v0y;
    let ez = ct * w0z + st * v0z;
    // Running product R and its θ-derivative D through the chain:
    // R_i = R_{i−1}·r_i, D_i = D_{i−1}·r_i + R_{i−1}²·dr_i/dθ_i (θ_i turns at R_{i−1}·dθ).
    let ratio = 1;
    let deriv = 0;
    for (let i = 0, o = 0; i < nJoints; i++, o += STRIDE) {
      const c = ex * K[o]! + ey * K[o + 1]! + ez * K[o + 2]!;
      const s = ex * K[o + 3]! + ey * K[o + 4]! + ez * K[o + 5]!;
      const cosBeta = K[o + 9]!;
      const sin2Beta = K[o + 10]!;
      const den = 1 - sin2Beta * c * c;
      const r = cosBeta / den;
      if (derivatives) {
        const dr = (-cosBeta * sin2Beta * 2 * s * c) / (den * den);
        deriv = deriv * r + ratio * ratio * dr;
      }
      ratio *= r;
      if (i === nTubes) break;
      if (derivatives) scratchDerivative[i]![k] = deriv < 0 ? -deriv : deriv;
      // Arm on the output shaft: b × e, normalised; then turned by the phase index about b.
      const bx = K[o + 6]!,
        by = K[o + 7]!,
        bz = K[o + 8]!;
      let fx = by * ez - bz * ey;
      let fy = bz * ex - bx * ez;
      let fz = bx * ey - by * ex;
      const inv = 1 / Math.sqrt(fx * fx + fy * fy + fz * fz);
      fx *= inv;
      fy *= inv;
      fz *= inv;
      const cd = K[o + 11]!;
      const sd = K[o + 12]!;
      ex = cd * fx + sd * (by * fz - bz * fy);
      ey = cd * fy + sd * (bz * fx - bx * fz);
      ez = cd * fz + sd * (bx * fy - by * fx);
    }
    scratchRatio[k] = ratio;
    scratchOutputDerivative[k] = deriv < 0 ? -deriv : deriv;
  }
  let kMax = 0;
  let kMin = 0;
  for (let k = 1; k < SAMPLES_PER_HALF_TURN; k++) {
    if (scratchRatio[k]! > scratchRatio[kMax]!) kMax = k;
    if (scratchRatio[k]! < scratchRatio[kMin]!) kMin = k;
  }
  const outputMaxRatio = refinePeak(scratchRatio, kMax);
  const outputMinRatio = refinePeak(scratchRatio, kMin);
  const spread = outputMaxRatio - outputMinRatio;
  // Below 1e-12 the spread is rounding noise of an exact cancellation.
  const outputPeakToPeak = spread > 1e-12 ? spread : 0;
  if (!derivatives)
    return {
      outputPeakToPeak,
      outputMaxRatio,
      outputMinRatio,
      tubePeakRatioDerivative: [],
      outputPeakRatioDerivative: NaN,
    };
  const tubePeakRatioDerivative: number[] = [];
  for (let t = 0; t < nTubes; t++) {
    const d = scratchDerivative[t]!;
    let kd = 0;
    for (let k = 1; k < SAMPLES_PER_HALF_TURN; k++) if (d[k]! > d[kd]!) kd = k;
    tubePeakRatioDerivative.push(refinePeak(d, kd));
  }
  let ko = 0;
  for (let k = 1; k < SAMPLES_PER_HALF_TURN; k++)
    if (scratchOutputDerivative[k]! > scratchOutputDerivative[ko]!) ko = k;
  const outputDerivative = refinePeak(scratchOutputDerivative, ko);
  return {
    outputPeakRatioDerivative: outputDerivative > 1e-12 ? outputDerivative : 0,
    outputPeakToPeak,
    outputMaxRatio,
    outputMinRatio,
    tubePeakRatioDerivative,
  };
}

/**
 * Speed ratios along the chain at input angle θ (rad, from the front joint's plane):
 * `joints[i]` = ω(shaft i+1)/ω(shaft i), `shafts[j]` = ω(shaft j)/ω(input).
 */
export function chainSpeedRatiosAt(chain: Chain, thetaRad: number): { joints: number[]; shafts: number[] } {
  const joints = jointConstants(chain);
  const jr: number[] = [];
  const sr: number[] = [1];
  let product = 1;
  walkChain(joints, chain.phaseIndexRad, Math.cos(thetaRad), Math.sin(thetaRad), (i, c) => {
    const j = joints[i]!;
    const r = j.cosBeta / (1 - j.sin2Beta * c * c);
    jr.push(r);
    product *= r;
    sr.push(product);
  });
  return { joints: jr, shafts: sr };
}

/**
 * Angular position (rad, in −π..π) of every shaft at input angle θ, by following the cross
 * arms geometrically — no speed-ratio formula involved. Tests differentiate it numerically.
 * Each shaft's angle is that of its front arm in a fixed frame normal to its axis.
 */
export function chainShaftAnglesRad(chain: Chain, thetaRad: number): number[] {
  const joints = jointConstants(chain);
  const angles: number[] = [thetaRad];
  const c = Math.cos(thetaRad);
  const s = Math.sin(thetaRad);
  const j0 = joints[0]!;
  let e: Vec3 = {
    x: c * j0.w.x + s * j0.v.x,
    y: c * j0.w.y + s * j0.v.y,
    z: c * j0.w.z + s * j0.v.z,
  };
  for (let i = 0; i < joints.length; i++) {
    const b = joints[i]!.b;
    const f = normalise(cross(b, e));
    const ref = anyNormal(b);
    angles.push(Math.atan2(dot(cross(ref, f), b), dot(ref, f)));
    if (i < joints.length - 1) {
      const d = chain.phaseIndexRad[i]!;
      const g = cross(b, f);
      e = {
        x: Math.cos(d) * f.x + Math.sin(d) * g.x,
        y: Math.cos(d) * f.y + Math.sin(d) * g.y,
        z: Math.cos(d) * f.z + Math.sin(d) * g.z,
      };
    }
  }
  return angles;
}

/** Phasing summary for the report. */
export interface PhasingResult {
  readonly phaseIndexDeg: number;
  readonly outputSpeedVariationPct: number;
  readonly equivalentAngleDeg: number;
  /** √|β₁² − β₂²|-style small-angle estimate (SAE AE-7 form), for comparison. */
  readonly equivalentAngleSmallAngleDeg: number;
  readonly outputMaxSpeedRatio: number;
  readonly outputMinSpeedRatio: number;
}

const DEG = 180 / Math.PI;

/**
 * Small-angle equivalent angle (rad): √|Σ ±βᵢ²|, the sign of each joint alternating along an
 * in-phase chain (SAE AE-7, from memory). Valid only with the joints' planes aligned by phasing.
 */
export function smallAngleEquivalentRad(workingAnglesRad: readonly number[]): number {
  let sum = 0;
  workingAnglesRad.forEach((b, i) => (sum += (i % 2 === 0 ? 1 : -1) * b * b));
  return Math.sqrt(Math.abs(sum));
}

/** Summarise a chain's response: variation %, equivalent angle, extremes. */
export function phasingResult(chain: Chain, response: ChainResponse): PhasingResult {
  return {
    phaseIndexDeg: (chain.phaseIndexRad[0] ?? 0) * DEG,
    outputSpeedVariationPct: response.outputPeakToPeak * 100,
    equivalentAngleDeg: equivalentAngleRad(response.outputPeakToPeak) * DEG,
    equivalentAngleSmallAngleDeg: smallAngleEquivalentRad(chain.workingAngleRad) * DEG,
    outputMaxSpeedRatio: response.outputMaxRatio,
    outputMinSpeedRatio: response.outputMinRatio,
  };
}
