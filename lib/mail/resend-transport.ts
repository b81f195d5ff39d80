import "server-only";
import { Resend } from "resend";
import { MailSendError, type MailTransport, type OutgoingMail, type SentMail } from "./transport";

/**
 * Sends through the Resend API. The SDK reads RESEND_BASE_URL, so development and tests talk to
 * the local Resend fake; the base URL is also passed explicitly for clarity.
 */
export class ResendTransport implements MailTransport {
  readonly provider = "resend";
  private readonly client: Resend;

  constructor(apiKey: string, baseUrl?: string) {
    this.client = new Resend(apiKey, baseUrl ? { baseUrl: baseUrl.replace(/\/+$/, "") } : undefined);
  }

  async send(msg: OutgoingMail): Promise<SentMail> {
    const { data, error } = await this.client.emails.send(
      { from: msg.from, to: msg.to, subject: msg.subject, html: msg.html, text: msg.text },
      msg.idempotencyKey ? { idempotencyKey: msg.idempotencyKey } : undefined,
    );
    if (error || !data) {
      const status = error && "statusCode" in error && error.statusCode ? ` (${error.statusCode})` : "";
      throw new MailSendError(
        `Resend refused the message${status}: ${error?.message ?? "no id in the answer"}`,
        this.provider,
      );
    }
    return { provider: this.provider, id: data.id };
  }
}
