import { describe, expect, it } from "vitest";
import {
  designShaftTorqueNm,
  inToMm,
  lbftToNm,
  mpaToPsi,
  mphToKmh,
  permissibleUnbalanceGmm,
  serviceSpeed,
  shaftRpmAtRoadSpeed,
  shearYieldFromTensileMPa,
  torsionShearStressMPa,
  unbalancePerPlaneGmm,
} from "@/lib/driveline";

describe("torsion", () => {
  it("2000 lb·ft in a 3.5 × 0.083 in tube → 16 140 psi, 111.3 MPa (Roark, hollow circular section; Shigley)", () => {
    const tube = { odMm: inToMm(3.5), wallMm: inToMm(0.083) };
    const tau = torsionShearStressMPa(tube, lbftToNm(2000));
    expect(lbftToNm(2000)).toBeCloseTo(2711.6, 1);
    expect(Math.round(mpaToPsi(tau) / 10) * 10).toBe(16140);
    expect(tau).toBeCloseTo(111.3, 1);
  });

  it("von Mises shear yield is S_y/√3 ≈ 0.577 S_y (Shigley)", () => {
    expect(shearYieldFromTensileMPa(100)).toBeCloseTo(57.735, 3);
  });
});

describe("balance (ISO 21940-11)", () => {
  it("G 16, 12 kg, 4500 rpm → 407.4 g·mm total, 203.7 g·mm per plane (ISO 21940-11 worked value)", () => {
    const u = permissibleUnbalanceGmm(16, 12, 4500);
    expect(u).toBeCloseTo(407.4, 1);
    const planes = unbalancePerPlaneGmm(u);
    expect(planes.planeA).toBeCloseTo(203.7, 1);
    expect(planes.planeB).toBeCloseTo(203.7, 1);
  });

  it("unsymmetric rotor: U_A = U·L_B/L, U_B = U·L_A/L (ISO 21940-11)", () => {
    const p = unbalancePerPlaneGmm(300, 100, 200);
    expect(p.planeA).toBeCloseTo(200, 9);
    expect(p.planeB).toBeCloseTo(100, 9);
  });
});

describe("shaft speed and torque", () => {
  it("matches the US shop rule rpm = mph × 336 × axle / tire in (336 ≈ 63 360 / (60 π))", () => {
    const rpm = shaftRpmAtRoadSpeed(mphToKmh(100), inToMm(28), 3.73);
    expect(rpm).toBeCloseTo((100 * (63360 / (60 * Math.PI)) * 3.73) / 28, 6);
    expect(rpm / ((100 * 336 * 3.73) / 28)).toBeCloseTo(1, 3);
  });

  it("uses the larger of maxShaftRpm, the vehicle and the engine figures", () => {
    expect(
      serviceSpeed({ maxShaftRpm: 4000, topSpeedKmh: 200, axleRatio: 3.73, tireDiameterMm: 711 })?.governedBy,
    ).toBe("vehicle");
    expect(
      serviceSpeed({ maxShaftRpm: 9000, topSpeedKmh: 200, axleRatio: 3.73, tireDiameterMm: 711 })
        ?.maxShaftRpm,
    ).toBe(9000);
    expect(serviceSpeed({ maxEngineRpm: 6000, topGearRatio: 0.8 })?.maxShaftRpm).toBe(7500);
    expect(serviceSpeed({ topSpeedKmh: 200 })).toBeNull();
  });

  it("design torque = engine × first gear × transfer low × converter stall, ratios default to 1", () => {
    expect(
      designShaftTorqueNm({
        engineTorqueNm: 550,
        firstGearRatio: 3.06,
        transferCaseLowRatio: 1,
        converterStallRatio: 2,
      }),
    ).toBeCloseTo(3366, 9);
    expect(designShaftTorqueNm({ engineTorqueNm: 550, firstGearRatio: null })).toBe(550);
  });
});
