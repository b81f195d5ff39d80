/**
 * An outbox e-mail's states, outside the entity file so that views and screens name them without
 * the ORM; entities/email-message.entity.ts uses these for its column (database enum email_status).
 */
export const EMAIL_STATUSES = ["queued", "sent", "failed"] as const;
/** Waiting to be sent (or retried), sent, or given up on after its attempts. */
export type EmailStatus = (typeof EMAIL_STATUSES)[number];
