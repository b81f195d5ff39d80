/**
 * Shaft directions and joint geometry. Vehicle axes: x rearward, y right, z up.
 * A shaft is measured as a side-view slope (verticalDeg, + descending rearward) and a
 * top-view angle (horizontalDeg, + turning right rearward): u = normalise(1, tan h, −tan v).
 */

export interface Vec3 {
  readonly x: number;
  readonly y: number;
  readonly z: number;
}

/** Projected angles of one shaft axis, as a shop measures them. */
export interface ShaftAngles {
  readonly verticalDeg: number;
  readonly horizontalDeg: number;
}

const RAD_PER_DEG = Math.PI / 180;

export const vec = (x: number, y: number, z: number): Vec3 => ({ x, y, z });
export const dot = (a: Vec3, b: Vec3): number => a.x * b.x + a.y * b.y + a.z * b.z;
export const cross = (a: Vec3, b: Vec3): Vec3 => ({
  x: a.y * b.z - a.z * b.y,
  y: a.z * b.x - a.x * b.z,
  z: a.x * b.y - a.y * b.x,
});
export const norm = (a: Vec3): number => Math.sqrt(a.x * a.x + a.y * a.y + a.z * a.z);
export const scale = (a: Vec3, k: number): Vec3 => ({ x: a.x * k, y: a.y * k, z: a.z * k });
export const sub = (a: Vec3, b: Vec3): Vec3 => ({ x: a.x - b.x, y: a.y - b.y, z: a.z - b.z });
export const add = (a: Vec3, b: Vec3): Vec3 => ({ x: a.x + b.x, y: a.y + b.y, z: a.z + b.z });

/** Unit vector of `a`; the zero vector stays zero. */
export function normalise(a: Vec3): Vec3 {
  const n = norm(a);
  return n === 0 ? a : scale(a, 1 / n);
}

/** Unit direction of a shaft from its projected angles (contract: normalise(1, tan h, −tan v)). */
export function shaftDirection(angles: ShaftAngles): Vec3 {
  return normalise({
    x: 1,
    y: Math.tan(angles.horizontalDeg * RAD_PER_DEG),
    z: -Math.tan(angles.verticalDeg * RAD_PER_DEG),
  });
}

/** Projected angles of a direction (inverse of {@link shaftDirection}); x must be > 0. */
export function projectedAngles(u: Vec3): ShaftAngles {
  return {
    verticalDeg: Math.atan2(-u.z, u.x) / RAD_PER_DEG,
    horizontalDeg: Math.atan2(u.y, u.x) / RAD_PER_DEG,
  };
}

/** True (3-D) angle between two shaft axes, radians. atan2 form stays accurate near 0. */
export function angleBetweenRad(a: Vec3, b: Vec3): number {
  return Math.atan2(norm(cross(a, b)), dot(a, b));
}

/** Normal of a joint's plane (the plane containing both of its shafts): uIn × uOut. */
export function jointPlaneNormal(uIn: Vec3, uOut: Vec3): Vec3 {
  return cross(uIn, uOut);
}

/**
 * Signed angle (radians, −π..π) that turns `from` onto `to` about `axis` by the right-hand
 * rule. Both vectors are projected onto the plane normal to the axis first.
 */
export function signedAngleAboutAxisRad(from: Vec3, to: Vec3, axis: Vec3): number {
  const a = normalise(axis);
  const f = sub(from, scale(a, dot(from, a)));
  const t = sub(to, scale(a, dot(to, a)));
  return Math.atan2(dot(cross(f, t), a), dot(f, t));
}

/** Below this |sin β| a joint has no defined plane (straight through). */
export const PLANE_EPSILON = 1e-9;

/**
 * Phase index of an intermediate shaft, radians in (−π/2, π/2]: the angle between the plane
 * of the joint at its front (uIn, uShaft) and the plane of the joint at its rear (uShaft, uOut),
 * measured about the shaft axis, positive by the right-hand rule about the rearward axis
 * (clockwise looking rearward). Turning the rear yoke by this angle from in-phase restores
 * the planar (Z/W) cancellation. Zero when either joint is straight.
 */
export function phaseIndexRad(uIn: Vec3, uShaft: Vec3, uOut: Vec3): number {
  const n1 = jointPlaneNormal(uIn, uShaft);
  const n2 = jointPlaneNormal(uShaft, uOut);
  if (norm(n1) < PLANE_EPSILON || norm(n2) < PLANE_EPSILON) return 0;
  return reduceHalfTurnRad(signedAngleAboutAxisRad(n1, n2, uShaft));
}

/** Reduce an angle to (−π/2, π/2]: a yoke index is defined modulo a half turn. */
export function reduceHalfTurnRad(angleRad: number): number {
  let a = angleRad % Math.PI;
  if (a <= -Math.PI / 2) a += Math.PI;
  else if (a > Math.PI / 2) a -= Math.PI;
  return a;
}
