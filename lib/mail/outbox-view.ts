import "server-only";
import { isUuid } from "@/lib/http/known-errors";
import { EmailMessage } from "@/entities";
import { getEm } from "@/lib/db/orm";
import type { EmailStatus } from "./states";

export interface OutboxRow {
  id: string;
  createdAt: string;
  to: string;
  subject: string;
  template: string;
  status: EmailStatus;
  attempts: number;
  lastError: string | null;
  provider: string | null;
  sentAt: string | null;
}

export interface OutboxMessage extends OutboxRow {
  html: string;
  text: string;
  orderId: string | null;
}

function toRow(m: Omit<EmailMessage, "html" | "text">): OutboxRow {
  return {
    id: m.id,
    createdAt: m.createdAt.toISOString(),
    to: m.to,
    subject: m.subject,
    template: m.template,
    status: m.status,
    attempts: m.attempts,
    lastError: m.lastError ?? null,
    provider: m.provider ?? null,
    sentAt: m.sentAt ? m.sentAt.toISOString() : null,
  };
}

/** The newest outbox rows first, as plain objects for the owner's sent-mail page. */
export async function listOutbox(limit = 200): Promise<OutboxRow[]> {
  const em = await getEm();
  const rows = await em.find(
    EmailMessage,
    {},
    { orderBy: { createdAt: "desc" }, limit, exclude: ["html", "text"] },
  );
  return rows.map(toRow);
}

/** One outbox message with its HTML and text, or null. */
export async function getOutboxMessage(id: string): Promise<OutboxMessage | null> {
  if (!isUuid(id)) return null;
  const em = await getEm();
  const m = await em.findOne(EmailMessage, { id });
  return m ? { ...toRow(m), html: m.html, text: m.text, orderId: m.orderId ?? null } : null;
}
