import { randomUUID } from "node:crypto";
import type { ParsedAttachment } from "./mime";

export type MailVia = "smtp" | "resend";

export interface StoredMessage {
  id: string;
  via: MailVia;
  receivedAt: string;
  /** Bare addresses (`a@b.test`); the display forms are in `headers`. */
  from: string | null;
  to: string[];
  cc: string[];
  bcc: string[];
  replyTo: string[];
  subject: string | null;
  text: string | null;
  html: string | null;
  headers: Record<string, string>;
  /** SMTP envelope (MAIL FROM / RCPT TO), which includes Bcc recipients. */
  envelope: { from: string | null; to: string[] } | null;
  attachments: ParsedAttachment[];
  tags: Array<{ name: string; value: string }>;
  scheduledAt: string | null;
}

export interface MessageQuery {
  to?: string | null;
  subject?: string | null;
  via?: MailVia | null;
  limit?: number | null;
}

interface FailRule {
  remaining: number;
  via: MailVia | null;
  statusCode: number;
}

export function matchesQuery(message: StoredMessage, query: MessageQuery): boolean {
  if (query.via && message.via !== query.via) return false;
  if (query.to) {
    const wanted = query.to.toLowerCase();
    const all = [...message.to, ...message.cc, ...message.bcc, ...(message.envelope?.to ?? [])].map((a) =>
      a.toLowerCase(),
    );
    if (!all.includes(wanted)) return false;
  }
  if (query.subject && !(message.subject ?? "").toLowerCase().includes(query.subject.toLowerCase()))
    return false;
  return true;
}

/** One in-memory mailbox shared by the SMTP catcher and the Resend fake. */
export class MailStore {
  private messages: StoredMessage[] = [];
  private readonly raw = new Map<string, string>();
  private failRule: FailRule | null = null;
  private readonly waiters = new Set<() => void>();

  add(message: Omit<StoredMessage, "id" | "receivedAt">, raw?: string): StoredMessage {
    const stored: StoredMessage = { id: randomUUID(), receivedAt: new Date().toISOString(), ...message };
    this.messages.push(stored);
    if (raw !== undefined) this.raw.set(stored.id, raw);
    for (const wake of this.waiters) wake();
    return stored;
  }

  /** Newest first. */
  list(query: MessageQuery = {}): StoredMessage[] {
    const found = this.messages.filter((m) => matchesQuery(m, query)).reverse();
    return query.limit ? found.slice(0, query.limit) : found;
  }

  get(id: string): StoredMessage | undefined {
    return this.messages.find((m) => m.id === id);
  }

  getRaw(id: string): string | undefined {
    return this.raw.get(id);
  }

  clear(): void {
    this.messages = [];
    this.raw.clear();
  }

  /** Resolves with the matching messages once at least one exists, or [] after timeoutMs. */
  async waitFor(query: MessageQuery, timeoutMs: number): Promise<StoredMessage[]> {
    const deadline = Date.now() + timeoutMs;
    for (;;) {
      const found = this.list(query);
      const left = deadline - Date.now();
      if (found.length > 0 || left <= 0) return found;
      await new Promise<void>((resolve) => {
        const wake = () => {
          clearTimeout(timer);
          this.waiters.delete(wake);
          resolve();
        };
        const timer = setTimeout(wake, left);
        this.waiters.add(wake);
      });
    }
  }

  failNext(count: number, via: MailVia | null = null, statusCode = 500): void {
    this.failRule = count > 0 ? { remaining: count, via, statusCode } : null;
  }

  get failState(): { remaining: number; via: MailVia | null; statusCode: number } | null {
    return this.failRule ? { ...this.failRule } : null;
  }

  /** Consumes one injected failure for this channel, if any is armed. */
  takeFailure(via: MailVia): { statusCode: number } | null {
    const rule = this.failRule;
    if (!rule || (rule.via !== null && rule.via !== via)) return null;
    rule.remaining--;
    if (rule.remaining <= 0) this.failRule = null;
    return { statusCode: rule.statusCode };
  }
}
