import { readFileSync } from "node:fs";
import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import { afterAll, beforeAll } from "vitest";
import { Customer, Design, Order, User } from "@/entities";
import { placeOrder } from "@/lib/orders/place-order";
import { getEm } from "@/lib/db/orm";
import type { CurrentUser } from "@/lib/auth/guard";
import { startStripeFake, type StripeFake } from "@/fakes/stripe/server";
import { POST as webhookPost } from "@/app/api/payments/webhook/route";
import { signUpVerified, uniqueEmail } from "./auth-requests";

export const streetTruck = JSON.parse(readFileSync("examples/street-truck.json", "utf8")) as Record<
  string,
  unknown
>;
export const compoundOffset = JSON.parse(readFileSync("examples/compound-offset.json", "utf8")) as Record<
  string,
  unknown
>;
export const failingVan = JSON.parse(
  readFileSync("examples/long-van-critical-speed-fail.json", "utf8"),
) as Record<string, unknown>;

/** A new customer with an account, as sign-up makes them. */
export async function newCustomer(): Promise<{ user: CurrentUser; customer: Customer }> {
  const email = uniqueEmail("buyer");
  await signUpVerified({ name: "Bea Buyer", email, password: "a-long-password-1" });
  const em = await getEm();
  const user = await em.findOneOrFail(User, { email });
  const customer = await em.findOneOrFail(Customer, { user: user.id });
  return { user: { id: user.id, name: user.name, email: user.email, role: "customer" }, customer };
}

export async function saveDesign(
  customer: Customer,
  createdBy: string,
  design: Record<string, unknown> = streetTruck,
  name = "Test shaft",
): Promise<Design> {
  const em = await getEm();
  const row = em.create(Design, {
    name,
    design,
    customer: em.getReference(Customer, customer.id),
    createdBy: em.getReference(User, createdBy),
    application: { description: "Test truck", use: "street" },
  });
  await em.flush();
  return row;
}

/**
 * Starts the Stripe fake with its webhooks delivered to the app's real webhook handler (through a
 * small local HTTP bridge), and points the payments port at it.
 */
export async function startPaymentsHarness(
  options: { duplicateDelivery?: boolean } = {},
): Promise<{ fake: StripeFake; close(): Promise<void> }> {
  const bridge: Server = createServer(async (req, res) => {
    const chunks: Buffer[] = [];
    for await (const c of req) chunks.push(c as Buffer);
    const response = await webhookPost(
      new Request("http://127.0.0.1/api/payments/webhook", {
        method: "POST",
        headers: {
          "content-type": "application/json",
          "stripe-signature": String(req.headers["stripe-signature"] ?? ""),
        },
        body: Buffer.concat(chunks).toString("utf8"),
      }),
    );
    res.writeHead(response.status, { "content-type": "application/json" });
    res.end(await response.text());
  });
  await new Promise<void>((r) => bridge.listen(0, "127.0.0.1", r));
  const bridgePort = (bridge.address() as AddressInfo).port;
  const fake = await startStripeFake({
    port: 0,
    webhookUrl: `http://127.0.0.1:${bridgePort}/`,
    webhookSecret: "whsec_test_harness",
    duplicateDelivery: options.duplicateDelivery ?? true,
    duplicateDelayMs: 50,
    log: false,
  });
  Object.assign(process.env, {
    STRIPE_SECRET_KEY: "sk_test_harness",
    STRIPE_API_HOST: "127.0.0.1",
    STRIPE_API_PORT: String(fake.port),
    STRIPE_API_PROTOCOL: "http",
    STRIPE_WEBHOOK_SECRET: "whsec_test_harness",
  });
  return {
    fake,
    async close() {
      await fake.close();
      await new Promise<void>((r) => bridge.close(() => r()));
    },
  };
}

/** Pays a checkout session through the fake's control endpoint (same effects as its page). */
export async function payWithCard(
  fake: StripeFake,
  sessionId: string | null | undefined,
  card: string,
): Promise<{ status: number; body: unknown }> {
  if (!sessionId) throw new Error("not a checkout payment (no session id)");
  const res = await fetch(`${fake.url}/_fake/checkout/${sessionId}/pay`, {
    method: "POST",
    headers: { "content-type": "application/json" },
    body: JSON.stringify({ card }),
  });
  return { status: res.status, body: await res.json() };
}

/**
 * The payments harness for a whole test file: started before its tests, closed after them.
 * `harness.fake` is the Stripe fake once the file's tests run.
 */
export function paymentsHarnessForFile(options: { duplicateDelivery?: boolean } = {}): { fake: StripeFake } {
  const holder = {} as { fake: StripeFake };
  let harness: Awaited<ReturnType<typeof startPaymentsHarness>> | undefined;
  beforeAll(async () => {
    harness = await startPaymentsHarness(options);
    holder.fake = harness.fake;
  });
  afterAll(async () => harness?.close());
  return holder;
}

/** A new customer's order of one saved shaft, for pickup, placed as the customer does online. */
export async function placedOrder() {
  const { user, customer } = await newCustomer();
  const design = await saveDesign(customer, user.id);
  const order = await placeOrder(user, { designIds: [design.id], fulfilment: "pickup" });
  return { user, customer, order };
}

/** The order as it is in the database now, with its payments and events. */
export async function reloadOrder(orderId: string): Promise<Order> {
  const em = await getEm();
  return em.findOneOrFail(Order, { id: orderId }, { populate: ["payments", "events"], refresh: true });
}
