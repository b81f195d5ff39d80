import { describe, expect } from "vitest";
import { NextRequest } from "next/server";
import { Order, Payment } from "@/entities";
import { getEm } from "@/lib/db/orm";
import { placeOrder } from "@/lib/orders/place-order";
import { POST as checkoutPost } from "@/app/api/orders/[id]/checkout/route";
import { authRequest, sessionCookie } from "../setup/auth-requests";
import { dbTest } from "../setup/db";
import { newCustomer, saveDesign } from "../setup/orders";

// The payment provider is down: nothing listens on this port (9, "discard", closed on loopback).
Object.assign(process.env, {
  STRIPE_SECRET_KEY: "sk_test_unreachable",
  STRIPE_API_HOST: "127.0.0.1",
  STRIPE_API_PORT: "9",
  STRIPE_API_PROTOCOL: "http",
  STRIPE_WEBHOOK_SECRET: "whsec_unused",
});

describe("POST /api/orders/:id/checkout with the payment provider unreachable", () => {
  dbTest("answers 503 with a message the page can show, and keeps the order as it was", async () => {
    const { user, customer } = await newCustomer();
    const design = await saveDesign(customer, user.id);
    const order = await placeOrder(user, { designIds: [design.id], fulfilment: "pickup" });
    const cookie = sessionCookie(
      await authRequest("/sign-in/email", { email: user.email, password: "a-long-password-1" }),
    );
    const res = await checkoutPost(
      new NextRequest(`http://127.0.0.1/api/orders/${order.id}/checkout`, {
        method: "POST",
        headers: { cookie },
      }),
      { params: Promise.resolve({ id: order.id }) },
    );
    expect(res.status).toBe(503);
    const body = await res.json();
    expect(body.error.code).toBe("unavailable");
    expect(body.error.message).toMatch(/payment service cannot be reached/i);
    expect(body.error.message).toMatch(/order is saved/i);

    const em = await getEm();
    expect(await em.findOneOrFail(Order, { id: order.id })).toMatchObject({
      status: "awaiting_payment",
      paymentState: "unpaid",
      paidCents: 0,
      totalCents: order.totalCents,
    });
    expect(await em.count(Payment, { order: order.id })).toBe(0);
  });
});
