import "server-only";
import Stripe from "stripe";
import type { CheckoutInput, PaymentEvent, PaymentsPort } from "./port";
import { PaymentsUnavailableError, WebhookSignatureError } from "./port";

/** Turns "could not reach the provider" (and its own 5xx failures) into the port's error. */
async function reaching<T>(call: () => Promise<T>): Promise<T> {
  try {
    return await call();
  } catch (error) {
    if (
      error instanceof Stripe.errors.StripeConnectionError ||
      error instanceof Stripe.errors.StripeAPIError
    ) {
      throw new PaymentsUnavailableError(error.message);
    }
    throw error;
  }
}

/**
 * The Stripe adapter. In development and tests STRIPE_API_HOST/PORT/PROTOCOL point the
 * official SDK at the project's local fake; in production they are unset and real keys are used.
 */
export function stripeClient(env = process.env): Stripe {
  const key = env.STRIPE_SECRET_KEY;
  if (!key) throw new Error("STRIPE_SECRET_KEY is not set: payments are not configured.");
  const local = env.STRIPE_API_HOST
    ? {
        host: env.STRIPE_API_HOST,
        port: Number(env.STRIPE_API_PORT ?? 12111),
        protocol: (env.STRIPE_API_PROTOCOL ?? "http") as "http" | "https",
      }
    : {};
  return new Stripe(key, {
    ...local,
    maxNetworkRetries: local.host ? 0 : 2,
    telemetry: false,
    timeout: 20_000,
  });
}

export function createStripePayments(
  stripe: Stripe = stripeClient(),
  webhookSecret = process.env.STRIPE_WEBHOOK_SECRET,
): PaymentsPort {
  return {
    async createCheckout(input: CheckoutInput) {
      const session = await reaching(() =>
        stripe.checkout.sessions.create(
          {
            mode: "payment",
            line_items: [
              {
                quantity: 1,
                price_data: {
                  currency: input.currency.toLowerCase(),
                  unit_amount: input.amountCents,
                  product_data: { name: input.description },
                },
              },
            ],
            client_reference_id: input.orderId,
            customer_email: input.customerEmail,
            success_url: input.successUrl,
            cancel_url: input.cancelUrl,
            metadata: { orderId: input.orderId, paymentId: input.paymentId, orderNumber: input.orderNumber },
            payment_intent_data: { metadata: { orderId: input.orderId, paymentId: input.paymentId } },
          },
          { idempotencyKey: input.idempotencyKey },
        ),
      );
      if (!session.url) throw new Error("The payment provider returned no checkout address.");
      return { id: session.id, url: session.url };
    },

    async refund({ paymentIntentId, amountCents, idempotencyKey, reason }) {
      const refund = await reaching(() =>
        stripe.refunds.create(
          {
            payment_intent: paymentIntentId,
            amount: amountCents,
            metadata: { reason: reason.slice(0, 400) },
          },
          { idempotencyKey },
        ),
      );
      return { id: refund.id, amountCents: refund.amount };
    },

    async expireCheckout(sessionId) {
      try {
        await reaching(() => stripe.checkout.sessions.expire(sessionId));
        return "expired";
      } catch (error) {
        if (!(error instanceof Stripe.errors.StripeInvalidRequestError)) throw error;
        // Refused because it is no longer open: say which way it closed.
        const session = await reaching(() => stripe.checkout.sessions.retrieve(sessionId));
        if (session.status === "open") throw error;
        return session.status === "complete" ? "completed" : "expired";
      }
    },

    async verifyWebhook(rawBody, signatureHeader) {
      if (!webhookSecret) throw new Error("STRIPE_WEBHOOK_SECRET is not set.");
      let event: Stripe.Event;
      try {
        event = await stripe.webhooks.constructEventAsync(rawBody, signatureHeader ?? "", webhookSecret);
      } catch (error) {
        throw new WebhookSignatureError(error instanceof Error ? error.message : "Bad signature");
      }
      return toPaymentEvent(event);
    },
  };
}

function toPaymentEvent(event: Stripe.Event): PaymentEvent {
  switch (event.type) {
    case "checkout.session.completed": {
      const s = event.data.object;
      const pi = typeof s.payment_intent === "string" ? s.payment_intent : (s.payment_intent?.id ?? null);
      return {
        id: event.id,
        type: event.type,
        sessionId: s.id,
        paymentIntentId: pi,
        amountCents: s.amount_total ?? 0,
        paid: s.payment_status === "paid",
        raw: event,
      };
    }
    case "checkout.session.expired":
      return { id: event.id, type: event.type, sessionId: event.data.object.id, raw: event };
    case "payment_intent.payment_failed": {
      const pi = event.data.object;
      return {
        id: event.id,
        type: event.type,
        paymentId: pi.metadata?.paymentId ?? null,
        message: pi.last_payment_error?.message ?? "The card was declined.",
        raw: event,
      };
    }
    case "charge.refunded": {
      const ch = event.data.object;
      const pi = typeof ch.payment_intent === "string" ? ch.payment_intent : (ch.payment_intent?.id ?? null);
      return {
        id: event.id,
        type: event.type,
        paymentIntentId: pi,
        refundIds: (ch.refunds?.data ?? []).map((r) => r.id),
        amountRefundedCents: ch.amount_refunded,
        raw: event,
      };
    }
    default:
      return { id: event.id, type: "other", providerType: event.type, raw: event };
  }
}
