import { evaluateCard, type CardInput } from "./cards";
import { invalidParam, invalidRequest, missingParam, noSuchResource } from "./errors";
import type { FormObject, FormValue } from "./form-encoding";
import { newId, nowSeconds } from "./ids";
import { formatAmount, isKnownCurrency, MINIMUM_AMOUNTS } from "./money";
import {
  isFormObject,
  oneOf,
  optionalArray,
  optionalInteger,
  optionalObject,
  optionalString,
  readExpand,
  readMetadata,
  rejectUnknown,
  requiredString,
} from "./params";
import type {
  Charge,
  CheckoutSession,
  FakeState,
  LineItem,
  PaymentIntent,
  Refund,
  StoredEvent,
  StoredSession,
  StripeEvent,
} from "./types";
import { emptyState } from "./types";
import type { WebhookConfig, WebhookDispatcher } from "./webhooks";

export interface RequestContext {
  requestId: string | null;
  idempotencyKey: string | null;
}

const NO_REQUEST: RequestContext = { requestId: null, idempotencyKey: null };

export type PayResult =
  | { outcome: "succeeded"; redirectUrl: string; session: CheckoutSession; paymentIntent: PaymentIntent }
  | { outcome: "declined"; code: string; declineCode: string; message: string; paymentIntent: PaymentIntent }
  | { outcome: "invalid"; code: string; field: string; message: string }
  | { outcome: "unavailable"; message: string; session: CheckoutSession };

// Accepted and ignored: they change nothing the fake models. Params that would change
// the totals (discounts, shipping, tax) are rejected instead of being silently dropped.
const SESSION_PARAMS = new Set([
  "mode",
  "line_items",
  "success_url",
  "cancel_url",
  "client_reference_id",
  "customer_email",
  "metadata",
  "payment_intent_data",
  "expand",
  "expires_at",
  "locale",
  "payment_method_types",
  "submit_type",
  "currency",
  "billing_address_collection",
  "phone_number_collection",
  "allow_promotion_codes",
  "custom_text",
  "consent_collection",
  "customer_creation",
  "invoice_creation",
  "shipping_address_collection",
  "tax_id_collection",
  "ui_mode",
  "payment_method_collection",
  "after_expiration",
  "custom_fields",
  "payment_method_options",
  "automatic_tax",
]);
const UNSUPPORTED_SESSION_PARAMS = [
  "discounts",
  "shipping_options",
  "customer",
  "subscription_data",
  "setup_intent_data",
];
const LINE_ITEM_PARAMS = new Set([
  "price_data",
  "quantity",
  "price",
  "adjustable_quantity",
  "tax_rates",
  "dynamic_tax_rates",
]);
const PRICE_DATA_PARAMS = new Set([
  "currency",
  "unit_amount",
  "unit_amount_decimal",
  "product_data",
  "product",
  "tax_behavior",
]);
const PAYMENT_INTENT_DATA_PARAMS = new Set([
  "metadata",
  "description",
  "receipt_email",
  "capture_method",
  "setup_future_usage",
  "statement_descriptor",
  "statement_descriptor_suffix",
  "shipping",
  "transfer_group",
]);
const REFUND_PARAMS = new Set([
  "payment_intent",
  "charge",
  "amount",
  "reason",
  "metadata",
  "expand",
  "instructions_email",
]);
const EMAIL_RE = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

function checkUrl(value: string, param: string): string {
  try {
    const url = new URL(value);
    if (url.protocol !== "http:" && url.protocol !== "https:") throw new Error("scheme");
  } catch {
    throw invalidParam(param, "Not a valid URL", "url_invalid");
  }
  return value;
}

function clone<T>(value: T): T {
  return structuredClone(value);
}

export class StripeFakeCore {
  state: FakeState;

  constructor(
    initialState: FakeState,
    readonly config: WebhookConfig,
    private readonly dispatcher: WebhookDispatcher,
    private readonly publicUrl: () => string,
    private readonly apiVersion: string,
    private readonly persist: () => void,
  ) {
    this.state = initialState;
  }

  reset(): void {
    this.dispatcher.cancelAll();
    this.state = emptyState();
    this.persist();
  }

  // ---- Checkout Sessions -------------------------------------------------

  createCheckoutSession(params: FormObject): CheckoutSession {
    for (const key of UNSUPPORTED_SESSION_PARAMS) {
      if (params[key] !== undefined) {
        throw invalidRequest(`The local Stripe fake does not support \`${key}\` on Checkout Sessions.`, {
          param: key,
        });
      }
    }
    rejectUnknown(params, SESSION_PARAMS);
    const mode = requiredString(params, "mode");
    if (mode !== "payment")
      throw invalidParam("mode", `The local Stripe fake only supports mode=payment, got ${mode}.`);
    const uiMode = optionalString(params, "ui_mode");
    if (uiMode !== null && uiMode !== "hosted")
      throw invalidParam("ui_mode", "The local Stripe fake only supports ui_mode=hosted.");
    const automaticTax = optionalObject(params, "automatic_tax");
    if (automaticTax && automaticTax["enabled"] === "true") {
      throw invalidRequest("The local Stripe fake does not compute tax (automatic_tax[enabled]=true).", {
        param: "automatic_tax[enabled]",
      });
    }

    const successUrl = checkUrl(requiredString(params, "success_url"), "success_url");
    const cancelUrlRaw = optionalString(params, "cancel_url");
    const cancelUrl = cancelUrlRaw === null ? null : checkUrl(cancelUrlRaw, "cancel_url");
    const clientReferenceId = optionalString(params, "client_reference_id");
    if (clientReferenceId !== null && clientReferenceId.length > 200) {
      throw invalidParam("client_reference_id", "client_reference_id must be at most 200 characters.");
    }
    const customerEmail = optionalString(params, "customer_email");
    if (customerEmail !== null && !EMAIL_RE.test(customerEmail)) {
      throw invalidParam("customer_email", `Invalid email address: ${customerEmail}`, "email_invalid");
    }
    const metadata = readMetadata(params);

    const pid = optionalObject(params, "payment_intent_data") ?? {};
    rejectUnknown(pid, PAYMENT_INTENT_DATA_PARAMS, "payment_intent_data");
    const captureMethod = optionalString(pid, "capture_method", "payment_intent_data[capture_method]");
    if (captureMethod !== null && captureMethod !== "automatic" && captureMethod !== "automatic_async") {
      throw invalidRequest("The local Stripe fake only supports automatic capture.", {
        param: "payment_intent_data[capture_method]",
      });
    }
    const receiptEmail = optionalString(pid, "receipt_email", "payment_intent_data[receipt_email]");
    const paymentIntentData = {
      metadata: readMetadata(pid, "metadata", "payment_intent_data[metadata]"),
      description: optionalString(pid, "description", "payment_intent_data[description]"),
      receiptEmail,
    };

    const now = nowSeconds();
    let expiresAt = now + 24 * 3600;
    const requestedExpiry = optionalInteger(params, "expires_at");
    if (requestedExpiry !== null) {
      if (requestedExpiry < now + 30 * 60 - 5 || requestedExpiry > now + 24 * 3600 + 5) {
        throw invalidParam(
          "expires_at",
          "The `expires_at` timestamp must be between 30 minutes and 24 hours from Checkout Session creation.",
        );
      }
      expiresAt = requestedExpiry;
    }

    const lineItems = this.readLineItems(params);
    const currency = lineItems[0]?.currency ?? "usd";
    const amountTotal = lineItems.reduce((sum, li) => sum + li.amount_total, 0);
    const minimum = MINIMUM_AMOUNTS[currency];
    if (minimum !== undefined && amountTotal < minimum) {
      throw invalidRequest(
        `The Checkout Session's total amount due must add up to at least ${formatAmount(minimum, currency)} ${currency}`,
        { param: "line_items" },
      );
    }

    const id = newId("cs_test", 58);
    const session: CheckoutSession = {
      id,
      object: "checkout.session",
      amount_subtotal: amountTotal,
      amount_total: amountTotal,
      cancel_url: cancelUrl,
      client_reference_id: clientReferenceId,
      created: now,
      currency,
      customer: null,
      customer_details: null,
      customer_email: customerEmail,
      expires_at: expiresAt,
      livemode: false,
      locale: optionalString(params, "locale"),
      metadata,
      mode: "payment",
      payment_intent: null,
      payment_method_types: ["card"],
      payment_status: "unpaid",
      status: "open",
      submit_type: optionalString(params, "submit_type"),
      success_url: successUrl,
      total_details: { amount_discount: 0, amount_shipping: 0, amount_tax: 0 },
      ui_mode: "hosted",
      url: `${this.publicUrl()}/pay/${id}`,
    };
    this.state.sessions[id] = { session, lineItems, paymentIntentData, paymentIntentId: null };
    this.persist();
    return clone(session);
  }

  private readLineItems(params: FormObject): LineItem[] {
    const raw = optionalArray(params, "line_items");
    if (!raw || raw.length === 0) throw missingParam("line_items");
    if (raw.length > 100)
      throw invalidParam("line_items", "A Checkout Session can have at most 100 line items.");
    const items = raw.map((entry, i) => this.readLineItem(entry, `line_items[${i}]`));
    const currency = items[0]?.currency;
    if (items.some((li) => li.currency !== currency)) {
      throw invalidParam("line_items", "All line items must use the same currency.");
    }
    return items;
  }

  private readLineItem(entry: FormValue, param: string): LineItem {
    if (!isFormObject(entry)) throw invalidParam(param, `Invalid object`, "parameter_invalid_object");
    rejectUnknown(entry, LINE_ITEM_PARAMS, param);
    const price = optionalString(entry, "price", `${param}[price]`);
    if (price !== null) throw noSuchResource("price", price, `${param}[price]`);
    const priceData = optionalObject(entry, "price_data", `${param}[price_data]`);
    if (!priceData) throw missingParam(`${param}[price_data]`);
    rejectUnknown(priceData, PRICE_DATA_PARAMS, `${param}[price_data]`);
    const currency = requiredString(priceData, "currency", `${param}[price_data][currency]`).toLowerCase();
    if (!isKnownCurrency(currency)) {
      throw invalidParam(
        `${param}[price_data][currency]`,
        `Invalid currency: ${currency}.`,
        "parameter_invalid_string",
      );
    }
    let unitAmount = optionalInteger(priceData, "unit_amount", `${param}[price_data][unit_amount]`);
    if (unitAmount === null) {
      const decimal = optionalString(
        priceData,
        "unit_amount_decimal",
        `${param}[price_data][unit_amount_decimal]`,
      );
      if (decimal === null) throw missingParam(`${param}[price_data][unit_amount]`);
      if (!/^\d+$/.test(decimal)) {
        throw invalidParam(
          `${param}[price_data][unit_amount_decimal]`,
          "The local Stripe fake only supports whole-number unit_amount_decimal.",
        );
      }
      unitAmount = Number(decimal);
    }
    if (unitAmount < 0) {
      throw invalidParam(
        `${param}[price_data][unit_amount]`,
        "This value must be greater than or equal to 0.",
        "parameter_invalid_integer",
      );
    }
    const productData = optionalObject(priceData, "product_data", `${param}[price_data][product_data]`);
    const productId = optionalString(priceData, "product", `${param}[price_data][product]`);
    if (productId !== null) throw noSuchResource("product", productId, `${param}[price_data][product]`);
    if (!productData) throw missingParam(`${param}[price_data][product_data]`);
    const name = requiredString(productData, "name", `${param}[price_data][product_data][name]`);
    const quantity = optionalInteger(entry, "quantity", `${param}[quantity]`);
    if (quantity === null) throw missingParam(`${param}[quantity]`);
    if (quantity < 1 || quantity > 999_999) {
      throw invalidParam(
        `${param}[quantity]`,
        "Quantity must be between 1 and 999999.",
        "parameter_invalid_integer",
      );
    }
    const total = unitAmount * quantity;
    return {
      id: newId("li_test", 24),
      object: "item",
      amount_discount: 0,
      amount_subtotal: total,
      amount_tax: 0,
      amount_total: total,
      currency,
      description: name,
      quantity,
      price: {
        id: newId("price", 24),
        object: "price",
        active: false,
        currency,
        livemode: false,
        product: newId("prod", 14),
        type: "one_time",
        unit_amount: unitAmount,
      },
    };
  }

  /** Looks a session up, expiring it first when its expires_at has passed (as Stripe does). */
  storedSession(id: string): StoredSession {
    const stored = this.state.sessions[id];
    if (!stored) throw noSuchResource("checkout.session", id);
    if (stored.session.status === "open" && stored.session.expires_at <= nowSeconds()) {
      this.markExpired(stored, NO_REQUEST);
    }
    return stored;
  }

  getSession(id: string, expand: string[] = []): unknown {
    return this.expand(this.storedSession(id).session, expand);
  }

  listSessions(params: FormObject): unknown {
    const paymentIntent = optionalString(params, "payment_intent");
    const status = optionalString(params, "status");
    const items = Object.values(this.state.sessions)
      .map((s) => s.session)
      .filter(
        (s) =>
          (paymentIntent === null || s.payment_intent === paymentIntent) &&
          (status === null || s.status === status),
      );
    return this.list(items, params, "/v1/checkout/sessions");
  }

  listLineItems(id: string, params: FormObject): unknown {
    return this.list(
      [...this.storedSession(id).lineItems].reverse(),
      params,
      `/v1/checkout/sessions/${id}/line_items`,
    );
  }

  expireSession(id: string, ctx: RequestContext): CheckoutSession {
    const stored = this.storedSession(id);
    if (stored.session.status !== "open") {
      throw invalidRequest(
        `Only Checkout Sessions with a status in ["open"] can be expired. This Checkout Session has a status of "${stored.session.status}".`,
        { code: "checkout_session_not_open" },
      );
    }
    this.markExpired(stored, ctx);
    return clone(stored.session);
  }

  private markExpired(stored: StoredSession, ctx: RequestContext): void {
    stored.session.status = "expired";
    stored.session.url = null;
    this.persist();
    this.emit("checkout.session.expired", stored.session, ctx);
  }

  // ---- Paying (hosted page and control endpoint) ---------------------------

  paySession(id: string, card: CardInput, email: string | null = null): PayResult {
    const stored = this.storedSession(id);
    const { session } = stored;
    if (session.status !== "open") {
      const message =
        session.status === "complete"
          ? "This payment is already complete."
          : "This payment page has expired; start again from the shop.";
      return { outcome: "unavailable", message, session: clone(session) };
    }
    const result = evaluateCard(card);
    if (result.kind === "invalid")
      return { outcome: "invalid", code: result.code, field: result.field, message: result.message };

    const pi = this.paymentIntentFor(stored);
    const paymentMethod = newId("pm", 24);
    const customerEmail = session.customer_email ?? (email && EMAIL_RE.test(email) ? email : null);

    if (result.kind === "declined") {
      pi.status = "requires_payment_method";
      pi.payment_method = null;
      pi.last_payment_error = {
        type: "card_error",
        code: result.code,
        decline_code: result.declineCode,
        message: result.message,
        doc_url: "https://stripe.com/docs/error-codes/card-declined",
      };
      this.persist();
      this.emit("payment_intent.payment_failed", pi, NO_REQUEST);
      return {
        outcome: "declined",
        code: result.code,
        declineCode: result.declineCode,
        message: result.message,
        paymentIntent: clone(pi),
      };
    }

    const charge: Charge = {
      id: newId("ch_test", 24),
      object: "charge",
      amount: pi.amount,
      amount_captured: pi.amount,
      amount_refunded: 0,
      billing_details: { email: customerEmail, name: null },
      captured: true,
      created: nowSeconds(),
      currency: pi.currency,
      description: pi.description,
      failure_code: null,
      failure_message: null,
      livemode: false,
      metadata: { ...pi.metadata },
      outcome: {
        network_status: "approved_by_network",
        reason: null,
        risk_level: "normal",
        seller_message: "Payment complete.",
        type: "authorized",
      },
      paid: true,
      payment_intent: pi.id,
      payment_method: paymentMethod,
      payment_method_details: {
        type: "card",
        card: {
          brand: result.brand,
          country: "US",
          exp_month: result.expMonth,
          exp_year: result.expYear,
          funding: "credit",
          last4: result.last4,
        },
      },
      receipt_email: pi.receipt_email,
      refunded: false,
      status: "succeeded",
    };
    this.state.charges[charge.id] = charge;
    Object.assign(pi, {
      status: "succeeded",
      amount_received: pi.amount,
      latest_charge: charge.id,
      payment_method: paymentMethod,
      last_payment_error: null,
    } satisfies Partial<PaymentIntent>);
    Object.assign(session, {
      status: "complete",
      payment_status: "paid",
      payment_intent: pi.id,
      url: null,
      customer_details: {
        email: customerEmail,
        name: null,
        phone: null,
        address: null,
        tax_exempt: "none",
        tax_ids: [],
      },
    } satisfies Partial<CheckoutSession>);
    this.persist();
    this.emit("payment_intent.succeeded", pi, NO_REQUEST);
    this.emit("checkout.session.completed", session, NO_REQUEST);
    const redirectUrl = session.success_url
      .replaceAll("{CHECKOUT_SESSION_ID}", session.id)
      .replaceAll("%7BCHECKOUT_SESSION_ID%7D", session.id);
    return { outcome: "succeeded", redirectUrl, session: clone(session), paymentIntent: clone(pi) };
  }

  private paymentIntentFor(stored: StoredSession): PaymentIntent {
    const existing = stored.paymentIntentId ? this.state.paymentIntents[stored.paymentIntentId] : undefined;
    if (existing) return existing;
    const id = newId("pi_test", 24);
    const pi: PaymentIntent = {
      id,
      object: "payment_intent",
      amount: stored.session.amount_total,
      amount_capturable: 0,
      amount_received: 0,
      canceled_at: null,
      capture_method: "automatic_async",
      client_secret: `${id}_secret_${newId("x", 24).slice(2)}`,
      confirmation_method: "automatic",
      created: nowSeconds(),
      currency: stored.session.currency,
      customer: null,
      description: stored.paymentIntentData.description,
      last_payment_error: null,
      latest_charge: null,
      livemode: false,
      metadata: { ...stored.paymentIntentData.metadata },
      payment_method: null,
      payment_method_types: ["card"],
      receipt_email: stored.paymentIntentData.receiptEmail,
      status: "requires_payment_method",
    };
    this.state.paymentIntents[id] = pi;
    stored.paymentIntentId = id;
    return pi;
  }

  // ---- PaymentIntents, charges -------------------------------------------

  getPaymentIntent(id: string, expand: string[] = []): unknown {
    const pi = this.state.paymentIntents[id];
    if (!pi) throw noSuchResource("payment_intent", id);
    return this.expand(pi, expand);
  }

  getCharge(id: string, expand: string[] = []): unknown {
    const charge = this.state.charges[id];
    if (!charge) throw noSuchResource("charge", id);
    return this.expand(charge, expand);
  }

  // ---- Refunds -------------------------------------------------------------

  createRefund(params: FormObject, ctx: RequestContext): Refund {
    rejectUnknown(params, REFUND_PARAMS);
    const piId = optionalString(params, "payment_intent");
    const chargeId = optionalString(params, "charge");
    if (piId === null && chargeId === null) {
      throw invalidRequest(
        "One of the following params should be provided for this request: payment_intent or charge.",
        {
          code: "parameter_missing",
        },
      );
    }
    let charge: Charge | undefined;
    if (piId !== null) {
      const pi = this.state.paymentIntents[piId];
      if (!pi) throw noSuchResource("payment_intent", piId, "payment_intent");
      charge = pi.latest_charge ? this.state.charges[pi.latest_charge] : undefined;
      if (pi.status !== "succeeded" || !charge) {
        throw invalidRequest(`This PaymentIntent (${piId}) does not have a successful charge to refund.`, {
          code: "charge_not_refundable",
          param: "payment_intent",
        });
      }
      if (chargeId !== null && chargeId !== charge.id) {
        throw invalidRequest(`The charge ${chargeId} does not belong to PaymentIntent ${piId}.`, {
          param: "charge",
        });
      }
    } else if (chargeId !== null) {
      charge = this.state.charges[chargeId];
      if (!charge) throw noSuchResource("charge", chargeId, "charge");
    }
    if (!charge) throw missingParam("charge");

    const remaining = charge.amount - charge.amount_refunded;
    if (remaining <= 0) {
      throw invalidRequest(`Charge ${charge.id} has already been refunded.`, {
        code: "charge_already_refunded",
      });
    }
    const requested = optionalInteger(params, "amount");
    if (requested !== null && requested <= 0) {
      throw invalidParam("amount", "Invalid positive integer", "parameter_invalid_integer");
    }
    const amount = requested ?? remaining;
    if (amount > remaining) {
      throw invalidRequest(
        `Refund amount (${formatAmount(amount, charge.currency)}) is greater than unrefunded amount on charge (${formatAmount(remaining, charge.currency)})`,
        { code: "amount_too_large", param: "amount" },
      );
    }
    const reason = oneOf(
      optionalString(params, "reason"),
      ["duplicate", "fraudulent", "requested_by_customer"] as const,
      "reason",
    );
    const refund: Refund = {
      id: newId("re_test", 24),
      object: "refund",
      amount,
      balance_transaction: null,
      charge: charge.id,
      created: nowSeconds(),
      currency: charge.currency,
      metadata: readMetadata(params),
      payment_intent: charge.payment_intent,
      reason,
      receipt_number: null,
      status: "succeeded",
    };
    this.state.refunds[refund.id] = refund;
    const previous = { amount_refunded: charge.amount_refunded, refunded: charge.refunded };
    charge.amount_refunded += amount;
    charge.refunded = charge.amount_refunded >= charge.amount;
    this.persist();
    this.emit("refund.created", refund, ctx);
    this.emit("charge.refunded", charge, ctx, previous);
    return clone(refund);
  }

  getRefund(id: string, expand: string[] = []): unknown {
    const refund = this.state.refunds[id];
    if (!refund) throw noSuchResource("refund", id);
    return this.expand(refund, expand);
  }

  listRefunds(params: FormObject): unknown {
    const pi = optionalString(params, "payment_intent");
    const charge = optionalString(params, "charge");
    const items = Object.values(this.state.refunds).filter(
      (r) => (pi === null || r.payment_intent === pi) && (charge === null || r.charge === charge),
    );
    return this.list(items, params, "/v1/refunds");
  }

  // ---- Events --------------------------------------------------------------

  emit(
    type: string,
    object: unknown,
    ctx: RequestContext,
    previousAttributes?: Record<string, unknown>,
  ): StoredEvent {
    const event: StripeEvent = {
      id: newId("evt_test", 24),
      object: "event",
      api_version: this.apiVersion,
      created: nowSeconds(),
      data: {
        object: clone(object),
        ...(previousAttributes ? { previous_attributes: previousAttributes } : {}),
      },
      livemode: false,
      pending_webhooks: this.config.webhookUrl ? 1 : 0,
      request: { id: ctx.requestId, idempotency_key: ctx.idempotencyKey },
      type,
    };
    const stored: StoredEvent = { event, deliveries: [] };
    this.state.events.push(stored);
    this.persist();
    this.dispatcher.dispatch(stored);
    return stored;
  }

  findEvent(id: string): StoredEvent {
    const stored = this.state.events.find((e) => e.event.id === id);
    if (!stored) throw noSuchResource("event", id);
    return stored;
  }

  listEvents(params: FormObject): unknown {
    const type = optionalString(params, "type");
    const items = this.state.events.map((e) => e.event).filter((e) => type === null || e.type === type);
    return this.list(items, params, "/v1/events");
  }

  // ---- Helpers -------------------------------------------------------------

  /** Sorts newest first and applies limit/starting_after/ending_before like Stripe lists. */
  private list(
    items: ReadonlyArray<{ id: string; created?: number }>,
    params: FormObject,
    url: string,
  ): unknown {
    const limit = optionalInteger(params, "limit") ?? 10;
    if (limit < 1 || limit > 100)
      throw invalidParam("limit", "This value must be between 1 and 100.", "parameter_invalid_integer");
    let sorted = [...items].reverse(); // insertion order is creation order
    const startingAfter = optionalString(params, "starting_after");
    const endingBefore = optionalString(params, "ending_before");
    if (startingAfter !== null) sorted = sorted.slice(sorted.findIndex((i) => i.id === startingAfter) + 1);
    if (endingBefore !== null) {
      const idx = sorted.findIndex((i) => i.id === endingBefore);
      sorted = idx >= 0 ? sorted.slice(Math.max(0, idx - limit), idx) : [];
    }
    const page = sorted.slice(0, limit);
    const expand = readExpand(params)
      .filter((p) => p.startsWith("data."))
      .map((p) => p.slice(5));
    return {
      object: "list",
      data: page.map((item) => this.expand(item, expand)),
      has_more: sorted.length > page.length,
      url,
    };
  }

  private lookup(id: string): unknown {
    if (id.startsWith("pi_")) return this.state.paymentIntents[id];
    if (id.startsWith("ch_")) return this.state.charges[id];
    if (id.startsWith("re_")) return this.state.refunds[id];
    if (id.startsWith("cs_")) return this.state.sessions[id]?.session;
    return undefined;
  }

  /** Replaces id fields by the objects they name, for `expand[]=payment_intent.latest_charge` etc. */
  expand(object: unknown, paths: string[]): unknown {
    const result = clone(object);
    for (const path of paths) {
      let targets: unknown[] = [result];
      for (const field of path.split(".")) {
        const next: unknown[] = [];
        for (const target of targets) {
          if (!target || typeof target !== "object") continue;
          const record = target as Record<string, unknown>;
          const value = record[field];
          if (field === "line_items" && record["object"] === "checkout.session") {
            const stored = this.state.sessions[String(record["id"])];
            record[field] = {
              object: "list",
              data: clone(stored?.lineItems ?? []),
              has_more: false,
              url: `/v1/checkout/sessions/${String(record["id"])}/line_items`,
            };
            continue;
          }
          if (typeof value === "string") {
            const found = this.lookup(value);
            if (found === undefined)
              throw invalidRequest(`This property cannot be expanded (${path}).`, { param: "expand" });
            record[field] = clone(found);
            next.push(record[field]);
          } else if (value && typeof value === "object") {
            next.push(value);
          } else if (value === undefined) {
            throw invalidRequest(`This property cannot be expanded (${path}).`, { param: "expand" });
          }
        }
        targets = next;
      }
    }
    return result;
  }
}
