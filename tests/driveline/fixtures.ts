import { readFileSync } from "node:fs";
import { parseDesign, type DesignFile } from "@/lib/driveline";

/**
 * Demo design (invented): a street truck's shaft, 52 in between joint centres on a 3.5 in steel
 * tube, 3° / 5° / 3° angles, 250 N·m through a 3.06 first gear and a 1.8 converter stall.
 * Tests add or override what they look at (name, slip, interface…).
 */
export const truckDesign = {
  lengthMm: 1320.8,
  tube: { materialId: "steel-dom", odMm: 88.9, wallMm: 2.108 },
  geometry: {
    transmission: { verticalDeg: 3, horizontalDeg: 0 },
    driveshaft: { verticalDeg: 5, horizontalDeg: 0 },
    pinion: { verticalDeg: 3, horizontalDeg: 0 },
  },
  torque: { engineTorqueNm: 250, firstGearRatio: 3.06, converterStallRatio: 1.8 },
  speed: { maxShaftRpm: 4000 },
};

/** One of the README's example design files, parsed (a failure names each bad field). */
export function loadExample(name: string): DesignFile {
  const r = parseDesign(JSON.parse(readFileSync(`examples/${name}.json`, "utf8")));
  if (!r.ok) throw new Error(r.issues.map((i) => i.message).join("\n"));
  return r.design;
}
