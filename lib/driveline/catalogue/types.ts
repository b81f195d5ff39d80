/** Shop catalogue: materials, tube stock, end fittings and joint (cross) series. Money in cents. */

export interface Material {
  readonly id: string;
  readonly name: string;
  readonly elasticModulusGPa: number;
  readonly densityKgM3: number;
  readonly tensileYieldMPa: number;
  /** Shear yield used in torsion; S_y/√3 (von Mises) unless the shop gives its own. */
  readonly shearYieldMPa: number;
  /** Weld family: an end fitting welds only to tubes of its own family. */
  readonly weldFamily: "steel" | "aluminium" | "composite";
  readonly source: string;
}

export interface TubeSize {
  readonly id: string;
  readonly materialId: string;
  readonly odMm: number;
  readonly wallMm: number;
  /** Longest piece the shop can supply (stock length or machine limit). */
  readonly maxLengthMm: number;
  readonly pricePerMetreCents: number;
}

export type EndFittingKind = "weld-yoke" | "slip-yoke-assembly" | "flange-yoke";

export interface EndFitting {
  readonly id: string;
  readonly name: string;
  readonly kind: EndFittingKind;
  readonly jointSeriesId: string;
  /** Tube OD the weld seat takes (mm). */
  readonly tubeOdMm: number;
  readonly weldFamily: Material["weldFamily"];
  /** Joint centre to the weld seat (where the tube end sits), mm. */
  readonly jointCentreToWeldSeatMm: number;
  readonly massKg: number;
  /** Rating of the fitting including its weld (governs at the heat-affected zone). */
  readonly torqueRatingNm: number;
  readonly priceCents: number;
  /** Tightening torque of the bolts that fasten it to the vehicle (a flange yoke's), N·m, as its maker gives it. */
  readonly fastenerTorqueNm?: number;
  /** Where that figure comes from (the maker's sheet, or "demo data"). */
  readonly fastenerTorqueSource?: string;
}

export interface JointSeries {
  readonly id: string;
  readonly name: string;
  readonly torqueRatingNm: number;
  readonly maxWorkingAngleDeg: number;
  readonly massKg: number;
  readonly priceCents: number;
  /** Tightening torque of the straps / U-bolts holding the joint's caps in the vehicle's yoke, N·m, as the joint maker gives it. */
  readonly strapTorqueNm?: number;
  /** Where that figure comes from (the maker's sheet, or "demo data"). */
  readonly strapTorqueSource?: string;
}

export interface Catalogue {
  readonly id: string;
  readonly name: string;
  /** True for the built-in demonstration data. */
  readonly demo: boolean;
  readonly materials: readonly Material[];
  readonly tubes: readonly TubeSize[];
  readonly endFittings: readonly EndFitting[];
  readonly jointSeries: readonly JointSeries[];
}
