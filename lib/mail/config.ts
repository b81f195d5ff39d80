import "server-only";
import { ResendTransport } from "./resend-transport";
import { SmtpTransport } from "./smtp-transport";
import type { MailTransport } from "./transport";

const DEFAULT_SMTP_URL = "smtp://127.0.0.1:12525";

const cache = new Map<string, MailTransport>();

/**
 * The mail port as configured: Resend when RESEND_API_KEY is set (honouring RESEND_BASE_URL),
 * otherwise SMTP on SMTP_URL (default: the local catcher). Read on every call, built once per setting.
 */
export function getMailTransport(): MailTransport {
  const apiKey = process.env.RESEND_API_KEY;
  const key = apiKey
    ? `resend|${apiKey}|${process.env.RESEND_BASE_URL ?? ""}`
    : `smtp|${process.env.SMTP_URL ?? DEFAULT_SMTP_URL}`;
  let transport = cache.get(key);
  if (!transport) {
    transport = apiKey
      ? new ResendTransport(apiKey, process.env.RESEND_BASE_URL)
      : new SmtpTransport(process.env.SMTP_URL ?? DEFAULT_SMTP_URL);
    cache.set(key, transport);
  }
  return transport;
}

/** The From address: MAIL_FROM, or the shop's name and e-mail. */
export function mailFrom(shop: { name: string; email: string }): string {
  const configured = process.env.MAIL_FROM?.trim();
  if (configured) return configured;
  const name = shop.name.replace(/["\\\r\n<>]/g, "").trim() || "Yokeline";
  const address = /^[^\s@<>]+@[^\s@<>]+\.[^\s@<>]+$/.test(shop.email)
    ? shop.email
    : "no-reply@yokeline.example";
  return `"${name}" <${address}>`;
}
