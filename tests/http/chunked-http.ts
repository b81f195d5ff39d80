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

export { chunkedPost } from "./chunked-client";
