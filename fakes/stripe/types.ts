/** The subset of Stripe's object shapes the fake produces (snake_case, as on the wire). */
export type Metadata = Record<string, string>;

export interface LineItem {
  id: string;
  object: "item";
  amount_discount: number;
  amount_subtotal: number;
  amount_tax: number;
  amount_total: number;
  currency: string;
  description: string;
  quantity: number;
  price: {
    id: string;
    object: "price";
    active: boolean;
    currency: string;
    livemode: false;
    product: string;
    type: "one_time";
    unit_amount: number;
  };
}

export interface CheckoutSession {
  id: string;
  object: "checkout.session";
  amount_subtotal: number;
  amount_total: number;
  cancel_url: string | null;
  client_reference_id: string | null;
  created: number;
  currency: string;
  customer: null;
  customer_details: {
    email: string | null;
    name: string | null;
    phone: null;
    address: null;
    tax_exempt: "none";
    tax_ids: [];
  } | null;
  customer_email: string | null;
  expires_at: number;
  livemode: false;
  locale: string | null;
  metadata: Metadata;
  mode: "payment";
  payment_intent: string | null;
  payment_method_types: string[];
  payment_status: "unpaid" | "paid";
  status: "open" | "complete" | "expired";
  submit_type: string | null;
  success_url: string;
  total_details: { amount_discount: number; amount_shipping: number; amount_tax: number };
  ui_mode: "hosted";
  url: string | null;
}

export interface PaymentError {
  type: "card_error";
  code: string;
  decline_code?: string;
  message: string;
  doc_url: string;
}

export interface PaymentIntent {
  id: string;
  object: "payment_intent";
  amount: number;
  amount_capturable: number;
  amount_received: number;
  canceled_at: number | null;
  capture_method: "automatic_async";
  client_secret: string;
  confirmation_method: "automatic";
  created: number;
  currency: string;
  customer: null;
  description: string | null;
  last_payment_error: PaymentError | null;
  latest_charge: string | null;
  livemode: false;
  metadata: Metadata;
  payment_method: string | null;
  payment_method_types: string[];
  receipt_email: string | null;
  status: "requires_payment_method" | "succeeded";
}

export interface Charge {
  id: string;
  object: "charge";
  amount: number;
  amount_captured: number;
  amount_refunded: number;
  billing_details: { email: string | null; name: string | null };
  captured: boolean;
  created: number;
  currency: string;
  description: string | null;
  failure_code: null;
  failure_message: null;
  livemode: false;
  metadata: Metadata;
  outcome: { network_status: string; reason: null; risk_level: string; seller_message: string; type: string };
  paid: boolean;
  payment_intent: string;
  payment_method: string;
  payment_method_details: {
    type: "card";
    card: {
      brand: string;
      country: string;
      exp_month: number;
      exp_year: number;
      funding: string;
      last4: string;
    };
  };
  receipt_email: string | null;
  refunded: boolean;
  status: "succeeded";
}

export interface Refund {
  id: string;
  object: "refund";
  amount: number;
  balance_transaction: null;
  charge: string;
  created: number;
  currency: string;
  metadata: Metadata;
  payment_intent: string;
  reason: string | null;
  receipt_number: null;
  status: "succeeded";
}

export interface StripeEvent {
  id: string;
  object: "event";
  api_version: string;
  created: number;
  data: { object: unknown; previous_attributes?: Record<string, unknown> };
  livemode: false;
  pending_webhooks: number;
  request: { id: string | null; idempotency_key: string | null };
  type: string;
}

export type DeliveryKind = "initial" | "duplicate" | "resend";

export interface DeliveryAttempt {
  kind: DeliveryKind;
  attempt: number;
  url: string;
  startedAt: string;
  durationMs: number;
  status: "succeeded" | "failed";
  httpStatus: number | null;
  error: string | null;
}

export interface StoredEvent {
  event: StripeEvent;
  deliveries: DeliveryAttempt[];
}

export interface StoredSession {
  session: CheckoutSession;
  lineItems: LineItem[];
  paymentIntentData: { metadata: Metadata; description: string | null; receiptEmail: string | null };
  /** Set by the first payment attempt, declined or not; exposed on the session only once paid. */
  paymentIntentId: string | null;
}

export interface IdempotencyRecord {
  endpoint: string;
  paramsHash: string;
  status: number;
  body: unknown;
  createdAt: number;
}

export interface FakeState {
  sessions: Record<string, StoredSession>;
  paymentIntents: Record<string, PaymentIntent>;
  charges: Record<string, Charge>;
  refunds: Record<string, Refund>;
  events: StoredEvent[];
  idempotency: Record<string, IdempotencyRecord>;
}

export function emptyState(): FakeState {
  return { sessions: {}, paymentIntents: {}, charges: {}, refunds: {}, events: [], idempotency: {} };
}
