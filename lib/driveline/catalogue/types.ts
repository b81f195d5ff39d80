/** Shop catalogue: materials, tube stock, end fittings and joint (cross) series. Money in cents. */

export interface Material {
  readonly id: string;
  readonly name: string;
  readonly elasticModulusGPa: number;
  readonly densityKgM3: number;
  /** MINIMUM tensile yield of the condition named (not a typical value), MPa. */
  readonly tensileYieldMPa: number;
  /** Shear yield used in torsion; S_y/√3 (von Mises) unless the shop gives its own. */
  readonly shearYieldMPa: number;
  /** The condition the figures are for, e.g. "stress-relieved DOM" or "T6, drawn". */
  readonly condition?: string;
  /** Minimum tensile yield in the weld-affected zone (welding anneals the tube next to the weld), MPa. */
  readonly weldZoneTensileYieldMPa?: number;
  /** Where the weld-zone figure comes from. */
  readonly weldZoneSource?: string;
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
  /** A flange yoke's bolt pattern (matched to the vehicle's companion flange). */
  readonly flange?: FlangePattern;
  /** Rating of the fitting including its weld (governs at the heat-affected zone). */
  readonly torqueRatingNm: number;
  readonly priceCents: number;
  /** Tightening torque of the bolts that fasten it to the vehicle (a flange yoke's), N·m, as its maker gives it. */
  readonly fastenerTorqueNm?: number;
  /** Where that figure comes from (the maker's sheet, or "demo data"). */
  readonly fastenerTorqueSource?: string;
}

/** A companion-flange bolt pattern. */
export interface FlangePattern {
  readonly boltCount: number;
  readonly boltCircleMm: number;
  readonly pilotMm: number;
}

/** How a joint's bearing caps are held in the vehicle's yoke. */
export type CapRetention = "strap" | "u-bolt" | "round";

export interface JointSeries {
  readonly id: string;
  readonly name: string;
  /** Peak (static) torque rating, N·m: the design torque must not exceed it. */
  readonly torqueRatingNm: number;
  /** Continuous (running) torque rating, N·m: the running torque must not exceed it. */
  readonly continuousTorqueNm?: number;
  /** Bearing cap diameter and span across the caps, mm (what a vehicle's yoke takes). */
  readonly capDiameterMm?: number;
  readonly capSpanMm?: number;
  readonly retention?: CapRetention;
  readonly lubrication?: "greaseable" | "sealed";
  /** A conversion cross: caps of this series on one side, of `otherSeriesId` on the other. */
  readonly otherSeriesId?: string;
  /** "double-cardan" for a constant-velocity (double Cardan) joint; default single cross. */
  readonly kind?: "cross" | "double-cardan";
  readonly maxWorkingAngleDeg: number;
  readonly massKg: number;
  readonly priceCents: number;
  /** Tightening torque of the straps / U-bolts holding the joint's caps in the vehicle's yoke, N·m, as the joint maker gives it. */
  readonly strapTorqueNm?: number;
  /** Where that figure comes from (the maker's sheet, or "demo data"). */
  readonly strapTorqueSource?: string;
}

/** A slip yoke that slides on a transmission's (or transfer case's) output spline. */
export interface SlipYoke {
  readonly id: string;
  readonly name: string;
  readonly splineCount: number;
  readonly majorDiameterMm: number;
  readonly jointSeriesId: string;
  /** Length of the ground seal surface on the barrel, mm. */
  readonly sealSurfaceLengthMm: number;
  /** Least spline engagement the maker allows, mm (replaces the shop's fixed minimum). */
  readonly minEngagementMm: number;
  readonly massKg: number;
  readonly priceCents: number;
  readonly source: string;
}

/** A centre support bearing for a two-piece shaft (with its stub and yoke). */
export interface CentreBearing {
  readonly id: string;
  readonly name: string;
  /** The centre joint's series. */
  readonly jointSeriesId: string;
  /** Tube OD the stub's weld seat takes, mm, and its weld family. */
  readonly tubeOdMm: number;
  readonly weldFamily: Material["weldFamily"];
  /** Centre joint centre to the stub's weld seat, mm. */
  readonly jointCentreToWeldSeatMm: number;
  readonly massKg: number;
  readonly priceCents: number;
  readonly source: string;
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
  /** Optional lists (catalogues saved before they existed have none). */
  readonly slipYokes?: readonly SlipYoke[];
  readonly centreBearings?: readonly CentreBearing[];
}
