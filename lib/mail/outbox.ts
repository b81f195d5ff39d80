import "server-only";
import type { EntityManager } from "@mikro-orm/postgresql";
import { EmailMessage, Shop } from "@/entities";
import type { EmailShop } from "@/emails/components/email-layout";
import { freshEm } from "@/lib/db/orm";
import { getBoss, JOBS, mailRetryOptions, type MailDeliverJob } from "@/lib/jobs/boss";
import { logger } from "@/lib/logger";
import { getMailTransport, mailFrom } from "./config";
import { renderEmail, type TemplateName, type TemplateProps } from "./templates";

const FALLBACK_SHOP: EmailShop = { name: "Yokeline shop", addressLines: "", phone: "", email: "" };

async function shopFor(em: EntityManager): Promise<EmailShop> {
  const shop = await em.findOne(Shop, { id: 1 });
  return shop
    ? { name: shop.name, addressLines: shop.addressLines, phone: shop.phone, email: shop.email }
    : FALLBACK_SHOP;
}

export interface QueueEmailInput<N extends TemplateName> {
  template: N;
  /** One address, e.g. the order's customer e-mail. */
  to: string;
  props: TemplateProps[N];
  orderId?: string | null;
}

/**
 * Renders `template` and adds an outbox row (status "queued") to the CALLER's entity manager:
 * it is written when the caller's transaction flushes and commits, together with the change that
 * caused it, and rolled back with it. Nothing is sent here — after the commit call
 * `enqueueDelivery([row.id])` or `flushQueuedEmails()`; the mail.sweep job catches anything missed.
 */
export async function queueEmail<N extends TemplateName>(
  em: EntityManager,
  input: QueueEmailInput<N>,
): Promise<EmailMessage> {
  const rendered = await renderEmail(input.template, input.props, await shopFor(em));
  const message = em.create(EmailMessage, {
    template: input.template,
    to: input.to.trim(),
    subject: rendered.subject,
    html: rendered.html,
    text: rendered.text,
    orderId: input.orderId ?? null,
    status: "queued",
    attempts: 0,
    createdAt: new Date(),
  });
  em.persist(message);
  return message;
}

/**
 * Hands committed outbox rows to the delivery job. The job id is the message id, so a message is
 * never in the queue twice. Never throws: if the queue is unreachable the sweep picks them up.
 * Returns how many jobs were newly created.
 */
export async function enqueueDelivery(messageIds: readonly string[]): Promise<number> {
  if (messageIds.length === 0) return 0;
  try {
    const boss = await getBoss();
    const retry = mailRetryOptions();
    let created = 0;
    for (const messageId of messageIds) {
      const data: MailDeliverJob = { messageId };
      if (await boss.send(JOBS.mailDeliver, data, { id: messageId, ...retry })) created += 1;
    }
    return created;
  } catch (err) {
    logger.warn({ err, messageIds }, "could not enqueue e-mail delivery; the sweep will retry");
    return 0;
  }
}

/**
 * After a transaction that queued e-mails commits: enqueues delivery of every row still queued
 * (optionally only those older than `olderThanSeconds`, as the sweep does). Never throws.
 */
export async function flushQueuedEmails(
  options: { olderThanSeconds?: number; limit?: number } = {},
): Promise<number> {
  try {
    const em = await freshEm();
    const before = options.olderThanSeconds
      ? new Date(Date.now() - options.olderThanSeconds * 1000)
      : undefined;
    const rows = await em.find(
      EmailMessage,
      before ? { status: "queued", createdAt: { $lt: before } } : { status: "queued" },
      { fields: ["id"], orderBy: { createdAt: "asc" }, limit: options.limit ?? 500 },
    );
    return await enqueueDelivery(rows.map((r) => r.id));
  } catch (err) {
    logger.warn({ err }, "could not look for queued e-mails");
    return 0;
  }
}

export type DeliveryOutcome = "sent" | "skipped" | "missing";

/**
 * The mail.deliver handler: sends one outbox row through the mail port and records the outcome.
 * On failure it records the error and attempt and rethrows (so pg-boss retries); on the final
 * attempt it marks the row "failed", which stays visible in the outbox. The order is never touched.
 */
export async function deliverEmail(
  messageId: string,
  { finalAttempt }: { finalAttempt: boolean },
): Promise<DeliveryOutcome> {
  const em = await freshEm();
  const message = await em.findOne(EmailMessage, { id: messageId });
  if (!message) {
    logger.warn({ messageId }, "e-mail to deliver no longer exists");
    return "missing";
  }
  if (message.status !== "queued") return "skipped";
  const transport = getMailTransport();
  try {
    const sent = await transport.send({
      from: mailFrom(await shopFor(em)),
      to: message.to,
      subject: message.subject,
      html: message.html,
      text: message.text,
      idempotencyKey: `yokeline-email-${message.id}`,
    });
    message.status = "sent";
    message.provider = sent.provider;
    message.providerMessageId = sent.id || null;
    message.sentAt = new Date();
    message.attempts += 1;
    message.lastError = null;
    await em.flush();
    return "sent";
  } catch (error) {
    const text = error instanceof Error ? error.message : String(error);
    message.attempts += 1;
    message.provider = transport.provider;
    message.lastError = text.slice(0, 2000);
    if (finalAttempt) message.status = "failed";
    await em.flush();
    logger.warn(
      { messageId, attempts: message.attempts, final: finalAttempt, err: error },
      "e-mail delivery failed",
    );
    throw error;
  }
}
