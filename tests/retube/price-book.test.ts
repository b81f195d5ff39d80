import { describe, expect } from "vitest";
import { AuditEvent } from "@/entities";
import { getEm } from "@/lib/db/orm";
import { currentShopConfig, SAVE_ACTION } from "@/lib/catalogue/versions";
import { quoteDesigns } from "@/lib/orders/place-order";
import { emptyIntake } from "@/lib/retube/intake";
import { getShopEngineering } from "@/lib/shop/config";
import { createStaffUser } from "@/lib/users/staff";
import { authRequest, sessionCookie, uniqueEmail } from "../setup/auth-requests";
import { keepShopConfig, postCatalogueVersion } from "../setup/shop-config";
import { dbTest } from "../setup/db";
import { streetTruck } from "../setup/orders";

const PASSWORD = "a-long-password-1";

const post = postCatalogueVersion;

// This file changes the shop's price book: put the configuration back as it was for the files after it.
keepShopConfig();

describe("the re-tube teardown line in the price book", () => {
  dbTest(
    "the owner edits it like any price (versioned, audited); re-tube quotes use it, 422 on a bad value",
    async () => {
      const owner = await createStaffUser(
        { name: "Tess Owner", email: uniqueEmail("owner"), role: "owner", password: PASSWORD },
        null,
      );
      const cookie = sessionCookie(
        await authRequest("/sign-in/email", { email: owner.email, password: PASSWORD }),
      );
      const { version, document } = await currentShopConfig();
      const before = document.priceBook.teardownPerShaftCents;

      const bad = structuredClone(document);
      bad.priceBook.teardownPerShaftCents = 12.5;
      const refused = await post({ ...bad, basedOnVersion: version, note: "Typo" }, cookie);
      expect(refused.status).toBe(422);
      expect((await refused.json()).error.fields).toHaveProperty(
        "priceBook.teardownPerShaftCents",
        "must be a whole number of cents",
      );

      const doc = structuredClone(document);
      doc.priceBook.teardownPerShaftCents = before + 2500;
      expect(
        (await post({ ...doc, basedOnVersion: version, note: "Teardown takes longer" }, cookie)).status,
      ).toBe(201);
      const em = await getEm();
      // The newest save (another file may have used the same version number before it restored the shop).
      const [audit] = await em.find(
        AuditEvent,
        { action: SAVE_ACTION, subjectId: String(version + 1) },
        { orderBy: { at: "desc" }, limit: 1 },
      );
      expect(audit!.details).toMatchObject({
        changes: [{ path: "priceBook.teardownPerShaftCents", before, after: before + 2500 }],
      });

      const parts = emptyIntake().parts;
      const repair = {
        weldToWeldMm: 1188.8,
        parts,
        recordedBy: { id: owner.id, name: owner.name },
        recordedAt: new Date().toISOString(),
      };
      const shop = await getShopEngineering();
      const { shafts } = quoteDesigns([{ name: "Re-tube", design: streetTruck, repair }], shop, "pickup");
      expect(shafts[0]!.lines.find((l) => l.code === "teardown")?.totalCents).toBe(before + 2500);
      // The new tube is charged on the customer's weld-to-weld plus the price book's allowance (50 mm, demo data).
      const short = quoteDesigns(
        [{ name: "Re-tube", design: streetTruck, repair: { ...repair, weldToWeldMm: 1000 } }],
        shop,
        "pickup",
      );
      const tube = short.shafts[0]!.lines.find((l) => l.code === "tube")!;
      expect(tube.label).toMatch(/, 1050 mm$/);
      expect(tube.quantity).toBe(1.05);
    },
  );
});
