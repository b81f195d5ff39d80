import { createHmac } from "node:crypto";
import type { DeliveryKind, StoredEvent } from "./types";

export interface WebhookConfig {
  webhookUrl: string | null;
  webhookSecret: string;
  /** Deliver every event a second time (same id) to exercise exactly-once handling. */
  duplicateDelivery: boolean;
  duplicateDelayMs: number;
  /** Waits before each retry; attempts = retryDelaysMs.length + 1. */
  retryDelaysMs: number[];
  deliveryTimeoutMs: number;
  /** Event types to deliver; "*" means all (like a webhook endpoint's enabled_events). */
  enabledEvents: string[];
}

/** Exactly Stripe's scheme: `t=<unix>,v1=<hex HMAC-SHA256 of "t.payload">`. */
export function signPayload(
  payload: string,
  secret: string,
  timestamp = Math.floor(Date.now() / 1000),
): string {
  const signature = createHmac("sha256", secret).update(`${timestamp}.${payload}`, "utf8").digest("hex");
  return `t=${timestamp},v1=${signature}`;
}

interface Sleeper {
  timer: NodeJS.Timeout;
  resolve: () => void;
}

export class WebhookDispatcher {
  private generation = 0;
  private abort = new AbortController();
  private readonly sleepers = new Set<Sleeper>();
  private readonly inflight = new Set<Promise<void>>();

  constructor(
    private readonly getConfig: () => WebhookConfig,
    private readonly onAttempt: () => void,
    private readonly log: (line: string) => void,
  ) {}

  /** Starts delivery of an event (plus its scheduled duplicate); returns immediately. */
  dispatch(stored: StoredEvent, kind: DeliveryKind = "initial"): boolean {
    const config = this.getConfig();
    if (!config.webhookUrl) return false;
    if (kind !== "resend" && !this.isEnabled(config, stored.event.type)) return false;
    this.track(this.deliverWithRetries(stored, kind, 0));
    if (kind === "initial" && config.duplicateDelivery) {
      this.track(this.deliverWithRetries(stored, "duplicate", config.duplicateDelayMs));
    }
    return true;
  }

  /** Resolves once no delivery is scheduled or in flight (or the timeout passes). */
  async idle(timeoutMs = 30_000): Promise<boolean> {
    const deadline = Date.now() + timeoutMs;
    while (this.inflight.size > 0) {
      if (Date.now() > deadline) return false;
      await Promise.race([
        Promise.allSettled([...this.inflight]),
        this.sleep(Math.max(0, deadline - Date.now())),
      ]);
    }
    return true;
  }

  get pending(): number {
    return this.inflight.size;
  }

  /** Drops every scheduled delivery and aborts the ones in flight. */
  cancelAll(): void {
    this.generation++;
    this.abort.abort();
    this.abort = new AbortController();
    for (const s of this.sleepers) {
      clearTimeout(s.timer);
      s.resolve();
    }
    this.sleepers.clear();
  }

  private isEnabled(config: WebhookConfig, type: string): boolean {
    return config.enabledEvents.some((pattern) => {
      if (pattern === "*") return true;
      if (pattern.endsWith(".*")) return type.startsWith(pattern.slice(0, -1));
      return pattern === type;
    });
  }

  private track(p: Promise<void>): void {
    this.inflight.add(p);
    void p.finally(() => this.inflight.delete(p));
  }

  private sleep(ms: number): Promise<void> {
    return new Promise((resolve) => {
      const sleeper: Sleeper = {
        timer: setTimeout(() => {
          this.sleepers.delete(sleeper);
          resolve();
        }, ms),
        resolve,
      };
      this.sleepers.add(sleeper);
    });
  }

  private async deliverWithRetries(
    stored: StoredEvent,
    kind: DeliveryKind,
    initialDelayMs: number,
  ): Promise<void> {
    const generation = this.generation;
    if (initialDelayMs > 0) await this.sleep(initialDelayMs);
    const { retryDelaysMs } = this.getConfig();
    for (let attempt = 1; attempt <= retryDelaysMs.length + 1; attempt++) {
      if (generation !== this.generation) return;
      const ok = await this.attempt(stored, kind, attempt);
      if (ok || generation !== this.generation) return;
      const wait = retryDelaysMs[attempt - 1];
      if (wait === undefined) break;
      await this.sleep(wait);
    }
    this.log(`webhook ${stored.event.id} (${stored.event.type}, ${kind}) gave up after retries`);
  }

  private async attempt(stored: StoredEvent, kind: DeliveryKind, attempt: number): Promise<boolean> {
    const config = this.getConfig();
    const url = config.webhookUrl;
    if (!url) return true;
    // Stripe sends the event pretty-printed; the signature covers these exact bytes.
    const payload = JSON.stringify(stored.event, null, 2);
    const started = Date.now();
    let httpStatus: number | null = null;
    let error: string | null = null;
    try {
      const res = await fetch(url, {
        method: "POST",
        headers: {
          "Content-Type": "application/json; charset=utf-8",
          "User-Agent": "Stripe/1.0 (+https://stripe.com/docs/webhooks)",
          "Stripe-Signature": signPayload(payload, config.webhookSecret),
        },
        body: payload,
        signal: AbortSignal.any([AbortSignal.timeout(config.deliveryTimeoutMs), this.abort.signal]),
      });
      httpStatus = res.status;
      await res.arrayBuffer().catch(() => undefined);
      if (!res.ok) error = `HTTP ${res.status}`;
    } catch (err) {
      error =
        err instanceof Error ? (err.cause instanceof Error ? err.cause.message : err.message) : String(err);
    }
    const ok = error === null;
    stored.deliveries.push({
      kind,
      attempt,
      url,
      startedAt: new Date(started).toISOString(),
      durationMs: Date.now() - started,
      status: ok ? "succeeded" : "failed",
      httpStatus,
      error,
    });
    this.onAttempt();
    if (!ok)
      this.log(`webhook ${stored.event.id} (${stored.event.type}, ${kind}#${attempt}) failed: ${error}`);
    return ok;
  }
}
