import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { sendJson, UNREACHABLE } from "@/lib/browser/mutation";

// A tiny server on the loopback interface answering as our route handlers do (lib/http/route.ts):
// the body as JSON, or { error: { code, message, fields } } with a 4xx/5xx status.
let server: Server;
let base: string;
const seen: { method?: string; type?: string; body: string }[] = [];

beforeAll(async () => {
  server = createServer((req, res) => {
    let body = "";
    req.on("data", (c: Buffer) => (body += c.toString()));
    req.on("end", () => {
      seen.push({ method: req.method, type: req.headers["content-type"], body });
      const send = (status: number, text: string, type = "application/json") => {
        res.writeHead(status, { "content-type": type });
        res.end(text);
      };
      switch (req.url) {
        case "/echo":
          return send(201, JSON.stringify({ id: "o-1", got: body ? JSON.parse(body) : null }));
        case "/invalid":
          return send(
            422,
            JSON.stringify({
              error: { code: "invalid", message: "Check the amount.", fields: { amountCents: "Too much." } },
            }),
          );
        case "/html-500":
          return send(500, "<html>Internal Server Error</html>", "text/html");
        case "/empty-204":
          res.writeHead(204);
          return res.end();
        case "/drop":
          // The connection is cut without an answer (a server restarting, a proxy dropping it).
          return req.socket.destroy();
        default:
          return send(404, JSON.stringify({ error: { code: "not_found", message: "No such order." } }));
      }
    });
  });
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
});

afterAll(() => new Promise<void>((resolve) => server.close(() => resolve())));

describe("sendJson", () => {
  it("POSTs the body as JSON and answers ok with the parsed body", async () => {
    const res = await sendJson<{ id: string; got: unknown }>(`${base}/echo`, { body: { amountCents: 1250 } });
    expect(res).toEqual({ ok: true, data: { id: "o-1", got: { amountCents: 1250 } } });
    expect(seen.at(-1)).toEqual({ method: "POST", type: "application/json", body: '{"amountCents":1250}' });
  });

  it("sends the method it is given, with no body and no content type when there is none", async () => {
    await sendJson(`${base}/echo`, { method: "DELETE" });
    expect(seen.at(-1)).toEqual({ method: "DELETE", type: undefined, body: "" });
  });

  it("passes a handler's error through: code, message and field messages", async () => {
    expect(await sendJson(`${base}/invalid`, { method: "PUT", body: {} })).toEqual({
      ok: false,
      error: { code: "invalid", message: "Check the amount.", fields: { amountCents: "Too much." } },
    });
    expect(await sendJson(`${base}/nowhere`)).toEqual({
      ok: false,
      error: { code: "not_found", message: "No such order.", fields: undefined },
    });
  });

  it("words an answer that is not ours (an HTML 500) by its status", async () => {
    const res = await sendJson(`${base}/html-500`);
    expect(res).toEqual({
      ok: false,
      error: {
        code: "http_500",
        message: "The server answered 500. Try again in a moment.",
        fields: undefined,
      },
    });
  });

  it("takes a success with no body", async () => {
    expect(await sendJson(`${base}/empty-204`)).toEqual({ ok: true, data: null });
  });

  it("never throws: a dropped connection or a closed port is 'unreachable'", async () => {
    expect(await sendJson(`${base}/drop`)).toEqual({ ok: false, error: UNREACHABLE });
    const closed = createServer();
    await new Promise<void>((resolve) => closed.listen(0, "127.0.0.1", resolve));
    const port = (closed.address() as AddressInfo).port;
    await new Promise<void>((resolve) => closed.close(() => resolve()));
    expect(await sendJson(`http://127.0.0.1:${port}/echo`, { body: {} })).toEqual({
      ok: false,
      error: UNREACHABLE,
    });
  });
});
