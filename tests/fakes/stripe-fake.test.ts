import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import Stripe from "stripe";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { startStripeFake, type StripeFake } from "../../fakes/stripe/server";

const SECRET = "whsec_test_fake_suite";

interface Received {
  id: string;
  type: string;
  object: Record<string, unknown>;
}

/** A tiny webhook receiver that verifies signatures the way the app will. */
function startReceiver() {
  const received: Received[] = [];
  const rejected: string[] = [];
  let failNext = 0;
  const server: Server = createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on("data", (c: Buffer) => chunks.push(c));
    req.on("end", () => {
      if (failNext > 0) {
        failNext--;
        res.writeHead(500).end("try again");
        return;
      }
      try {
        const event = Stripe.webhooks.constructEvent(
          Buffer.concat(chunks).toString("utf8"),
          req.headers["stripe-signature"] ?? "",
          SECRET,
        );
        received.push({
          id: event.id,
          type: event.type,
          object: event.data.object as unknown as Record<string, unknown>,
        });
        res.writeHead(200).end("ok");
      } catch (err) {
        rejected.push(String(err));
        res.writeHead(400).end("bad signature");
      }
    });
  });
  return {
    received,
    rejected,
    failNextRequests(n: number) {
      failNext = n;
    },
    reset() {
      received.length = 0;
      rejected.length = 0;
      failNext = 0;
    },
    listen: () =>
      new Promise<string>((resolve) =>
        server.listen(0, "127.0.0.1", () =>
          resolve(`http://127.0.0.1:${(server.address() as AddressInfo).port}/webhooks/stripe`),
        ),
      ),
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}

const receiver = startReceiver();
let fake: StripeFake;
let stripe: Stripe;

async function control(
  path: string,
  body?: unknown,
): Promise<{ status: number; json: Record<string, unknown> }> {
  const res = await fetch(`${fake.url}${path}`, {
    method: body === undefined ? "GET" : "POST",
    headers: { "Content-Type": "application/json" },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  return { status: res.status, json: (await res.json()) as Record<string, unknown> };
}

function sessionParams(orderId = "order_123"): Stripe.Checkout.SessionCreateParams {
  return {
    mode: "payment",
    line_items: [
      {
        price_data: {
          currency: "usd",
          unit_amount: 45_000,
          product_data: { name: "Two-piece steel driveshaft" },
        },
        quantity: 1,
      },
      {
        price_data: { currency: "usd", unit_amount: 2_500, product_data: { name: "U-joint kit" } },
        quantity: 2,
      },
    ],
    success_url: "http://localhost:3000/checkout/success?session_id={CHECKOUT_SESSION_ID}",
    cancel_url: "http://localhost:3000/checkout/cancelled",
    client_reference_id: orderId,
    customer_email: "buyer@example.test",
    metadata: { orderId },
    payment_intent_data: { metadata: { orderId } },
  };
}

async function waitFor<T>(fn: () => T | undefined, timeoutMs = 5_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = fn();
    if (value !== undefined) return value;
    if (Date.now() > deadline) throw new Error("timed out waiting");
    await new Promise((r) => setTimeout(r, 25));
  }
}

beforeAll(async () => {
  const webhookUrl = await receiver.listen();
  fake = await startStripeFake({
    port: 0,
    webhookUrl,
    webhookSecret: SECRET,
    duplicateDelayMs: 100,
    retryDelaysMs: [50, 100],
    log: false,
  });
  stripe = new Stripe("sk_test_yokeline_fake", {
    host: "127.0.0.1",
    port: fake.port,
    protocol: "http",
    maxNetworkRetries: 0,
    telemetry: false,
  });
});

afterAll(async () => {
  await fake?.close();
  await receiver.close();
});

beforeEach(async () => {
  await control("/_fake/reset", {});
  receiver.reset();
});

describe("Stripe fake: checkout sessions", () => {
  it("creates a session like Stripe and replays the same idempotency key", async () => {
    const session = await stripe.checkout.sessions.create(sessionParams(), {
      idempotencyKey: "order_123-checkout",
    });
    expect(session.id).toMatch(/^cs_test_/);
    expect(session.object).toBe("checkout.session");
    expect(session.url).toBe(`${fake.url}/pay/${session.id}`);
    expect(session.amount_total).toBe(50_000);
    expect(session.currency).toBe("usd");
    expect(session.status).toBe("open");
    expect(session.payment_status).toBe("unpaid");
    expect(session.payment_intent).toBeNull();
    expect(session.metadata).toEqual({ orderId: "order_123" });
    expect(session.client_reference_id).toBe("order_123");

    const replay = await stripe.checkout.sessions.create(sessionParams(), {
      idempotencyKey: "order_123-checkout",
    });
    expect(replay.id).toBe(session.id);
    expect(replay.lastResponse.headers["idempotent-replayed"]).toBe("true");

    await expect(
      stripe.checkout.sessions.create(sessionParams("order_other"), { idempotencyKey: "order_123-checkout" }),
    ).rejects.toBeInstanceOf(Stripe.errors.StripeIdempotencyError);

    const fetched = await stripe.checkout.sessions.retrieve(session.id);
    expect(fetched.id).toBe(session.id);
    const items = await stripe.checkout.sessions.listLineItems(session.id);
    expect(items.data.map((li) => [li.description, li.quantity, li.amount_total])).toEqual([
      ["Two-piece steel driveshaft", 1, 45_000],
      ["U-joint kit", 2, 5_000],
    ]);
  });

  it("rejects bad parameters with typed invalid_request_errors", async () => {
    const { success_url: _omit, ...noSuccessUrl } = sessionParams();
    const err = await stripe.checkout.sessions
      .create(noSuccessUrl as Stripe.Checkout.SessionCreateParams)
      .catch((e: unknown) => e);
    expect(err).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect((err as Stripe.errors.StripeError).param).toBe("success_url");
    expect((err as Stripe.errors.StripeError).code).toBe("parameter_missing");

    const missing = await stripe.checkout.sessions.retrieve("cs_test_nope").catch((e: unknown) => e);
    expect(missing).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect((missing as Stripe.errors.StripeError).statusCode).toBe(404);
    expect((missing as Stripe.errors.StripeError).code).toBe("resource_missing");
  });

  it("expires an open session", async () => {
    const session = await stripe.checkout.sessions.create(sessionParams());
    const expired = await stripe.checkout.sessions.expire(session.id);
    expect(expired.status).toBe("expired");
    expect(expired.url).toBeNull();
    const pay = await control(`/_fake/checkout/${session.id}/pay`, { card: "4242424242424242" });
    expect(pay.status).toBe(409);
    await expect(stripe.checkout.sessions.expire(session.id)).rejects.toBeInstanceOf(
      Stripe.errors.StripeInvalidRequestError,
    );
  });

  it("answers a bad or missing key with an authentication error", async () => {
    const bad = new Stripe("sk_live_not_for_fakes", {
      host: "127.0.0.1",
      port: fake.port,
      protocol: "http",
      maxNetworkRetries: 0,
      telemetry: false,
    });
    await expect(bad.checkout.sessions.create(sessionParams())).rejects.toBeInstanceOf(
      Stripe.errors.StripeAuthenticationError,
    );
    const res = await fetch(`${fake.url}/v1/checkout/sessions`, { method: "POST" });
    expect(res.status).toBe(401);
    const body = (await res.json()) as { error: { type: string; message: string } };
    expect(body.error.message).toMatch(/did not provide an API key/);
  });
});

describe("Stripe fake: paying and webhooks", () => {
  it("pays with 4242 and delivers a signed checkout.session.completed twice", async () => {
    const session = await stripe.checkout.sessions.create(sessionParams("order_paid"));
    const pay = await control(`/_fake/checkout/${session.id}/pay`, { card: "4242424242424242" });
    expect(pay.status).toBe(200);
    expect(pay.json["outcome"]).toBe("succeeded");
    expect(pay.json["redirectUrl"]).toBe(`http://localhost:3000/checkout/success?session_id=${session.id}`);

    const paid = await stripe.checkout.sessions.retrieve(session.id, {
      expand: ["payment_intent.latest_charge"],
    });
    expect(paid.status).toBe("complete");
    expect(paid.payment_status).toBe("paid");
    const pi = paid.payment_intent as Stripe.PaymentIntent;
    expect(pi.id).toMatch(/^pi_test_/);
    expect(pi.status).toBe("succeeded");
    expect(pi.amount).toBe(50_000);
    expect(pi.metadata).toEqual({ orderId: "order_paid" });
    expect((pi.latest_charge as Stripe.Charge).id).toMatch(/^ch_test_/);
    const retrieved = await stripe.paymentIntents.retrieve(pi.id);
    expect(retrieved.status).toBe("succeeded");

    const completed = await waitFor(() => {
      const got = receiver.received.filter((r) => r.type === "checkout.session.completed");
      return got.length >= 2 ? got : undefined;
    });
    expect(completed).toHaveLength(2);
    expect(completed[0]?.id).toMatch(/^evt_/);
    expect(completed[1]?.id).toBe(completed[0]?.id);
    expect(completed[0]?.object["id"]).toBe(session.id);
    expect(completed[0]?.object["payment_status"]).toBe("paid");
    expect(receiver.rejected).toEqual([]);

    await fake.idle();
    const events = await control("/_fake/events?type=checkout.session.completed");
    const [entry] = events.json["data"] as Array<{
      deliveries: Array<{ kind: string; status: string; httpStatus: number }>;
    }>;
    expect(entry?.deliveries.map((d) => [d.kind, d.status, d.httpStatus]).sort()).toEqual([
      ["duplicate", "succeeded", 200],
      ["initial", "succeeded", 200],
    ]);
  });

  it("declines 4000000000000002, keeps the session open and emits payment_intent.payment_failed", async () => {
    const session = await stripe.checkout.sessions.create(sessionParams("order_declined"));
    const pay = await control(`/_fake/checkout/${session.id}/pay`, { card: "4000000000000002" });
    expect(pay.status).toBe(402);
    expect(pay.json["outcome"]).toBe("declined");
    // The fake's own words for people; the code the SDK sees stays the API's.
    expect(pay.json["message"]).toBe("The bank turned this card down.");
    expect(pay.json["code"]).toBe("card_declined");
    expect(pay.json["declineCode"]).toBe("generic_decline");

    const still = await stripe.checkout.sessions.retrieve(session.id);
    expect(still.status).toBe("open");
    expect(still.payment_status).toBe("unpaid");
    expect(still.payment_intent).toBeNull();

    const failed = await waitFor(() =>
      receiver.received.find((r) => r.type === "payment_intent.payment_failed"),
    );
    expect(failed.object["metadata"]).toEqual({ orderId: "order_declined" });
    expect((failed.object["last_payment_error"] as { code: string }).code).toBe("card_declined");

    // The same session can then be paid with a good card.
    const retry = await control(`/_fake/checkout/${session.id}/pay`, { card: "4242 4242 4242 4242" });
    expect(retry.status).toBe(200);
  });

  it("rejects numbers that are not test cards", async () => {
    const session = await stripe.checkout.sessions.create(sessionParams());
    const bad = await control(`/_fake/checkout/${session.id}/pay`, { card: "1234123412341234" });
    expect(bad.status).toBe(400);
    expect(bad.json["message"]).toBe("That is not a valid card number. Check the digits.");
    expect(bad.json["code"]).toBe("invalid_number");
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe("open");
  });

  it("retries a delivery the app answered with 500", async () => {
    await control("/_fake/config", { duplicateDelivery: false });
    try {
      receiver.failNextRequests(1);
      const session = await stripe.checkout.sessions.create(sessionParams());
      await control(`/_fake/checkout/${session.id}/pay`, { card: "4242424242424242" });
      await fake.idle();
      const events = await control("/_fake/events?type=checkout.session.completed");
      const [entry] = events.json["data"] as Array<{
        id: string;
        deliveries: Array<{ attempt: number; status: string }>;
      }>;
      const received = receiver.received.filter((r) => r.type === "checkout.session.completed");
      expect(received.map((r) => r.id)).toEqual([entry?.id]);
      // payment_intent.succeeded may have taken the injected 500; look across both events.
      const all = (await control("/_fake/events")).json["data"] as Array<{
        deliveries: Array<{ status: string }>;
      }>;
      const statuses = all.flatMap((e) => e.deliveries.map((d) => d.status));
      expect(statuses.filter((s) => s === "failed")).toHaveLength(1);
      expect(all.every((e) => e.deliveries.at(-1)?.status === "succeeded")).toBe(true);

      const resend = await control(`/_fake/events/${entry?.id}/resend`, {});
      expect(resend.status).toBe(202);
      await fake.idle();
      expect(receiver.received.filter((r) => r.id === entry?.id)).toHaveLength(2);
    } finally {
      await control("/_fake/config", { duplicateDelivery: true });
    }
  });
});

describe("Stripe fake: hosted checkout page", () => {
  it("shows an accessible test page, declines, then redirects on success", async () => {
    const session = await stripe.checkout.sessions.create(sessionParams("order_page"));
    const page = await fetch(session.url as string);
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain("Local test payment page");
    expect(html).toContain("$500.00");
    expect(html).toContain("U-joint kit");
    expect(html).toMatch(/<label for="card-number">Card number<\/label>/);
    expect(html).toContain('href="http://localhost:3000/checkout/cancelled"');

    const post = (fields: Record<string, string>) =>
      fetch(session.url as string, {
        method: "POST",
        headers: { "Content-Type": "application/x-www-form-urlencoded" },
        body: new URLSearchParams(fields).toString(),
        redirect: "manual",
      });
    const declined = await post({ cardNumber: "4000 0000 0000 0002", expiry: "12/34", cvc: "123" });
    expect(declined.status).toBe(402);
    const declinedPage = await declined.text();
    expect(declinedPage).toContain("The bank turned this card down.");
    expect(declinedPage).not.toMatch(/Your card (was declined|has insufficient funds|number is invalid)/);
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe("open");

    const ok = await post({ cardNumber: "4242 4242 4242 4242", expiry: "12/34", cvc: "123" });
    expect(ok.status).toBe(303);
    expect(ok.headers.get("location")).toBe(
      `http://localhost:3000/checkout/success?session_id=${session.id}`,
    );
    expect((await stripe.checkout.sessions.retrieve(session.id)).payment_status).toBe("paid");
  });
});

describe("Stripe fake: refunds", () => {
  it("refunds partially, rejects an over-refund, then refunds the rest", async () => {
    const session = await stripe.checkout.sessions.create(sessionParams("order_refund"));
    await control(`/_fake/checkout/${session.id}/pay`, { card: "4242424242424242" });
    const pi = (await stripe.checkout.sessions.retrieve(session.id)).payment_intent as string;

    const partial = await stripe.refunds.create(
      { payment_intent: pi, amount: 10_000 },
      { idempotencyKey: "refund-1" },
    );
    expect(partial.id).toMatch(/^re_test_/);
    expect(partial.amount).toBe(10_000);
    expect(partial.status).toBe("succeeded");
    const again = await stripe.refunds.create(
      { payment_intent: pi, amount: 10_000 },
      { idempotencyKey: "refund-1" },
    );
    expect(again.id).toBe(partial.id);

    const over = await stripe.refunds.create({ payment_intent: pi, amount: 40_001 }).catch((e: unknown) => e);
    expect(over).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect((over as Stripe.errors.StripeError).code).toBe("amount_too_large");
    expect((over as Stripe.errors.StripeError).message).toMatch(
      /greater than unrefunded amount on charge \(\$400\.00\)/,
    );

    const rest = await stripe.refunds.create({ payment_intent: pi });
    expect(rest.amount).toBe(40_000);
    expect((await stripe.refunds.retrieve(rest.id)).amount).toBe(40_000);
    await expect(stripe.refunds.create({ payment_intent: pi })).rejects.toBeInstanceOf(
      Stripe.errors.StripeInvalidRequestError,
    );

    const refunded = await waitFor(() => {
      const got = receiver.received.filter((r) => r.type === "charge.refunded");
      return got.length >= 4 ? got : undefined; // two refunds, each delivered twice
    });
    // Deliveries (and their duplicates) may interleave: the fully refunded state arrives in one of them.
    expect(refunded.some((r) => r.object["refunded"] === true)).toBe(true);
    expect(refunded.some((r) => r.object["refunded"] === false)).toBe(true);
    expect(receiver.received.some((r) => r.type === "refund.created")).toBe(true);
  });
});
