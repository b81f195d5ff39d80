import { describe, expect } from "vitest";
import { NextRequest } from "next/server";
import { Order } from "@/entities";
import { getEm } from "@/lib/db/orm";
import { POST } from "@/app/api/orders/route";
import { authRequest, sessionCookie } from "../setup/auth-requests";
import { dbTest } from "../setup/db";
import { newCustomer, saveDesign } from "../setup/orders";

// No payment provider answers on this port: the order must still be placed and kept.
Object.assign(process.env, {
  STRIPE_SECRET_KEY: "sk_test_unreachable",
  STRIPE_API_HOST: "127.0.0.1",
  STRIPE_API_PORT: "9",
  STRIPE_API_PROTOCOL: "http",
  STRIPE_WEBHOOK_SECRET: "whsec_unused",
});

async function post(cookie: string, body: unknown) {
  return POST(
    new NextRequest("http://127.0.0.1/api/orders", {
      method: "POST",
      headers: { cookie, "content-type": "application/json" },
      body: JSON.stringify(body),
    }),
    { params: Promise.resolve({}) },
  );
}

describe("POST /api/orders", () => {
  dbTest(
    "keeps the order when the payment provider cannot be reached, and says there is no checkout yet",
    async () => {
      const { user, customer } = await newCustomer();
      const design = await saveDesign(customer, user.id);
      const cookie = sessionCookie(
        await authRequest("/sign-in/email", { email: user.email, password: "a-long-password-1" }),
      );
      const res = await post(cookie, { designIds: [design.id], fulfilment: "pickup" });
      expect(res.status).toBe(201);
      const body = await res.json();
      expect(body.checkoutUrl).toBeNull();
      const em = await getEm();
      expect(await em.findOne(Order, { id: body.id })).toMatchObject({
        status: "awaiting_payment",
        paymentState: "unpaid",
      });
    },
  );

  dbTest("answers 422 naming the field when shipping has no address", async () => {
    const { user, customer } = await newCustomer();
    const design = await saveDesign(customer, user.id);
    const cookie = sessionCookie(
      await authRequest("/sign-in/email", { email: user.email, password: "a-long-password-1" }),
    );
    const res = await post(cookie, { designIds: [design.id], fulfilment: "ship" });
    expect(res.status).toBe(422);
    expect((await res.json()).error.fields).toHaveProperty("shipTo");
  });

  dbTest("answers 401 without a session", async () => {
    expect((await post("", { designIds: [], fulfilment: "pickup" })).status).toBe(401);
  });
});
