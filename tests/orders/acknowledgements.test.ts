import { describe, expect } from "vitest";
import { NextRequest } from "next/server";
import { AuditEvent, Order, OrderShaft, Payment } from "@/entities";
import { getEm } from "@/lib/db/orm";
import { POST } from "@/app/api/orders/route";
import { placeOrder, quoteDesigns } from "@/lib/orders/place-order";
import { getShopEngineering } from "@/lib/shop/config";
import { orderView, populateOrder } from "@/lib/orders/queries";
import { createStaffUser } from "@/lib/users/staff";
import { authRequest, sessionCookie, uniqueEmail } from "../setup/auth-requests";
import { dbTest } from "../setup/db";
import { failingVan, newCustomer, saveDesign, streetTruck } from "../setup/orders";
import { shopToday } from "@/lib/shop/locale";

// No payment provider answers on this port: an order is still placed (checkout opened later).
Object.assign(process.env, {
  STRIPE_SECRET_KEY: "sk_test_unreachable",
  STRIPE_API_HOST: "127.0.0.1",
  STRIPE_API_PORT: "9",
  STRIPE_API_PROTOCOL: "http",
  STRIPE_WEBHOOK_SECRET: "whsec_unused",
});

const PASSWORD = "a-long-password-1";

/**
 * The street truck with the pinion at 4.5°: working angles 2.0° and 0.5°, so the front/rear
 * difference 1.5° exceeds the 1° limit (common shop practice for road shafts) — a warning, not a
 * failure. The rear angle sits exactly on the 0.5° minimum, which passes.
 */
const warningTruck = {
  ...streetTruck,
  geometry: {
    transmission: { verticalDeg: 3, horizontalDeg: 0 },
    driveshaft: { verticalDeg: 5, horizontalDeg: 0 },
    pinion: { verticalDeg: 4.5, horizontalDeg: 0 },
  },
};

interface ApiBody {
  id: string;
  checkoutUrl: string | null;
  error: { code: string; message: string; fields: Record<string, string> };
}

async function post(cookie: string, body: unknown) {
  const res = await POST(
    new NextRequest("http://127.0.0.1/api/orders", {
      method: "POST",
      headers: { cookie, "content-type": "application/json" },
      body: JSON.stringify(body),
    }),
    { params: Promise.resolve({}) },
  );
  return { status: res.status, body: (await res.json()) as ApiBody };
}

const cookieOf = async (email: string) =>
  sessionCookie(await authRequest("/sign-in/email", { email, password: PASSWORD }));

async function counter() {
  const email = uniqueEmail("counter");
  const row = await createStaffUser(
    { name: "Dana Counter", email, role: "counter", password: PASSWORD },
    null,
  );
  return {
    user: { id: row.id, name: row.name, email, role: "counter" as const },
    cookie: await cookieOf(email),
  };
}

describe("warnings are acknowledged before ordering", () => {
  dbTest(
    "online: a missing acknowledgement is refused with 422 naming shafts[i].acknowledgements; nothing is placed",
    async () => {
      const { user, customer } = await newCustomer();
      const passing = await saveDesign(customer, user.id, streetTruck, "Passing shaft");
      const warning = await saveDesign(customer, user.id, warningTruck, "Warning shaft");
      const cookie = await cookieOf(user.email);
      const em = await getEm();
      const before = await em.count(Order, { customer: customer.id });

      for (const shafts of [
        undefined,
        [{ acknowledgements: [] }, { acknowledgements: [] }],
        [{ acknowledgements: ["angle-difference"] }, { acknowledgements: ["something-else"] }],
      ]) {
        const res = await post(cookie, { designIds: [passing.id, warning.id], fulfilment: "pickup", shafts });
        expect(res.status).toBe(422);
        expect(Object.keys(res.body.error.fields)).toEqual(["shafts[1].acknowledgements"]);
        expect(res.body.error.fields["shafts[1].acknowledgements"]).toContain(
          "Front/rear working-angle difference",
        );
      }
      expect(await em.count(Order, { customer: customer.id })).toBe(before);

      // A malformed list is a 422 too, never a 500.
      const bad = await post(cookie, {
        designIds: [warning.id],
        fulfilment: "pickup",
        shafts: [{ acknowledgements: "yes" }],
      });
      expect(bad.status).toBe(422);
      expect(bad.body.error.fields).toHaveProperty(["shafts[0].acknowledgements"]);
    },
  );

  dbTest(
    "online: with each warning acknowledged the order is placed and keeps who acknowledged what",
    async () => {
      const { user, customer } = await newCustomer();
      const warning = await saveDesign(customer, user.id, warningTruck, "Warning shaft");
      const res = await post(await cookieOf(user.email), {
        designIds: [warning.id],
        fulfilment: "pickup",
        shafts: [{ acknowledgements: ["angle-difference", "not-a-warning-of-this-shaft"] }],
      });
      expect(res.status).toBe(201);
      const em = await getEm();
      const [shaft] = await em.find(OrderShaft, { order: res.body.id });
      expect(shaft!.overall).toBe("warn");
      // Only the shaft's real warnings are stored, each with its text, the person and the channel.
      expect(shaft!.warningAcknowledgements).toEqual([
        {
          checkId: "angle-difference",
          message: expect.stringContaining("Front/rear working-angle difference 1.50°"),
          byUserId: user.id,
          byName: user.name,
          channel: "online",
          at: expect.stringMatching(/^\d{4}-\d\d-\d\dT/),
        },
      ]);
      // The order page's view carries them (staff and customer pages both render shaftViews).
      const order = await em.findOneOrFail(Order, { id: res.body.id });
      await populateOrder(em, order);
      const view = orderView(order, user, await shopToday());
      expect(view.shaftViews[0]!.warningAcknowledgements.map((a) => a.checkId)).toEqual(["angle-difference"]);
      expect(view.shaftViews[0]!.needsSignoff).toBe(false);
    },
  );

  dbTest("a passing design needs no acknowledgement (the body may leave shafts out)", async () => {
    const { user, customer } = await newCustomer();
    const design = await saveDesign(customer, user.id);
    const order = await placeOrder(user, { designIds: [design.id], fulfilment: "pickup" });
    const em = await getEm();
    const [shaft] = await em.find(OrderShaft, { order: order.id });
    expect(shaft!.warningAcknowledgements).toEqual([]);
  });

  dbTest("the counter acknowledges on the phone: stored with channel counter", async () => {
    const { customer } = await newCustomer();
    const desk = await counter();
    const warning = await saveDesign(customer, desk.user.id, warningTruck, "Warning shaft");
    const missing = await post(desk.cookie, {
      designIds: [warning.id],
      fulfilment: "pickup",
      customerId: customer.id,
    });
    expect(missing.status).toBe(422);
    expect(missing.body.error.fields).toHaveProperty(["shafts[0].acknowledgements"]);
    const res = await post(desk.cookie, {
      designIds: [warning.id],
      fulfilment: "pickup",
      customerId: customer.id,
      shafts: [{ acknowledgements: ["angle-difference"] }],
    });
    expect(res.status).toBe(201);
    const em = await getEm();
    const [shaft] = await em.find(OrderShaft, { order: res.body.id });
    expect(shaft!.warningAcknowledgements).toMatchObject([
      { checkId: "angle-difference", byUserId: desk.user.id, byName: "Dana Counter", channel: "counter" },
    ]);
  });
});

describe("a design that fails a check", () => {
  dbTest("a customer online cannot order it (422, told to phone the shop); nothing is placed", async () => {
    const { user, customer } = await newCustomer();
    const failing = await saveDesign(customer, user.id, failingVan, "Long van");
    const res = await post(await cookieOf(user.email), {
      designIds: [failing.id],
      fulfilment: "pickup",
      shafts: [{ acknowledgements: ["critical-speed"] }],
    });
    expect(res.status).toBe(422);
    expect(res.body.error.message).toMatch(/cannot be ordered online.*phone the shop/);
    const em = await getEm();
    expect(await em.count(Order, { customer: customer.id })).toBe(0);
  });

  dbTest(
    "the counter may place it once each failed check is acknowledged; it is stored failing and needs the owner's sign-off",
    async () => {
      const { customer } = await newCustomer();
      const desk = await counter();
      const failing = await saveDesign(customer, desk.user.id, failingVan, "Long van");
      const body = { designIds: [failing.id], fulfilment: "pickup", customerId: customer.id };

      const refused = await post(desk.cookie, body);
      expect(refused.status).toBe(422);
      expect(refused.body.error.fields["shafts[0].acknowledgements"]).toMatch(/failed check/);

      // The failing van's checks (examples/long-van-critical-speed-fail.json): every fail and warn id.
      const em = await getEm();
      const report = quoteDesigns(
        [{ name: "Long van", design: failingVan }],
        await getShopEngineering(),
        "pickup",
      ).shafts[0]!.report;
      const ids = report.checks.filter((c) => c.status !== "pass").map((c) => c.id);
      expect(report.checks.some((c) => c.status === "fail")).toBe(true);

      const res = await post(desk.cookie, { ...body, shafts: [{ acknowledgements: ids }] });
      expect(res.status).toBe(201);
      // No checkout is opened while the order waits for the owner's sign-off.
      expect(res.body.checkoutUrl).toBeNull();
      expect(await em.count(Payment, { order: res.body.id })).toBe(0);

      const order = await em.findOneOrFail(Order, { id: res.body.id });
      await populateOrder(em, order);
      const [shaft] = order.shafts.getItems();
      expect(shaft!.overall).toBe("fail");
      const frozen = shaft!.evaluation as { overall: string; checks: { status: string }[] };
      expect(frozen.overall).toBe("fail");
      expect(frozen.checks.some((c) => c.status === "fail")).toBe(true);
      const view = orderView(order, desk.user, await shopToday()).shaftViews[0]!;
      expect(view.needsSignoff).toBe(true);
      expect(view.overall).toBe("fail");
      expect(view.checks.filter((c) => c.status === "fail").length).toBeGreaterThan(0);

      const audit = await em.findOneOrFail(AuditEvent, { action: "order.place", subjectId: order.id });
      expect(audit.details).toMatchObject({ needsEngineeringSignoff: true });
    },
  );
});
