import "server-only";
/** One e-mail, rendered and addressed, as the port hands it to a provider. */
export interface OutgoingMail {
  from: string;
  to: string;
  subject: string;
  html: string;
  text: string;
  /** The same key for every attempt at the same message, so a provider that honours it never sends twice. */
  idempotencyKey?: string;
}

export interface SentMail {
  /** "resend" or "smtp". */
  provider: string;
  /** The provider's id for the message (Resend's id, or the SMTP Message-ID). */
  id: string;
}

/** The one port to the outside mail service; the adapters behind it are picked by configuration. */
export interface MailTransport {
  readonly provider: string;
  send(msg: OutgoingMail): Promise<SentMail>;
}

/** A send the provider refused or that never reached it; the outbox records the message and retries. */
export class MailSendError extends Error {
  constructor(
    message: string,
    readonly provider: string,
  ) {
    super(message);
    this.name = "MailSendError";
  }
}
