import { SMTPServer } from "smtp-server";
import { listen, LOCALHOST } from "../shared/http";
import { parseMime } from "./mime";
import type { MailStore } from "./store";

export interface SmtpCatcher {
  port: number;
  close(): Promise<void>;
}

/** Accepts any sender, recipient and credentials, and keeps every message. */
export async function startSmtpCatcher(
  store: MailStore,
  port: number,
  log: (line: string) => void,
): Promise<SmtpCatcher> {
  const server = new SMTPServer({
    name: "mail-fake.localhost",
    banner: "Yokeline local SMTP catcher (development fake)",
    authOptional: true,
    allowInsecureAuth: true,
    disabledCommands: ["STARTTLS"],
    logger: false,
    size: 25 * 1024 * 1024,
    onAuth(auth, _session, callback) {
      callback(null, { user: auth.username ?? "anonymous" });
    },
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on("data", (chunk: Buffer) => chunks.push(chunk));
      stream.on("error", (err) => callback(err));
      stream.on("end", () => {
        if (stream.sizeExceeded) {
          callback(
            Object.assign(new Error("Message exceeds the fixed maximum message size"), { responseCode: 552 }),
          );
          return;
        }
        if (store.takeFailure("smtp")) {
          log("smtp: failing a message on purpose (fail-next)");
          callback(
            Object.assign(new Error("4.3.0 Temporary failure injected by the mail fake"), {
              responseCode: 451,
            }),
          );
          return;
        }
        const raw = Buffer.concat(chunks);
        try {
          const parsed = parseMime(raw);
          const envelopeFrom = session.envelope.mailFrom ? session.envelope.mailFrom.address : null;
          const envelopeTo = session.envelope.rcptTo.map((r) => r.address);
          const headerRecipients = new Set([...parsed.to, ...parsed.cc].map((a) => a.toLowerCase()));
          const message = store.add(
            {
              via: "smtp",
              from: parsed.from ?? envelopeFrom,
              to: parsed.to.length > 0 ? parsed.to : envelopeTo,
              cc: parsed.cc,
              // Envelope recipients absent from To/Cc were Bcc'd.
              bcc: envelopeTo.filter((a) => !headerRecipients.has(a.toLowerCase())),
              replyTo: parsed.replyTo,
              subject: parsed.subject,
              text: parsed.text,
              html: parsed.html,
              headers: parsed.headers,
              envelope: { from: envelopeFrom, to: envelopeTo },
              attachments: parsed.attachments,
              tags: [],
              scheduledAt: null,
            },
            raw.toString("utf8"),
          );
          log(`smtp: ${message.subject ?? "(no subject)"} → ${envelopeTo.join(", ")}`);
          callback(null, `Queued as ${message.id}`);
        } catch (err) {
          callback(
            Object.assign(new Error(`Could not parse message: ${String(err)}`), { responseCode: 554 }),
          );
        }
      });
    },
  });
  server.on("error", (err) => log(`smtp error: ${err.message}`));
  const bound = await listen(server.server, port, LOCALHOST);
  return {
    port: bound,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
