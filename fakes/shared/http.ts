import { realpathSync } from "node:fs";
import type { IncomingMessage, Server, ServerResponse } from "node:http";
import type { AddressInfo, Server as NetServer } from "node:net";
import { pathToFileURL } from "node:url";

export const LOCALHOST = "127.0.0.1";

export class BodyTooLargeError extends Error {}

export async function readBody(req: IncomingMessage, limitBytes = 5 * 1024 * 1024): Promise<string> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of req) {
    const buf = Buffer.isBuffer(chunk) ? chunk : Buffer.from(String(chunk));
    size += buf.length;
    if (size > limitBytes) throw new BodyTooLargeError(`Request body exceeds ${limitBytes} bytes`);
    chunks.push(buf);
  }
  return Buffer.concat(chunks).toString("utf8");
}

export function sendJson(
  res: ServerResponse,
  status: number,
  body: unknown,
  headers: Record<string, string> = {},
): void {
  const payload = JSON.stringify(body, null, 2);
  res.writeHead(status, {
    "Content-Type": "application/json; charset=utf-8",
    "Content-Length": Buffer.byteLength(payload),
    "Cache-Control": "no-store",
    ...headers,
  });
  res.end(payload);
}

export function sendHtml(res: ServerResponse, status: number, html: string): void {
  res.writeHead(status, {
    "Content-Type": "text/html; charset=utf-8",
    "Content-Length": Buffer.byteLength(html),
    "Cache-Control": "no-store",
    "X-Frame-Options": "DENY",
  });
  res.end(html);
}

export function redirect(res: ServerResponse, status: 302 | 303, location: string): void {
  res.writeHead(status, { Location: location, "Content-Length": 0 });
  res.end();
}

/** Listens on 127.0.0.1 only; port 0 picks a free port. Resolves with the bound port. */
export function listen(server: NetServer, port: number, host = LOCALHOST): Promise<number> {
  return new Promise((resolve, reject) => {
    const onError = (err: Error) => reject(err);
    server.once("error", onError);
    server.listen(port, host, () => {
      server.off("error", onError);
      resolve((server.address() as AddressInfo).port);
    });
  });
}

export function closeServer(server: Server): Promise<void> {
  return new Promise((resolve, reject) => {
    server.close((err) => (err ? reject(err) : resolve()));
    // Keep-alive sockets (SDK agents, browsers) would otherwise hold close() open.
    server.closeAllConnections();
  });
}

export function escapeHtml(value: string): string {
  return value
    .replace(/&/g, "&amp;")
    .replace(/</g, "&lt;")
    .replace(/>/g, "&gt;")
    .replace(/"/g, "&quot;")
    .replace(/'/g, "&#39;");
}

export function isMainModule(moduleUrl: string): boolean {
  const entry = process.argv[1];
  if (!entry) return false;
  try {
    return pathToFileURL(realpathSync(entry)).href === moduleUrl;
  } catch {
    return false;
  }
}

export function envPort(name: string, fallback: number): number {
  const raw = process.env[name];
  if (raw === undefined || raw === "") return fallback;
  const port = Number(raw);
  if (!Number.isInteger(port) || port < 0 || port > 65535) {
    throw new Error(`${name} must be a port number, got ${JSON.stringify(raw)}`);
  }
  return port;
}

export function sleep(ms: number): Promise<void> {
  return new Promise((resolve) => setTimeout(resolve, ms));
}

/**
 * When `moduleUrl` is the script node was started with: starts the fake, prints `describe(fake)`,
 * and closes it on SIGINT/SIGTERM. (No top-level await: tsx may load these files as CommonJS.)
 */
export function runAsScript<F extends { close(): Promise<void> }>(
  moduleUrl: string,
  name: string,
  start: () => Promise<F>,
  describe: (fake: F) => string,
): void {
  if (!isMainModule(moduleUrl)) return;
  start().then(
    (fake) => {
      console.log(`[${name}] ${describe(fake)}`);
      const stop = () => void fake.close().then(() => process.exit(0));
      process.once("SIGINT", stop);
      process.once("SIGTERM", stop);
    },
    (err: unknown) => {
      console.error(`[${name}] failed to start:`, err);
      process.exit(1);
    },
  );
}
