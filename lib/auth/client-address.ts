import { randomBytes } from "node:crypto";
import type { IncomingMessage, Server } from "node:http";

/**
 * The header the auth library keys its rate limit on. Only our own server code sets it (any copy a
 * client sends is overwritten), from the socket's address — or, when the shop says it sits behind
 * a proxy (TRUST_PROXY=1), from the address that proxy appended to X-Forwarded-For. Its name has a
 * random part made once per process (shared by every bundle through the environment), so a client
 * cannot send it even in the moment before the stamp is installed.
 */
export const CLIENT_ADDRESS_HEADER =
  (process.env.YOKELINE_CLIENT_ADDRESS_HEADER ??= `x-yokeline-client-address-${randomBytes(6).toString("hex")}`);

type HeaderValue = string | string[] | undefined;

const first = (value: HeaderValue) => (Array.isArray(value) ? value.join(",") : value);

/**
 * The client's address: the socket's, unless `trustProxy`, then the right-most X-Forwarded-For
 * entry (the one our own proxy added; everything left of it the client may have made up), else
 * X-Real-IP, else the socket's.
 */
export function clientAddress(
  headers: Record<string, HeaderValue>,
  socketAddress: string | undefined,
  trustProxy: boolean,
): string | undefined {
  if (trustProxy) {
    const forwarded = first(headers["x-forwarded-for"])
      ?.split(",")
      .map((s) => s.trim())
      .filter(Boolean);
    const fromProxy = forwarded?.at(-1) ?? first(headers["x-real-ip"])?.trim();
    if (fromProxy) return fromProxy;
  }
  return socketAddress;
}

/** Sets (or removes) the client-address header of one incoming request, in place. */
export function stampClientAddress(req: IncomingMessage, trustProxy = process.env.TRUST_PROXY === "1"): void {
  const address = clientAddress(req.headers, req.socket?.remoteAddress, trustProxy);
  if (address) req.headers[CLIENT_ADDRESS_HEADER] = address;
  else delete req.headers[CLIENT_ADDRESS_HEADER];
}

const installed = Symbol.for("yokeline.clientAddress");

/**
 * Stamps every request of every HTTP server in this process before its handlers see it. Called
 * from instrumentation.ts, so it works under plain `next start` (whose own code only fills
 * X-Forwarded-For from the socket when the client did not send one). Safe to call twice.
 */
export function installClientAddressStamp(serverClass: typeof Server): void {
  const proto = serverClass.prototype as Server & { [installed]?: boolean };
  if (proto[installed]) return;
  proto[installed] = true;
  const emit = proto.emit;
  proto.emit = function (this: Server, event: string | symbol, ...args: unknown[]) {
    if (event === "request") stampClientAddress(args[0] as IncomingMessage);
    return (emit as (this: Server, event: string | symbol, ...rest: unknown[]) => boolean).call(
      this,
      event,
      ...args,
    );
  } as typeof proto.emit;
}
