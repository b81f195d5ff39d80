import { createHash } from "node:crypto";
import type { IncomingMessage } from "node:http";
import type { MailStore, StoredMessage } from "./store";
import { parseAddressList } from "./mime";

/** An error in Resend's shape: `{ statusCode, name, message }`. */
export class ResendError extends Error {
  constructor(
    readonly statusCode: number,
    readonly name: string,
    message: string,
  ) {
    super(message);
  }

  toBody(): { statusCode: number; name: string; message: string } {
    return { statusCode: this.statusCode, name: this.name, message: this.message };
  }
}

const ADDRESS_FORMAT =
  "The email address needs to follow the `email@example.com` or `Name <email@example.com>` format.";
const EMAIL_RE = /^[^\s@<>]+@[^\s@<>]+\.[^\s@<>]+$/;

export function authenticateResend(req: IncomingMessage): void {
  const header = req.headers.authorization ?? "";
  const match = /^Bearer\s+(\S+)$/i.exec(header);
  if (!match) {
    throw new ResendError(
      401,
      "missing_api_key",
      "Missing API key in the authorization header. Include the following header in the request: Authorization: Bearer YOUR_API_KEY",
    );
  }
  if (!/^re_[A-Za-z0-9_-]+$/.test(match[1] ?? ""))
    throw new ResendError(403, "invalid_api_key", "API key is invalid");
}

function validAddress(value: string): boolean {
  const angle = /^(?:"?[^"<>]*"?\s*)?<([^<>]+)>$/.exec(value.trim());
  return EMAIL_RE.test(angle ? (angle[1] ?? "") : value.trim());
}

function addressField(body: Record<string, unknown>, field: string, required: boolean, max = 50): string[] {
  const raw = body[field];
  if (raw === undefined || raw === null || raw === "" || (Array.isArray(raw) && raw.length === 0)) {
    if (required) throw new ResendError(422, "missing_required_field", `Missing \`${field}\` field.`);
    return [];
  }
  const list = Array.isArray(raw) ? raw : [raw];
  if (!list.every((v): v is string => typeof v === "string" && validAddress(v))) {
    throw new ResendError(422, "validation_error", `Invalid \`${field}\` field. ${ADDRESS_FORMAT}`);
  }
  if (list.length > max)
    throw new ResendError(422, "validation_error", `Too many recipients in \`${field}\`: at most ${max}.`);
  return list.flatMap((v) => parseAddressList(v));
}

type NewMessage = Omit<StoredMessage, "id" | "receivedAt">;

/** Validates one `POST /emails` payload the way Resend does and maps it to a stored message. */
export function toMessage(body: unknown): NewMessage {
  if (!body || typeof body !== "object" || Array.isArray(body)) {
    throw new ResendError(422, "validation_error", "The request body must be a JSON object.");
  }
  const b = body as Record<string, unknown>;
  const fromRaw = b["from"];
  if (fromRaw === undefined || fromRaw === null || fromRaw === "") {
    throw new ResendError(422, "missing_required_field", "Missing `from` field.");
  }
  if (typeof fromRaw !== "string" || !validAddress(fromRaw)) {
    throw new ResendError(422, "validation_error", `Invalid \`from\` field. ${ADDRESS_FORMAT}`);
  }
  const to = addressField(b, "to", true);
  const subject = b["subject"];
  const template = b["template"];
  if ((typeof subject !== "string" || subject === "") && !template) {
    throw new ResendError(422, "missing_required_field", "Missing `subject` field.");
  }
  const html = typeof b["html"] === "string" ? b["html"] : null;
  const text = typeof b["text"] === "string" ? b["text"] : null;
  if (html === null && text === null && !template) {
    throw new ResendError(422, "validation_error", "Missing `html` or `text` field.");
  }
  const headers: Record<string, string> = {};
  const rawHeaders = b["headers"];
  if (rawHeaders && typeof rawHeaders === "object") {
    for (const [k, v] of Object.entries(rawHeaders)) if (typeof v === "string") headers[k.toLowerCase()] = v;
  }
  headers["from"] = fromRaw;
  headers["to"] = to.join(", ");
  if (typeof subject === "string") headers["subject"] = subject;
  const tags = Array.isArray(b["tags"])
    ? (b["tags"] as unknown[]).filter(
        (t): t is { name: string; value: string } =>
          !!t &&
          typeof t === "object" &&
          typeof (t as { name?: unknown }).name === "string" &&
          typeof (t as { value?: unknown }).value === "string",
      )
    : [];
  const attachments = Array.isArray(b["attachments"])
    ? (b["attachments"] as unknown[]).map((a) => {
        const att = (a ?? {}) as Record<string, unknown>;
        const content = typeof att["content"] === "string" ? att["content"] : "";
        return {
          filename: typeof att["filename"] === "string" ? att["filename"] : null,
          contentType:
            typeof att["content_type"] === "string" ? att["content_type"] : "application/octet-stream",
          size: Buffer.from(content, "base64").length,
          contentId: typeof att["content_id"] === "string" ? att["content_id"] : null,
        };
      })
    : [];
  return {
    via: "resend",
    from: parseAddressList(fromRaw)[0] ?? null,
    to,
    cc: addressField(b, "cc", false),
    bcc: addressField(b, "bcc", false),
    replyTo: addressField(b, "reply_to", false),
    subject: typeof subject === "string" ? subject : null,
    text,
    html,
    headers,
    envelope: null,
    attachments,
    tags,
    scheduledAt: typeof b["scheduled_at"] === "string" ? b["scheduled_at"] : null,
  };
}

export function injectedFailure(statusCode: number): ResendError {
  if (statusCode === 429) {
    return new ResendError(
      429,
      "rate_limit_exceeded",
      "Too many requests. Failure injected by the local mail fake.",
    );
  }
  return new ResendError(
    statusCode,
    statusCode >= 500 ? "internal_server_error" : "application_error",
    "Failure injected by the local mail fake (fail-next).",
  );
}

interface IdempotencyEntry {
  hash: string;
  response: unknown;
}

/** Resend's idempotency: same key + same payload → same response; other payload → 409. */
export class ResendIdempotency {
  private readonly entries = new Map<string, IdempotencyEntry>();

  run(key: string | null, payload: unknown, execute: () => unknown): unknown {
    if (!key) return execute();
    if (key.length > 256)
      throw new ResendError(422, "validation_error", "The `Idempotency-Key` must be at most 256 characters.");
    const hash = createHash("sha256").update(JSON.stringify(payload)).digest("hex");
    const existing = this.entries.get(key);
    if (existing) {
      if (existing.hash !== hash) {
        throw new ResendError(
          409,
          "invalid_idempotent_request",
          "Same idempotency key used with a different request payload.",
        );
      }
      return existing.response;
    }
    const response = execute();
    this.entries.set(key, { hash, response });
    return response;
  }

  clear(): void {
    this.entries.clear();
  }
}

export function resendEmailObject(message: StoredMessage): Record<string, unknown> {
  return {
    object: "email",
    id: message.id,
    from: message.headers["from"] ?? message.from,
    to: message.to,
    cc: message.cc,
    bcc: message.bcc,
    reply_to: message.replyTo,
    subject: message.subject,
    html: message.html,
    text: message.text,
    created_at: message.receivedAt,
    scheduled_at: message.scheduledAt,
    last_event: message.scheduledAt ? "scheduled" : "delivered",
    tags: message.tags,
  };
}

export function sendWith(store: MailStore, message: NewMessage): { id: string } {
  return { id: store.add(message).id };
}
