/** What Yokeline needs from a payment provider. The app calls this, never an SDK directly. */
export interface PaymentsPort {
  createCheckout(input: CheckoutInput): Promise<{ id: string; url: string }>;
  refund(input: {
    paymentIntentId: string;
    amountCents: number;
    idempotencyKey: string;
    reason: string;
  }): Promise<{
    id: string;
    amountCents: number;
  }>;
  /**
   * Closes an open checkout so it can no longer be paid. Resolves "expired" (now or before), or
   * "completed" when it was paid in the meantime (its completion event is then on its way).
   */
  expireCheckout(sessionId: string): Promise<"expired" | "completed">;
  /** Verifies a webhook's signature and returns its event; throws WebhookSignatureError when it does not verify. */
  verifyWebhook(rawBody: string, signatureHeader: string | null): Promise<PaymentEvent>;
}

export interface CheckoutInput {
  orderId: string;
  orderNumber: string;
  paymentId: string;
  amountCents: number;
  currency: string;
  description: string;
  customerEmail: string;
  successUrl: string;
  cancelUrl: string;
  idempotencyKey: string;
}

/** The provider events Yokeline acts on, reduced to what it reads. */
export type PaymentEvent =
  | {
      id: string;
      type: "checkout.session.completed";
      sessionId: string;
      paymentIntentId: string | null;
      amountCents: number;
      paid: boolean;
      raw: unknown;
    }
  | { id: string; type: "checkout.session.expired"; sessionId: string; raw: unknown }
  | {
      id: string;
      type: "payment_intent.payment_failed";
      paymentId: string | null;
      message: string;
      raw: unknown;
    }
  | {
      id: string;
      type: "charge.refunded";
      paymentIntentId: string | null;
      refundIds: string[];
      amountRefundedCents: number;
      raw: unknown;
    }
  | { id: string; type: "other"; providerType: string; raw: unknown };

export class WebhookSignatureError extends Error {}

/** The provider could not be reached or answered with its own failure; nothing was done there. */
export class PaymentsUnavailableError extends Error {}
