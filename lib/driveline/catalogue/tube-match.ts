/**
 * When a tube given by size (a design file, the builder's selects, a suggestion) is a catalogue
 * tube. Sizes arrive in millimetres converted from inches and rounded (3.500 in → 88.9 mm; a file
 * may say 88.90 or 88.9000001), so an exact comparison would miss; the tolerances below absorb
 * that rounding and stay far below the step between neighbouring catalogue sizes (1/8 in = 3.175 mm
 * between outside diameters, about 0.2 mm between walls) — Yokeline defaults, common shop practice
 * of reading a size to the last printed digit.
 */
import type { Catalogue, TubeSize } from "./types";

/** An outside diameter within this of a catalogue tube's is that tube's, mm (strictly less). */
export const TUBE_OD_MATCH_TOLERANCE_MM = 0.05;
/** A wall within this of a catalogue tube's is that tube's, mm (strictly less). */
export const TUBE_WALL_MATCH_TOLERANCE_MM = 0.01;

/** A tube named by material and size. */
export interface TubeSpec {
  readonly materialId: string;
  readonly odMm: number;
  readonly wallMm: number;
}

/** Whether two outside diameters are the same catalogue size. */
export const sameTubeOd = (a: number, b: number): boolean => Math.abs(a - b) < TUBE_OD_MATCH_TOLERANCE_MM;

/** Whether two walls are the same catalogue size. */
export const sameTubeWall = (a: number, b: number): boolean => Math.abs(a - b) < TUBE_WALL_MATCH_TOLERANCE_MM;

/** Whether two tubes are the same material and size. */
export const sameTube = (a: TubeSpec, b: TubeSpec): boolean =>
  a.materialId === b.materialId && sameTubeOd(a.odMm, b.odMm) && sameTubeWall(a.wallMm, b.wallMm);

/** The catalogue's tube of this material and size (the first listed), or undefined. */
export function findCatalogueTube(catalogue: Pick<Catalogue, "tubes">, tube: TubeSpec): TubeSize | undefined {
  return catalogue.tubes.find((t) => sameTube(t, tube));
}
