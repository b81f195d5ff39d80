/**
 * Local Stripe fake: the subset of the Stripe API Yokeline uses, a hosted
 * checkout page, and signed webhook delivery (with deliberate duplicates).
 * Development and tests only; production talks to the real Stripe.
 */
import { createServer, type IncomingMessage, type ServerResponse } from "node:http";
import Stripe from "stripe";
import {
  BodyTooLargeError,
  closeServer,
  envPort,
  listen,
  LOCALHOST,
  readBody,
  redirect,
  sendHtml,
  sendJson,
  runAsScript,
} from "../shared/http";
import { StripeFakeCore, type RequestContext } from "./core";
import { renderCheckoutPage, renderNotFound } from "./checkout-page";
import { StripeApiError } from "./errors";
import { canonicalJson, FormEncodingError, parseStripeForm, type FormObject } from "./form-encoding";
import { newId } from "./ids";
import { readExpand } from "./params";
import { StatePersistence } from "./persistence";
import { WebhookDispatcher, type WebhookConfig } from "./webhooks";

export interface StripeFakeOptions {
  /** 0 picks a free port. */
  port?: number;
  host?: string;
  /** Base of the hosted checkout URLs; defaults to http://127.0.0.1:<port>. */
  publicUrl?: string;
  webhookUrl?: string | null;
  webhookSecret?: string;
  duplicateDelivery?: boolean;
  duplicateDelayMs?: number;
  retryDelaysMs?: number[];
  deliveryTimeoutMs?: number;
  enabledEvents?: string[];
  /** When set, only this exact secret key is accepted; otherwise any sk_test_… key. */
  apiKey?: string;
  /** JSON file to persist state to across restarts. */
  stateFile?: string | null;
  log?: ((line: string) => void) | false;
}

export interface StripeFake {
  url: string;
  port: number;
  core: StripeFakeCore;
  config: WebhookConfig;
  /** Waits until no webhook delivery is scheduled or in flight. */
  idle(timeoutMs?: number): Promise<boolean>;
  close(): Promise<void>;
}

export const DEFAULT_STRIPE_FAKE_PORT = 12111;
export const DEFAULT_WEBHOOK_SECRET = "whsec_local_fake";
const API_VERSION: string = Stripe.API_VERSION;
const TEST_KEY_RE = /^(sk|rk)_test_[A-Za-z0-9_]+$/;

type Route = {
  method: "GET" | "POST";
  pattern: RegExp;
  handler: (match: string[], params: FormObject, ctx: RequestContext) => unknown;
};

function bearerKey(req: IncomingMessage): string | null {
  const header = req.headers.authorization;
  if (!header) return null;
  const bearer = /^Bearer\s+(.+)$/i.exec(header);
  if (bearer?.[1]) return bearer[1].trim();
  const basic = /^Basic\s+(.+)$/i.exec(header);
  if (basic?.[1]) return Buffer.from(basic[1], "base64").toString("utf8").split(":")[0] ?? null;
  return null;
}

function redactKey(key: string): string {
  return key.length > 12 ? `${key.slice(0, 8)}${"*".repeat(key.length - 12)}${key.slice(-4)}` : "****";
}

function authenticate(req: IncomingMessage, requiredKey: string | undefined): string {
  const key = bearerKey(req);
  if (!key) {
    throw new StripeApiError(
      401,
      "invalid_request_error",
      "You did not provide an API key. You need to provide your API key in the Authorization header, using Bearer auth (e.g. 'Authorization: Bearer YOUR_SECRET_KEY').",
    );
  }
  if (!TEST_KEY_RE.test(key) || (requiredKey !== undefined && key !== requiredKey)) {
    const hint = key.startsWith("sk_live_")
      ? " The local Stripe fake only accepts test-mode keys (sk_test_...)."
      : "";
    throw new StripeApiError(
      401,
      "invalid_request_error",
      `Invalid API Key provided: ${redactKey(key)}.${hint}`,
      {
        code: "api_key_invalid",
      },
    );
  }
  return key;
}

async function readJson(req: IncomingMessage): Promise<Record<string, unknown>> {
  const body = await readBody(req);
  if (body.trim() === "") return {};
  const parsed: unknown = JSON.parse(body);
  if (!parsed || typeof parsed !== "object" || Array.isArray(parsed))
    throw new Error("Expected a JSON object");
  return parsed as Record<string, unknown>;
}

function applyConfigPatch(config: WebhookConfig, patch: Record<string, unknown>): void {
  const {
    webhookUrl,
    webhookSecret,
    duplicateDelivery,
    duplicateDelayMs,
    retryDelaysMs,
    deliveryTimeoutMs,
    enabledEvents,
  } = patch;
  if (webhookUrl !== undefined) {
    if (webhookUrl !== null && (typeof webhookUrl !== "string" || !/^https?:\/\//.test(webhookUrl))) {
      throw new Error("webhookUrl must be an http(s) URL or null");
    }
    config.webhookUrl = webhookUrl;
  }
  if (webhookSecret !== undefined) {
    if (typeof webhookSecret !== "string" || webhookSecret === "")
      throw new Error("webhookSecret must be a non-empty string");
    config.webhookSecret = webhookSecret;
  }
  if (duplicateDelivery !== undefined) {
    if (typeof duplicateDelivery !== "boolean") throw new Error("duplicateDelivery must be a boolean");
    config.duplicateDelivery = duplicateDelivery;
  }
  const nonNegative = (v: unknown): v is number => typeof v === "number" && Number.isFinite(v) && v >= 0;
  if (duplicateDelayMs !== undefined) {
    if (!nonNegative(duplicateDelayMs)) throw new Error("duplicateDelayMs must be a non-negative number");
    config.duplicateDelayMs = duplicateDelayMs;
  }
  if (deliveryTimeoutMs !== undefined) {
    if (!nonNegative(deliveryTimeoutMs) || deliveryTimeoutMs === 0)
      throw new Error("deliveryTimeoutMs must be a positive number");
    config.deliveryTimeoutMs = deliveryTimeoutMs;
  }
  if (retryDelaysMs !== undefined) {
    if (!Array.isArray(retryDelaysMs) || !retryDelaysMs.every(nonNegative))
      throw new Error("retryDelaysMs must be an array of numbers");
    config.retryDelaysMs = retryDelaysMs;
  }
  if (enabledEvents !== undefined) {
    if (!Array.isArray(enabledEvents) || !enabledEvents.every((e) => typeof e === "string")) {
      throw new Error("enabledEvents must be an array of strings");
    }
    config.enabledEvents = enabledEvents;
  }
}

export async function startStripeFake(options: StripeFakeOptions = {}): Promise<StripeFake> {
  const log =
    options.log === false
      ? () => {}
      : (options.log ?? ((line: string) => console.log(`[stripe-fake] ${line}`)));
  const config: WebhookConfig = {
    webhookUrl: options.webhookUrl ?? null,
    webhookSecret: options.webhookSecret ?? DEFAULT_WEBHOOK_SECRET,
    duplicateDelivery: options.duplicateDelivery ?? true,
    duplicateDelayMs: options.duplicateDelayMs ?? 300,
    retryDelaysMs: options.retryDelaysMs ?? [500, 1500, 4000],
    deliveryTimeoutMs: options.deliveryTimeoutMs ?? 10_000,
    enabledEvents: options.enabledEvents ?? ["*"],
  };
  const persistence = new StatePersistence(options.stateFile ?? null);
  let publicUrl = "";
  // Declared before use by the dispatcher callback; assigned right after.
  // eslint-disable-next-line prefer-const -- assigned once, after the callbacks that read it
  let core: StripeFakeCore;
  const persist = () => persistence.scheduleSave(() => core.state);
  const dispatcher = new WebhookDispatcher(() => config, persist, log);
  core = new StripeFakeCore(persistence.load(), config, dispatcher, () => publicUrl, API_VERSION, persist);

  const api: Route[] = [
    {
      method: "POST",
      pattern: /^\/v1\/checkout\/sessions$/,
      handler: (_m, p) => core.expand(core.createCheckoutSession(p), readExpand(p)),
    },
    { method: "GET", pattern: /^\/v1\/checkout\/sessions$/, handler: (_m, p) => core.listSessions(p) },
    {
      method: "GET",
      pattern: /^\/v1\/checkout\/sessions\/([^/]+)$/,
      handler: (m, p) => core.getSession(m[1] as string, readExpand(p)),
    },
    {
      method: "GET",
      pattern: /^\/v1\/checkout\/sessions\/([^/]+)\/line_items$/,
      handler: (m, p) => core.listLineItems(m[1] as string, p),
    },
    {
      method: "POST",
      pattern: /^\/v1\/checkout\/sessions\/([^/]+)\/expire$/,
      handler: (m, p, ctx) => core.expand(core.expireSession(m[1] as string, ctx), readExpand(p)),
    },
    {
      method: "GET",
      pattern: /^\/v1\/payment_intents\/([^/]+)$/,
      handler: (m, p) => core.getPaymentIntent(m[1] as string, readExpand(p)),
    },
    {
      method: "GET",
      pattern: /^\/v1\/charges\/([^/]+)$/,
      handler: (m, p) => core.getCharge(m[1] as string, readExpand(p)),
    },
    {
      method: "POST",
      pattern: /^\/v1\/refunds$/,
      handler: (_m, p, ctx) => core.expand(core.createRefund(p, ctx), readExpand(p)),
    },
    { method: "GET", pattern: /^\/v1\/refunds$/, handler: (_m, p) => core.listRefunds(p) },
    {
      method: "GET",
      pattern: /^\/v1\/refunds\/([^/]+)$/,
      handler: (m, p) => core.getRefund(m[1] as string, readExpand(p)),
    },
    { method: "GET", pattern: /^\/v1\/events$/, handler: (_m, p) => core.listEvents(p) },
    {
      method: "GET",
      pattern: /^\/v1\/events\/([^/]+)$/,
      handler: (m) => core.findEvent(m[1] as string).event,
    },
  ];

  async function handleApi(req: IncomingMessage, res: ServerResponse, url: URL): Promise<void> {
    const requestId = newId("req", 14);
    const stripeVersion =
      typeof req.headers["stripe-version"] === "string" ? req.headers["stripe-version"] : API_VERSION;
    const idempotencyKey =
      typeof req.headers["idempotency-key"] === "string" ? req.headers["idempotency-key"] : null;
    const headers: Record<string, string> = { "Request-Id": requestId, "Stripe-Version": stripeVersion };
    if (idempotencyKey) headers["Idempotency-Key"] = idempotencyKey;
    const reply = (status: number, body: unknown, extra: Record<string, string> = {}) =>
      sendJson(res, status, body, { ...headers, ...extra });
    try {
      const apiKey = authenticate(req, options.apiKey);
      const method =
        req.method === "POST" ? "POST" : req.method === "GET" || req.method === "HEAD" ? "GET" : null;
      const candidates = api.filter((r) => r.pattern.test(url.pathname));
      const route = candidates.find((r) => r.method === method);
      if (!route) {
        throw new StripeApiError(
          404,
          "invalid_request_error",
          `Unrecognized request URL (${req.method}: ${url.pathname}). The local Stripe fake implements only the endpoints listed in fakes/README.md.`,
        );
      }
      const params =
        method === "POST" ? parseStripeForm(await readBody(req)) : parseStripeForm(url.search.slice(1));
      const match = route.pattern.exec(url.pathname) ?? [];
      const ctx: RequestContext = { requestId, idempotencyKey };

      if (method === "POST" && idempotencyKey) {
        const recordKey = `${apiKey}|${idempotencyKey}`;
        const endpoint = `POST ${url.pathname}`;
        const paramsHash = canonicalJson(params);
        const previous = core.state.idempotency[recordKey];
        if (previous) {
          if (previous.endpoint !== endpoint) {
            throw new StripeApiError(
              400,
              "idempotency_error",
              `Keys for idempotent requests can only be used for the same endpoint they were first used for ('${previous.endpoint}' vs '${endpoint}'). Try using a key other than '${idempotencyKey}' if you meant to execute a different request.`,
            );
          }
          if (previous.paramsHash !== paramsHash) {
            throw new StripeApiError(
              400,
              "idempotency_error",
              `Keys for idempotent requests can only be used with the same parameters they were first used with. Try using a key other than '${idempotencyKey}' if you meant to execute a different request.`,
            );
          }
          reply(previous.status, previous.body, { "Idempotent-Replayed": "true" });
          return;
        }
        const body = route.handler(match, params, ctx);
        // Like Stripe, only requests that executed are saved; failed validation is not.
        core.state.idempotency[recordKey] = {
          endpoint,
          paramsHash,
          status: 200,
          body,
          createdAt: Date.now(),
        };
        persist();
        reply(200, body);
        return;
      }
      reply(200, route.handler(match, params, ctx));
    } catch (err) {
      if (err instanceof StripeApiError) {
        reply(
          err.status,
          err.toBody(),
          err.status === 401 ? { "WWW-Authenticate": 'Basic realm="Stripe"' } : {},
        );
      } else if (err instanceof FormEncodingError) {
        reply(400, { error: { type: "invalid_request_error", message: err.message } });
      } else if (err instanceof BodyTooLargeError) {
        reply(413, { error: { type: "invalid_request_error", message: err.message } });
      } else {
        log(
          `internal error on ${req.method} ${url.pathname}: ${err instanceof Error ? (err.stack ?? err.message) : String(err)}`,
        );
        reply(500, {
          error: { type: "api_error", message: "The local Stripe fake hit an internal error; see its log." },
        });
      }
    }
  }

  async function handleCheckoutPage(req: IncomingMessage, res: ServerResponse, id: string): Promise<void> {
    if (!core.state.sessions[id]) {
      sendHtml(res, 404, renderNotFound(id));
      return;
    }
    const stored = core.storedSession(id);
    if (req.method !== "POST") {
      sendHtml(res, 200, renderCheckoutPage(stored));
      return;
    }
    const form = new URLSearchParams(await readBody(req, 64 * 1024));
    const number = form.get("cardNumber") ?? "";
    const expiry = form.get("expiry") ?? "";
    const email = form.get("email");
    const result = core.paySession(id, { number, expiry, cvc: form.get("cvc") ?? "" }, email);
    const values = { number, expiry, email: email ?? "" };
    switch (result.outcome) {
      case "succeeded":
        redirect(res, 303, result.redirectUrl);
        return;
      case "declined":
        sendHtml(
          res,
          402,
          renderCheckoutPage(stored, { error: { message: result.message, field: "number" }, values }),
        );
        return;
      case "invalid":
        sendHtml(
          res,
          400,
          renderCheckoutPage(stored, { error: { message: result.message, field: result.field }, values }),
        );
        return;
      case "unavailable":
        sendHtml(res, 409, renderCheckoutPage(stored));
        return;
    }
  }

  async function handleControl(req: IncomingMessage, res: ServerResponse, url: URL): Promise<void> {
    const path = url.pathname;
    const isPost = req.method === "POST";
    try {
      if (path === "/_fake/health") return sendJson(res, 200, { ok: true });
      if (path === "/_fake/events" && !isPost) {
        const type = url.searchParams.get("type");
        const data = core.state.events
          .filter((e) => type === null || e.event.type === type)
          .map((e) => ({ id: e.event.id, type: e.event.type, event: e.event, deliveries: e.deliveries }));
        return sendJson(res, 200, { data, pendingDeliveries: dispatcher.pending });
      }
      const resend = /^\/_fake\/events\/([^/]+)\/resend$/.exec(path);
      if (resend && isPost) {
        const stored = core.findEvent(resend[1] as string);
        const started = dispatcher.dispatch(stored, "resend");
        if (!started)
          return sendJson(res, 409, {
            error: "No webhook URL is configured; POST /_fake/config { webhookUrl } first.",
          });
        return sendJson(res, 202, { id: stored.event.id, resent: true });
      }
      const pay = /^\/_fake\/checkout\/([^/]+)\/pay$/.exec(path);
      if (pay && isPost) {
        const body = await readJson(req);
        const card = typeof body["card"] === "string" ? body["card"] : "";
        const expiry = typeof body["expiry"] === "string" ? body["expiry"] : "12/34";
        const cvc = typeof body["cvc"] === "string" ? body["cvc"] : "123";
        const email = typeof body["email"] === "string" ? body["email"] : null;
        const result = core.paySession(pay[1] as string, { number: card, expiry, cvc }, email);
        const status = { succeeded: 200, declined: 402, invalid: 400, unavailable: 409 }[result.outcome];
        return sendJson(res, status, result);
      }
      if (path === "/_fake/reset" && isPost) {
        core.reset();
        return sendJson(res, 200, { reset: true });
      }
      if (path === "/_fake/config") {
        if (isPost) applyConfigPatch(config, await readJson(req));
        return sendJson(res, 200, config);
      }
      if (path === "/_fake/flush" && isPost) {
        const idle = await dispatcher.idle(Number(url.searchParams.get("timeoutMs") ?? 30_000));
        return sendJson(res, idle ? 200 : 504, { idle, pendingDeliveries: dispatcher.pending });
      }
      sendJson(res, 404, { error: `Unknown control endpoint ${req.method} ${path}` });
    } catch (err) {
      if (err instanceof StripeApiError) return sendJson(res, err.status, err.toBody());
      sendJson(res, 400, { error: err instanceof Error ? err.message : String(err) });
    }
  }

  const server = createServer((req, res) => {
    const url = new URL(req.url ?? "/", "http://localhost");
    const done = (p: Promise<void>) =>
      p.catch((err: unknown) => {
        log(`unhandled error: ${String(err)}`);
        if (!res.headersSent)
          sendJson(res, 500, { error: { type: "api_error", message: "Internal fake error" } });
      });
    if (url.pathname.startsWith("/v1/")) return void done(handleApi(req, res, url));
    if (url.pathname.startsWith("/_fake/")) return void done(handleControl(req, res, url));
    const page = /^\/pay\/([^/]+)$/.exec(url.pathname);
    if (page) return void done(handleCheckoutPage(req, res, decodeURIComponent(page[1] as string)));
    if (url.pathname === "/") {
      return sendJson(res, 200, {
        name: "yokeline local Stripe fake",
        apiVersion: API_VERSION,
        docs: "fakes/README.md",
        webhookUrl: config.webhookUrl,
      });
    }
    sendJson(res, 404, {
      error: {
        type: "invalid_request_error",
        message: `Unrecognized request URL (${req.method}: ${url.pathname}).`,
      },
    });
  });
  // The SDK keeps sockets alive; headers timeouts stay default.
  const host = options.host ?? LOCALHOST;
  const port = await listen(server, options.port ?? 0, host);
  const url = `http://${host}:${port}`;
  publicUrl = (options.publicUrl ?? url).replace(/\/+$/, "");

  return {
    url,
    port,
    core,
    config,
    idle: (timeoutMs) => dispatcher.idle(timeoutMs),
    async close() {
      dispatcher.cancelAll();
      await closeServer(server);
      persistence.flush(core.state);
    },
  };
}

function envBool(name: string, fallback: boolean): boolean {
  const raw = process.env[name];
  if (raw === undefined || raw === "") return fallback;
  return !["0", "false", "no", "off"].includes(raw.toLowerCase());
}

function envNumber(name: string): number | undefined {
  const raw = process.env[name];
  if (raw === undefined || raw === "") return undefined;
  const n = Number(raw);
  if (!Number.isFinite(n) || n < 0) throw new Error(`${name} must be a non-negative number`);
  return n;
}

/** Options from the environment, shared by this script and fakes/run-all.ts. */
export function stripeFakeOptionsFromEnv(env = process.env): StripeFakeOptions {
  return {
    port: envPort("STRIPE_FAKE_PORT", DEFAULT_STRIPE_FAKE_PORT),
    publicUrl: env["STRIPE_FAKE_PUBLIC_URL"] || undefined,
    webhookUrl: env["STRIPE_FAKE_WEBHOOK_URL"] || null,
    webhookSecret: env["STRIPE_WEBHOOK_SECRET"] || DEFAULT_WEBHOOK_SECRET,
    duplicateDelivery: envBool("STRIPE_FAKE_DUPLICATE_DELIVERY", true),
    duplicateDelayMs: envNumber("STRIPE_FAKE_DUPLICATE_DELAY_MS"),
    apiKey: env["STRIPE_FAKE_API_KEY"] || undefined,
    stateFile: env["STRIPE_FAKE_STATE_FILE"] || null,
  };
}

runAsScript(
  import.meta.url,
  "stripe-fake",
  () => startStripeFake(stripeFakeOptionsFromEnv()),
  (fake) => `listening on ${fake.url} (webhooks → ${fake.config.webhookUrl ?? "none configured"})`,
);
