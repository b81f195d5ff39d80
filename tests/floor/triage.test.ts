import { describe, expect, it } from "vitest";
import { getEm } from "@/lib/db/orm";
import { defaultSettings, triageVibration } from "@/lib/driveline";
import { asBuiltRecord } from "@/lib/floor/queries";
import { complaintFrom, runTriageSchema, triageViewFor } from "@/lib/floor/triage";
import { releaseOrder, submitStep } from "@/lib/floor/work-orders";
import { dbTest } from "../setup/db";
import { code, good, key, paidOrder, staff } from "./helpers";

// 1 oz·in = 28.349523125 g × 25.4 mm (avoirdupois ounce and international inch, exact).
const GMM_PER_OZIN = 28.349523125 * 25.4;

describe("vibration triage from the as-built record", () => {
  dbTest("nothing measured yet: no triage, and the steps it waits for are named", async () => {
    const order = await paidOrder();
    const [wo] = (await releaseOrder(order.id, await staff("counter"))).workOrders;
    const view = triageViewFor(await asBuiltRecord(await getEm(), wo!.serial), defaultSettings);
    expect(view.shaft).toBeNull();
    expect(view.missing.map((m) => [m.position, m.name])).toEqual([
      [2, "Weld and phase"],
      [3, "Straighten and runout"],
      [4, "Balance"],
      [5, "Final inspection"],
    ]);
    expect(view.roadSpeed).toBe(false); // the test order's design gives no vehicle speed data
  });

  dbTest(
    "the accepted measurements (reworked runout, balance, final phase) reach the triage in SI",
    async () => {
      const floor = await staff("floor");
      const order = await paidOrder();
      const [wo] = (await releaseOrder(order.id, await staff("counter"))).workOrders;
      const serial = wo!.serial;
      for (const s of ["CUT", "WLD"]) await submitStep(code(serial, s), good[s]!, floor, key());
      // A runout hold, then the reworked readings: the triage uses the accepted ones.
      await submitStep(code(serial, "RUN"), { ...good.RUN!, runoutMidMm: 0.05 }, floor, key());
      await submitStep(code(serial, "RUN"), good.RUN!, floor, key());
      await submitStep(code(serial, "BAL"), good.BAL!, floor, key());

      let view = triageViewFor(await asBuiltRecord(await getEm(), serial), defaultSettings);
      expect(view.missing.map((m) => m.name)).toEqual(["Final inspection"]);
      const shaft = view.shaft!;
      expect(shaft.runout!.map((r) => r.value)).toEqual(
        [0.006 * 25.4, 0.012 * 25.4, 0.007 * 25.4].map((v) => expect.closeTo(v, 9)),
      );
      expect(shaft.residuals!.map((r) => r.value)).toEqual(
        [0.1, 0.12].map((v) => expect.closeTo(v * GMM_PER_OZIN, 6)),
      );
      expect(shaft.phase.measuredDeg).toBeCloseTo(0.4, 9); // from the weld step until final inspection

      // At the service speed the rear plane's 0.12 oz·in is scored against ISO 21940-11:
      // U_per = 1000·G·m/Ω, half per plane (G and m from the shaft's frozen report).
      const rpm = shaft.serviceRpm;
      const perPlane =
        (1000 * shaft.balance.gradeMmS * shaft.balance.rotorMassKg) / ((rpm * Math.PI) / 30) / 2;
      const result = triageVibration(shaft, { speed: { kind: "shaft", shaftRpm: rpm }, load: "both" });
      const unbalance = result.causes.find((c) => c.id === "unbalance")!;
      expect(unbalance.score).toBeCloseTo((0.12 * GMM_PER_OZIN) / perPlane, 4);

      await submitStep(code(serial, "FIN"), good.FIN!, floor, key());
      view = triageViewFor(await asBuiltRecord(await getEm(), serial), defaultSettings);
      expect(view.missing).toEqual([]);
      expect(view.shaft!.phase.measuredDeg).toBeCloseTo(0.3, 9); // the shaft as it left
    },
  );
});

describe("the triage form", () => {
  it("names the missing or out-of-range field, for the way the speed is given", () => {
    const bad = runTriageSchema.safeParse({
      basis: "engine",
      engineRpm: "3000",
      gearRatio: "",
      load: "load",
    });
    expect(bad.success).toBe(false);
    expect(bad.error!.issues.map((i) => [i.path.join("."), i.message])).toEqual([
      ["gearRatio", "Gear ratio: enter a number"],
    ]);
    const fast = runTriageSchema.safeParse({ basis: "shaft", shaftRpm: "90000", load: "both" });
    expect(fast.error!.issues[0]!.message).toBe("Shaft speed: enter a number from 10 to 30000");
  });

  it("road speed is in the shop's units: mph when the floor reads inches (1 mile = 1.609344 km exactly)", () => {
    const values = runTriageSchema.parse({ basis: "road", roadSpeed: "60", load: "coast" });
    expect(complaintFrom(values, "in")).toEqual({
      speed: { kind: "road", speedKmh: expect.closeTo(96.56064, 9) },
      load: "coast",
    });
    expect(complaintFrom(values, "mm").speed).toEqual({ kind: "road", speedKmh: 60 });
  });
});
