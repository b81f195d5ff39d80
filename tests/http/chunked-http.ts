import http from "node:http";
import { Readable } from "node:stream";
import type { AddressInfo } from "node:net";
import { NextRequest } from "next/server";

/**
 * A real HTTP server in front of a route handler, as `next start` hands it the request: the Node
 * request stream becomes the Request's body, read only as the handler pulls it.
 */
export async function serve(handler: (req: NextRequest) => Promise<Response>) {
  const server = http.createServer(async (req, res) => {
    const request = new NextRequest(`http://127.0.0.1${req.url}`, {
      method: req.method,
      headers: req.headers as Record<string, string>,
      body: Readable.toWeb(req) as ReadableStream<Uint8Array>,
      duplex: "half",
    } as ConstructorParameters<typeof NextRequest>[1]);
    const response = await handler(request);
    res.writeHead(response.status, Object.fromEntries(response.headers));
    res.end(Buffer.from(await response.arrayBuffer()));
    // What the client still sends after the answer is not read (the connection is closed).
    req.destroy();
  });
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  return { server, port: (server.address() as AddressInfo).port };
}

/**
 * Sends up to `totalBytes` in 64 kB chunks with Transfer-Encoding: chunked (no Content-Length),
 * and resolves with the answer and how much had been written when it came.
 */
export function chunkedPost(
  port: number,
  path: string,
  totalBytes: number,
  contentType = "application/json",
  extraHeaders: Record<string, string> = {},
) {
  return new Promise<{ status: number; body: string; writtenBytes: number }>((resolve, reject) => {
    let written = 0;
    let answered = false;
    const req = http.request({
      host: "127.0.0.1",
      port,
      path,
      method: "POST",
      headers: { "content-type": contentType, ...extraHeaders },
    });
    req.on("response", (res) => {
      answered = true;
      const at = written;
      let body = "";
      res.setEncoding("utf8");
      res.on("data", (c: string) => (body += c));
      res.on("end", () => resolve({ status: res.statusCode ?? 0, body, writtenBytes: at }));
    });
    req.on("error", (error) => (answered ? undefined : reject(error)));
    const chunk = Buffer.alloc(64 * 1024, 0x20);
    const pump = () => {
      while (!answered && written < totalBytes) {
        written += chunk.length;
        if (!req.write(chunk)) return void req.once("drain", pump);
      }
      if (!answered) req.end();
    };
    req.flushHeaders();
    pump();
  });
}
