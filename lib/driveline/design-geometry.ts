/** Shaft directions of a design, in vehicle axes. */
import { normalise, shaftDirection, sub, type Vec3 } from "./geometry";
import type { DesignFile } from "./schema";

export interface DesignDirections {
  readonly transmission: Vec3;
  readonly driveshaft: Vec3;
  readonly pinion: Vec3;
}

/**
 * Transmission, driveshaft and pinion axes. The driveshaft comes from its measured angles,
 * else from the two joint centres (the schema guarantees one of them).
 */
export function designDirections(design: DesignFile): DesignDirections {
  const g = design.geometry;
  let driveshaft: Vec3;
  if (g.driveshaft) driveshaft = shaftDirection(g.driveshaft);
  else if (g.frontJointCentreMm && g.rearJointCentreMm)
    driveshaft = normalise(sub(g.rearJointCentreMm, g.frontJointCentreMm));
  else throw new TypeError("geometry.driveshaft is required unless both joint centres are given");
  return { transmission: shaftDirection(g.transmission), driveshaft, pinion: shaftDirection(g.pinion) };
}
