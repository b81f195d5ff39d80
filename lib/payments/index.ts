import "server-only";
import type { PaymentsPort } from "./port";
import { createStripePayments } from "./stripe";

/** The payments port: the rest of the app imports from here, never the adapter or the SDK. */
export {
  PaymentsUnavailableError,
  WebhookSignatureError,
  type CheckoutInput,
  type PaymentEvent,
  type PaymentsPort,
} from "./port";

const SETTINGS = [
  "STRIPE_SECRET_KEY",
  "STRIPE_WEBHOOK_SECRET",
  "STRIPE_API_HOST",
  "STRIPE_API_PORT",
  "STRIPE_API_PROTOCOL",
] as const;
const cache = new Map<string, PaymentsPort>();

/**
 * The payments port as configured: the Stripe adapter, pointed at the local fake when
 * STRIPE_API_HOST is set (development and tests). Like the mail and storage ports, the settings are
 * read on every call and each setting's adapter is built once.
 */
export function payments(): PaymentsPort {
  const key = SETTINGS.map((name) => process.env[name] ?? "").join("|");
  let port = cache.get(key);
  if (!port) {
    port = createStripePayments();
    cache.set(key, port);
  }
  return port;
}
