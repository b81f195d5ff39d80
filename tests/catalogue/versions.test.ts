import { describe, expect } from "vitest";
import { NextRequest } from "next/server";
import { GET } from "@/app/api/catalogue/versions/route";
import { AuditEvent, Order, ShopConfigVersion } from "@/entities";
import { getEm } from "@/lib/db/orm";
import { currentShopConfig, SAVE_ACTION } from "@/lib/catalogue/versions";
import { placeOrder, quoteDesigns } from "@/lib/orders/place-order";
import { getShopEngineering } from "@/lib/shop/config";
import type { ConfigChange } from "@/lib/catalogue/diff";
import type { ShopConfigDocument } from "@/lib/catalogue/schemas";
import { authRequest, sessionCookie, staffCookie } from "../setup/auth-requests";
import { keepShopConfig, postCatalogueVersion } from "../setup/shop-config";
import { dbTest } from "../setup/db";
import { newCustomer, saveDesign } from "../setup/orders";

const PASSWORD = "a-long-password-1";

const post = postCatalogueVersion;

const get = (cookie?: string) =>
  GET(new NextRequest("http://127.0.0.1/api/catalogue/versions", { headers: cookie ? { cookie } : {} }), {
    params: Promise.resolve({}),
  });

type ErrorJson = { error: { code: string; message: string; fields?: Record<string, string> } };

/** The current configuration as the editor opens it, ready to change. */
async function editable(): Promise<{ version: number; doc: ShopConfigDocument }> {
  const { version, document } = await currentShopConfig();
  return { version, doc: structuredClone(document) };
}

// This file changes the shop's configuration: put it back as it was for the files after it.
keepShopConfig();

describe("the owner's catalogue and price book editor", () => {
  dbTest("refuses bad values with the field named, and saves nothing", async () => {
    const owner = await staffCookie("owner");
    const { version, doc } = await editable();
    const tube = doc.catalogue.tubes[3]!;
    const cases: { name: string; change: (d: ShopConfigDocument) => void; field: string; message: RegExp }[] =
      [
        {
          name: "a tube whose wall is half its diameter",
          change: (d) => (d.catalogue.tubes[3]!.wallMm = tube.odMm / 2),
          field: "catalogue.tubes.3.wallMm",
          message: /less than half the outside diameter/,
        },
        {
          name: "a negative tube price",
          change: (d) => (d.catalogue.tubes[0]!.pricePerMetreCents = -100),
          field: "catalogue.tubes.0.pricePerMetreCents",
          message: /negative/,
        },
        {
          name: "a negative labour price",
          change: (d) => (d.priceBook.labourPerShaftCents = -1),
          field: "priceBook.labourPerShaftCents",
          message: /negative/,
        },
        {
          name: "a limit without a source",
          change: (d) => (d.settings.balanceGradeMmS = { value: 6.3, source: "  " }),
          field: "settings.balanceGradeMmS.source",
          message: /source/,
        },
        {
          name: "a floor tolerance without a source",
          change: (d) => (d.floor.limits.cutLengthToleranceMm.source = ""),
          field: "floor.limits.cutLengthToleranceMm.source",
          message: /source/,
        },
        {
          name: "a material's constants without a source",
          change: (d) => (d.catalogue.materials[0] = { ...d.catalogue.materials[0]!, source: "" }),
          field: "catalogue.materials.0.source",
          message: /source/,
        },
        {
          name: "two tubes with one id",
          change: (d) => (d.catalogue.tubes[2] = { ...d.catalogue.tubes[2]!, id: d.catalogue.tubes[1]!.id }),
          field: "catalogue.tubes.2.id",
          message: /unique/,
        },
        {
          name: "a tube of a material that does not exist",
          change: (d) => (d.catalogue.tubes[1] = { ...d.catalogue.tubes[1]!, materialId: "unobtainium" }),
          field: "catalogue.tubes.1.materialId",
          message: /unobtainium/,
        },
        {
          name: "a number that is not finite (NaN reaches JSON as null)",
          change: (d) => (d.catalogue.endFittings[0]!.massKg = Number.NaN),
          field: "catalogue.endFittings.0.massKg",
          message: /number/,
        },
        {
          // ISO 21940-11 grades stop at G 4000.
          name: "a balance grade past the coarsest ISO 21940-11 grade",
          change: (d) => (d.settings.balanceGradeMmS.value = 5000),
          field: "settings.balanceGradeMmS.value",
          message: /4000/,
        },
      ];
    for (const c of cases) {
      const d = structuredClone(doc);
      c.change(d);
      const res = await post({ ...d, basedOnVersion: version, note: c.name }, owner);
      expect(res.status, c.name).toBe(422);
      const body = (await res.json()) as ErrorJson;
      expect(body.error.fields?.[c.field], c.name).toMatch(c.message);
    }
    expect((await currentShopConfig()).version).toBe(version);
  });

  dbTest(
    "a save is version n+1 with an audit entry before → after; an order placed before keeps its total and version, a new quote uses the new price",
    { timeout: 60_000 },
    async () => {
      // An order priced with the current configuration.
      const { user, customer } = await newCustomer();
      const design = await saveDesign(customer, user.id);
      const order = await placeOrder(user, { designIds: [design.id], fulfilment: "pickup" });
      const { version, doc } = await editable();
      expect(order.configVersion).toBe(version);
      const em = await getEm();
      const placed = await em.findOneOrFail(Order, { id: order.id }, { populate: ["shafts"] });
      const tubeId = (placed.shafts[0]!.evaluation as { tube: { tubeId: string } }).tube.tubeId;
      const index = doc.catalogue.tubes.findIndex((t) => t.id === tubeId);
      const oldPrice = doc.catalogue.tubes[index]!.pricePerMetreCents;
      const newPrice = oldPrice + 1234; // demo data: an invented price rise

      const owner = await staffCookie("owner", "Olive Owner");
      doc.catalogue.tubes[index]!.pricePerMetreCents = newPrice;
      const res = await post({ ...doc, basedOnVersion: version, note: "Steel went up" }, owner);
      expect(res.status).toBe(201);
      const saved = (await res.json()) as { version: number; changes: ConfigChange[] };
      expect(saved.version).toBe(version + 1);
      expect(saved.changes).toEqual([
        {
          path: `catalogue.tubes.${tubeId}.pricePerMetreCents`,
          at: ["catalogue", "tubes", tubeId, "pricePerMetreCents"],
          before: oldPrice,
          after: newPrice,
        },
      ]);

      const check = await getEm();
      // The newest save of that number: a file before this one may have saved (and put back) one too.
      const audit = await check.findOneOrFail(
        AuditEvent,
        { action: SAVE_ACTION, subjectId: String(version + 1) },
        { orderBy: { at: "desc" } },
      );
      expect(audit.actor?.id).toBeTruthy();
      expect(audit.details).toMatchObject({
        version: version + 1,
        basedOnVersion: version,
        note: "Steel went up",
        changes: [
          { path: `catalogue.tubes.${tubeId}.pricePerMetreCents`, before: oldPrice, after: newPrice },
        ],
      });
      // Every version is kept: the starting one and the new one.
      const kept = await check.find(ShopConfigVersion, {}, { orderBy: { version: "asc" } });
      expect(kept.map((v) => v.version)).toEqual(expect.arrayContaining([version, version + 1]));
      expect(kept.find((v) => v.version === version)!.catalogue.tubes[index]!.pricePerMetreCents).toBe(
        oldPrice,
      );
      expect(kept.find((v) => v.version === version + 1)!.createdByName).toBe("Olive Owner");

      // The order keeps what it was priced with.
      const after = await check.findOneOrFail(Order, { id: order.id }, { populate: ["shafts"] });
      expect(after.totalCents).toBe(order.totalCents);
      expect(after.configVersion).toBe(version);
      const tubeLine = (after.shafts[0]!.priceLines as { code: string; unitCents: number }[]).find(
        (l) => l.code === "tube",
      );
      expect(tubeLine?.unitCents).toBe(oldPrice);

      // A new quote uses the new price, and a new order records the new version.
      const shop = await getShopEngineering();
      expect(shop.version).toBe(version + 1);
      const { shafts, quote } = quoteDesigns([design], shop, "pickup");
      expect(shafts[0]!.lines.find((l) => l.code === "tube")?.unitCents).toBe(newPrice);
      expect(quote.totalCents).toBeGreaterThan(order.totalCents);
      const second = await placeOrder(user, { designIds: [design.id], fulfilment: "pickup" });
      expect(second.configVersion).toBe(version + 1);

      // The history shows it.
      const history = (await (await get(owner)).json()) as {
        current: number;
        versions: { version: number; by: string; note: string; current: boolean; changes: ConfigChange[] }[];
      };
      expect(history.current).toBe(version + 1);
      expect(history.versions[0]).toMatchObject({
        version: version + 1,
        by: "Olive Owner",
        note: "Steel went up",
        current: true,
      });
      expect(history.versions[0]!.changes[0]).toMatchObject({ before: oldPrice, after: newPrice });
    },
  );

  dbTest("a save based on an older version is refused with 409 naming who saved in between", async () => {
    const first = await staffCookie("owner", "Oscar Early");
    const second = await staffCookie("owner", "Opal Late");
    const { version, doc } = await editable();
    const a = structuredClone(doc);
    a.priceBook.shippingCents += 100;
    const b = structuredClone(doc);
    b.priceBook.labourPerShaftCents += 500;
    expect((await post({ ...a, basedOnVersion: version, note: "Freight rates" }, first)).status).toBe(201);
    const stale = await post({ ...b, basedOnVersion: version, note: "Labour" }, second);
    expect(stale.status).toBe(409);
    const body = (await stale.json()) as ErrorJson;
    expect(body.error.message).toContain("Oscar Early");
    expect(body.error.message).toContain(`version ${version + 1}`);
    expect(body.error.message).toContain("Freight rates");
    // Nothing of the stale save landed.
    const now = await currentShopConfig();
    expect(now.version).toBe(version + 1);
    expect(now.document.priceBook.labourPerShaftCents).toBe(doc.priceBook.labourPerShaftCents);
  });

  dbTest("a save that changes nothing is refused", async () => {
    const owner = await staffCookie("owner");
    const { version, doc } = await editable();
    const res = await post({ ...doc, basedOnVersion: version, note: "No change" }, owner);
    expect(res.status).toBe(422);
    expect(((await res.json()) as ErrorJson).error.message).toMatch(/Nothing to save/);
  });

  dbTest("counter, floor and customers are refused (403), anonymous callers 401", async () => {
    const { version, doc } = await editable();
    const body = { ...doc, basedOnVersion: version, note: "Not mine to change" };
    body.priceBook.shippingCents += 1;
    const { user } = await newCustomer();
    const customer = sessionCookie(
      await authRequest("/sign-in/email", { email: user.email, password: PASSWORD }),
    );
    for (const cookie of [await staffCookie("counter"), await staffCookie("floor"), customer]) {
      expect((await post(body, cookie)).status).toBe(403);
      expect((await get(cookie)).status).toBe(403);
    }
    expect((await post(body)).status).toBe(401);
    expect((await get()).status).toBe(401);
    expect((await currentShopConfig()).version).toBe(version);
  });
});
