/**
 * Floor quantities and their display units. SI (mm, deg, g·mm, rpm, g) inside; the shop's
 * units at the traveller and the scan station, converted here with the core's exact factors.
 */
import { KG_PER_LB, MM_PER_INCH } from "@/lib/driveline/units";

export type FloorQuantity = "length" | "runout" | "angle" | "unbalance" | "speed" | "mass";
export type FloorUnits = "in" | "mm";

/** 1 oz = 1/16 lb exactly. */
const G_PER_OZ = (KG_PER_LB * 1000) / 16;

interface Unit {
  symbol: string;
  decimals: number;
  toSi: (v: number) => number;
  fromSi: (v: number) => number;
}

const same = (symbol: string, decimals: number): Unit => ({
  symbol,
  decimals,
  toSi: (v) => v,
  fromSi: (v) => v,
});

const UNITS: Record<FloorUnits, Record<FloorQuantity, Unit>> = {
  mm: {
    length: same("mm", 1),
    runout: same("mm", 2),
    angle: same("°", 1),
    unbalance: same("g·mm", 0),
    speed: same("rpm", 0),
    mass: same("g", 1),
  },
  in: {
    length: { symbol: "in", decimals: 3, toSi: (v) => v * MM_PER_INCH, fromSi: (v) => v / MM_PER_INCH },
    runout: { symbol: "in", decimals: 4, toSi: (v) => v * MM_PER_INCH, fromSi: (v) => v / MM_PER_INCH },
    angle: same("°", 1),
    unbalance: {
      symbol: "oz·in",
      decimals: 3,
      toSi: (v) => v * G_PER_OZ * MM_PER_INCH,
      fromSi: (v) => v / (G_PER_OZ * MM_PER_INCH),
    },
    speed: same("rpm", 0),
    mass: { symbol: "oz", decimals: 2, toSi: (v) => v * G_PER_OZ, fromSi: (v) => v / G_PER_OZ },
  },
};

export function unitOf(quantity: FloorQuantity, units: FloorUnits): Unit {
  return UNITS[units][quantity];
}

/** A display value in the shop's units → SI. */
export function toSi(quantity: FloorQuantity, units: FloorUnits, value: number): number {
  return UNITS[units][quantity].toSi(value);
}

/** An SI value → the shop's units, as a number. */
export function fromSi(quantity: FloorQuantity, units: FloorUnits, value: number): number {
  return UNITS[units][quantity].fromSi(value);
}

/** An SI value shown in the shop's units, e.g. "0.0100 in" or "0.25 mm". */
export function formatQuantity(quantity: FloorQuantity, units: FloorUnits, valueSi: number): string {
  const u = UNITS[units][quantity];
  const shown = u.fromSi(valueSi).toFixed(u.decimals);
  return u.symbol === "°" ? `${shown}°` : `${shown} ${u.symbol}`;
}
