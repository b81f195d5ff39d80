import { describe, expect } from "vitest";
import { evaluateDesign, parseDesign } from "@/lib/driveline";
import { currentShopConfig } from "@/lib/catalogue/versions";
import { describePath } from "@/lib/catalogue/describe";
import type { ConfigChange } from "@/lib/catalogue/diff";
import { getShopEngineering, invalidateShopEngineering } from "@/lib/shop/config";
import { staffCookie } from "../setup/auth-requests";
import { keepShopConfig, postCatalogueVersion } from "../setup/shop-config";
import { dbTest } from "../setup/db";
import { streetTruck } from "../setup/orders";

const post = postCatalogueVersion;

// This file changes the shop's configuration: put it back as it was for the files after it.
keepShopConfig();

describe("the editor's loads fields: weld zone, continuous rating, the limits per use", () => {
  dbTest(
    "a weld-zone yield without its source, or a continuous rating above the peak, is refused by field",
    async () => {
      const owner = await staffCookie("owner");
      const { version, document } = await currentShopConfig();
      const cases = [
        {
          change: (d: typeof document) => {
            d.catalogue.materials[0]!.weldZoneSource = "";
          },
          field: "catalogue.materials.0.weldZoneSource",
          message: /source/,
        },
        {
          change: (d: typeof document) => {
            d.catalogue.jointSeries[0]!.continuousTorqueNm = d.catalogue.jointSeries[0]!.torqueRatingNm + 1;
          },
          field: "catalogue.jointSeries.0.continuousTorqueNm",
          message: /peak/,
        },
        {
          change: (d: typeof document) => {
            d.settings.serviceFactorTowing = { value: 0.8, source: "wishful" };
          },
          field: "settings.serviceFactorTowing.value",
          message: /between 1 and 5/,
        },
      ];
      for (const c of cases) {
        const d = structuredClone(document);
        c.change(d);
        const res = await post({ ...d, basedOnVersion: version, note: "bad" }, owner);
        expect(res.status, c.field).toBe(422);
        const body = (await res.json()) as { error: { fields?: Record<string, string> } };
        expect(body.error.fields?.[c.field], c.field).toMatch(c.message);
      }
      expect((await currentShopConfig()).version).toBe(version);
    },
  );

  dbTest(
    "saved figures are kept, named in the history, and used by the next evaluation",
    { timeout: 60_000 },
    async () => {
      const owner = await staffCookie("owner");
      const { version, document } = await currentShopConfig();
      const d = structuredClone(document);
      const dom = d.catalogue.materials.findIndex((m) => m.id === "steel-dom");
      const x41 = d.catalogue.jointSeries.findIndex((s) => s.id === "YL-X41");
      // Demo data: a shop that measured a softer weld zone and holds a lower continuous rating.
      d.catalogue.materials[dom] = {
        ...d.catalogue.materials[dom]!,
        weldZoneTensileYieldMPa: 220,
        weldZoneSource: "our weld procedure test, coupon 7",
      };
      d.catalogue.jointSeries[x41] = { ...d.catalogue.jointSeries[x41]!, continuousTorqueNm: 500 };
      const res = await post({ ...d, basedOnVersion: version, note: "Weld coupon results" }, owner);
      expect(res.status).toBe(201);
      const saved = (await res.json()) as { changes: ConfigChange[] };
      const words = saved.changes.map((c) => describePath(c.at));
      expect(words).toContain("Materials › steel-dom › Weld-zone yield (MPa)");
      expect(words).toContain("Joints › YL-X41 › Continuous rating (N·m)");

      const now = await currentShopConfig();
      expect(now.document.catalogue.materials[dom]!.weldZoneSource).toBe("our weld procedure test, coupon 7");
      invalidateShopEngineering();
      const shop = await getShopEngineering();
      const parsed = parseDesign(streetTruck, { catalogue: shop.catalogue });
      if (!parsed.ok) throw new Error("street truck must parse");
      const r = evaluateDesign(parsed.design, { catalogue: shop.catalogue, settings: shop.settings });
      // 220/√3 = 127.0 MPa weld-zone shear yield over the truck's 138.1 MPa: below 1.0, a failure.
      expect(r.torsion.weldZoneSafetyFactor).toBeCloseTo(220 / Math.sqrt(3) / r.torsion.shearStressMPa, 9);
      expect(r.checks.find((c) => c.id === "torsion.weld-zone")?.status).toBe("fail");
      // 550 N·m running torque (top gear taken as 1) against 500 N·m.
      const cont = r.checks.find((c) => c.id === "joint-continuous.front")!;
      expect(cont.limit).toBe(500);
      expect(cont.status).toBe("fail");
    },
  );
});
