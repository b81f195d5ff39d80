import http from "node:http";

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
