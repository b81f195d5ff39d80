/**
 * Local mail fakes: an SMTP catcher (for nodemailer) and a Resend API fake,
 * sharing one mailbox that tests read over HTTP. Development and tests only.
 */
import { createServer, type IncomingMessage, type ServerResponse } from "node:http";
import {
  BodyTooLargeError,
  closeServer,
  envPort,
  listen,
  LOCALHOST,
  readBody,
  sendHtml,
  sendJson,
  runAsScript,
} from "../shared/http";
import { renderInbox, renderMessage } from "./inbox-page";
import {
  authenticateResend,
  injectedFailure,
  ResendError,
  ResendIdempotency,
  resendEmailObject,
  toMessage,
} from "./resend-api";
import { startSmtpCatcher } from "./smtp-catcher";
import { MailStore, type MailVia, type MessageQuery } from "./store";

export interface MailFakeOptions {
  /** 0 picks a free port. */
  smtpPort?: number;
  httpPort?: number;
  log?: ((line: string) => void) | false;
}

export interface MailFake {
  smtpPort: number;
  httpPort: number;
  /** Base URL of the HTTP API (Resend fake + /messages). */
  httpUrl: string;
  store: MailStore;
  close(): Promise<void>;
}

export const DEFAULT_SMTP_PORT = 12525;
export const DEFAULT_HTTP_PORT = 12580;

function parseJson(body: string): unknown {
  try {
    return JSON.parse(body);
  } catch {
    throw new ResendError(400, "invalid_parameter", "The request body is not valid JSON.");
  }
}

function queryFrom(url: URL): MessageQuery {
  const via = url.searchParams.get("via");
  const limit = Number(url.searchParams.get("limit") ?? "");
  return {
    to: url.searchParams.get("to"),
    subject: url.searchParams.get("subject"),
    via: via === "smtp" || via === "resend" ? via : null,
    limit: Number.isInteger(limit) && limit > 0 ? limit : null,
  };
}

export async function startMailFake(options: MailFakeOptions = {}): Promise<MailFake> {
  const log =
    options.log === false
      ? () => {}
      : (options.log ?? ((line: string) => console.log(`[mail-fake] ${line}`)));
  const store = new MailStore();
  const idempotency = new ResendIdempotency();
  const smtp = await startSmtpCatcher(store, options.smtpPort ?? 0, log);

  async function handleResend(req: IncomingMessage, res: ServerResponse, url: URL): Promise<void> {
    authenticateResend(req);
    const path = url.pathname.replace(/\/+$/, "");
    const idempotencyKey =
      typeof req.headers["idempotency-key"] === "string" ? req.headers["idempotency-key"] : null;
    if (req.method === "POST" && (path === "/emails" || path === "/emails/batch")) {
      const payload = parseJson(await readBody(req));
      const response = idempotency.run(idempotencyKey, { path, payload }, () => {
        const failure = store.takeFailure("resend");
        if (failure) {
          log("resend: failing a request on purpose (fail-next)");
          throw injectedFailure(failure.statusCode);
        }
        if (path === "/emails") {
          const message = store.add(toMessage(payload));
          log(`resend: ${message.subject ?? "(no subject)"} → ${message.to.join(", ")}`);
          return { id: message.id };
        }
        if (!Array.isArray(payload))
          throw new ResendError(422, "validation_error", "The batch body must be an array of emails.");
        if (payload.length > 100)
          throw new ResendError(422, "validation_error", "A batch can contain at most 100 emails.");
        const messages = payload.map(toMessage); // validate all before storing any
        return { data: messages.map((m) => ({ id: store.add(m).id })) };
      });
      sendJson(res, 200, response);
      return;
    }
    const get = /^\/emails\/([^/]+)$/.exec(path);
    if (req.method === "GET" && get) {
      const message = store.get(get[1] as string);
      if (!message || message.via !== "resend") throw new ResendError(404, "not_found", "Email not found");
      sendJson(res, 200, resendEmailObject(message));
      return;
    }
    throw new ResendError(
      404,
      "not_found",
      `The local Resend fake does not implement ${req.method} ${path}.`,
    );
  }

  async function handle(req: IncomingMessage, res: ServerResponse): Promise<void> {
    const url = new URL(req.url ?? "/", "http://localhost");
    // Tolerate a trailing slash in RESEND_BASE_URL (the SDK concatenates `${baseUrl}${path}`).
    const path = url.pathname.replace(/^\/{2,}/, "/");
    try {
      if (path === "/emails" || path.startsWith("/emails/")) {
        url.pathname = path;
        return await handleResend(req, res, url);
      }
      if (path === "/messages" || path === "/messages/") {
        if (req.method === "DELETE") {
          store.clear();
          idempotency.clear();
          return sendJson(res, 200, { deleted: true });
        }
        const query = queryFrom(url);
        const waitMs = Math.min(Number(url.searchParams.get("wait") ?? 0) || 0, 30_000);
        const data = waitMs > 0 ? await store.waitFor(query, waitMs) : store.list(query);
        return sendJson(res, 200, { data, count: data.length });
      }
      const one = /^\/messages\/([^/]+)(\/raw|\/view)?$/.exec(path);
      if (one && req.method === "GET") {
        const message = store.get(one[1] as string);
        if (!message) return sendJson(res, 404, { error: "No such message" });
        if (one[2] === "/view") return sendHtml(res, 200, renderMessage(message));
        if (one[2] === "/raw") {
          const raw = store.getRaw(message.id);
          if (raw === undefined)
            return sendJson(res, 404, { error: "Only SMTP messages keep their raw source" });
          res.writeHead(200, { "Content-Type": "message/rfc822; charset=utf-8" });
          return void res.end(raw);
        }
        return sendJson(res, 200, message);
      }
      if (path === "/_fake/fail-next" && req.method === "POST") {
        const body = parseJson((await readBody(req)) || "{}") as Record<string, unknown>;
        const count =
          typeof body["count"] === "number" && Number.isInteger(body["count"]) ? body["count"] : 1;
        const via: MailVia | null = body["via"] === "smtp" || body["via"] === "resend" ? body["via"] : null;
        const statusCode = typeof body["statusCode"] === "number" ? body["statusCode"] : 500;
        store.failNext(count, via, statusCode);
        return sendJson(res, 200, { failNext: store.failState });
      }
      if (path === "/_fake/reset" && req.method === "POST") {
        store.clear();
        store.failNext(0);
        idempotency.clear();
        return sendJson(res, 200, { reset: true });
      }
      if (path === "/_fake/health") return sendJson(res, 200, { ok: true, smtpPort: smtp.port });
      if (path === "/" && req.method === "GET") return sendHtml(res, 200, renderInbox(store.list()));
      sendJson(res, 404, { error: `Unknown endpoint ${req.method} ${path}` });
    } catch (err) {
      if (err instanceof ResendError) return sendJson(res, err.statusCode, err.toBody());
      if (err instanceof BodyTooLargeError)
        return sendJson(res, 413, { statusCode: 413, name: "validation_error", message: err.message });
      log(`internal error: ${err instanceof Error ? (err.stack ?? err.message) : String(err)}`);
      sendJson(res, 500, {
        statusCode: 500,
        name: "internal_server_error",
        message: "The local mail fake hit an internal error.",
      });
    }
  }

  const http = createServer((req, res) => void handle(req, res));
  let httpPort: number;
  try {
    httpPort = await listen(http, options.httpPort ?? 0, LOCALHOST);
  } catch (err) {
    await smtp.close();
    throw err;
  }
  return {
    smtpPort: smtp.port,
    httpPort,
    httpUrl: `http://${LOCALHOST}:${httpPort}`,
    store,
    async close() {
      await Promise.all([closeServer(http), smtp.close()]);
    },
  };
}

export function mailFakeOptionsFromEnv(): MailFakeOptions {
  return {
    smtpPort: envPort("MAIL_FAKE_SMTP_PORT", DEFAULT_SMTP_PORT),
    httpPort: envPort("MAIL_FAKE_HTTP_PORT", DEFAULT_HTTP_PORT),
  };
}

runAsScript(
  import.meta.url,
  "mail-fake",
  () => startMailFake(mailFakeOptionsFromEnv()),
  (fake) => `SMTP on ${LOCALHOST}:${fake.smtpPort}, Resend API + inbox on ${fake.httpUrl}`,
);
