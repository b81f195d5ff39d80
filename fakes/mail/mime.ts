/**
 * A deliberately small MIME reader for what nodemailer sends: folded headers,
 * RFC 2047 encoded words, multipart/* trees, base64 and quoted-printable bodies.
 * It is not a general mail parser; it is enough to assert on test mail.
 */
export interface ParsedAttachment {
  filename: string | null;
  contentType: string;
  size: number;
  contentId: string | null;
}

export interface ParsedMail {
  headers: Record<string, string>;
  subject: string | null;
  from: string | null;
  to: string[];
  cc: string[];
  replyTo: string[];
  messageId: string | null;
  text: string | null;
  html: string | null;
  attachments: ParsedAttachment[];
}

interface Part {
  headers: Map<string, string>;
  body: string; // latin1: one char per byte
}

function bytesToText(bytes: Buffer, charset = "utf-8"): string {
  try {
    return new TextDecoder(charset.toLowerCase()).decode(bytes);
  } catch {
    return new TextDecoder("utf-8").decode(bytes);
  }
}

// SMTP puts CRLF on the wire; give tests back the LF the app wrote.
function normalizeNewlines(text: string): string {
  return text.replace(/\r\n/g, "\n");
}

function decodeQuotedPrintable(input: string): Buffer {
  const soft = input.replace(/=\r?\n/g, "");
  const bytes: number[] = [];
  for (let i = 0; i < soft.length; i++) {
    const ch = soft[i] as string;
    const hex = soft.slice(i + 1, i + 3);
    if (ch === "=" && /^[0-9A-Fa-f]{2}$/.test(hex)) {
      bytes.push(parseInt(hex, 16));
      i += 2;
    } else {
      bytes.push(ch.charCodeAt(0) & 0xff);
    }
  }
  return Buffer.from(bytes);
}

/** RFC 2047: `=?UTF-8?Q?Caf=C3=A9?=` / `=?utf-8?B?...?=`; whitespace between words is dropped. */
export function decodeEncodedWords(value: string): string {
  // Raw 8-bit (SMTPUTF8) header bytes arrive as latin1 chars; reread them as UTF-8 first.
  let source = value;
  if (/[\x80-\xff]/.test(source) && !/[^\x00-\xff]/.test(source)) {
    try {
      source = new TextDecoder("utf-8", { fatal: true }).decode(Buffer.from(source, "latin1"));
    } catch {
      // Not UTF-8: keep the latin1 reading.
    }
  }
  const collapsed = source.replace(/(=\?[^?]+\?[BbQq]\?[^?]*\?=)\s+(?==\?[^?]+\?[BbQq]\?[^?]*\?=)/g, "$1");
  return collapsed.replace(
    /=\?([^?*]+)(?:\*[^?]*)?\?([BbQq])\?([^?]*)\?=/g,
    (_m, charset: string, enc: string, text: string) => {
      const bytes =
        enc.toUpperCase() === "B"
          ? Buffer.from(text, "base64")
          : decodeQuotedPrintable(text.replace(/_/g, " "));
      return bytesToText(bytes, charset);
    },
  );
}

function splitHeadersAndBody(raw: string): { head: string; body: string } {
  const match = /\r?\n\r?\n/.exec(raw);
  if (!match) return { head: raw, body: "" };
  return { head: raw.slice(0, match.index), body: raw.slice(match.index + match[0].length) };
}

function parseHeaders(head: string): Map<string, string> {
  const headers = new Map<string, string>();
  const unfolded = head.replace(/\r?\n[ \t]+/g, " ");
  for (const line of unfolded.split(/\r?\n/)) {
    const colon = line.indexOf(":");
    if (colon <= 0) continue;
    const name = line.slice(0, colon).trim().toLowerCase();
    const value = line.slice(colon + 1).trim();
    // Repeated headers (Received) are joined; the ones we read are single.
    headers.set(name, headers.has(name) ? `${headers.get(name)}, ${value}` : value);
  }
  return headers;
}

function percentDecode(value: string): Buffer {
  const bytes: number[] = [];
  for (let i = 0; i < value.length; i++) {
    const hex = value.slice(i + 1, i + 3);
    if (value[i] === "%" && /^[0-9A-Fa-f]{2}$/.test(hex)) {
      bytes.push(parseInt(hex, 16));
      i += 2;
    } else {
      bytes.push(value.charCodeAt(i) & 0xff);
    }
  }
  return Buffer.from(bytes);
}

function parseParams(value: string): { value: string; params: Record<string, string> } {
  const [first = "", ...rest] = value.split(";");
  const params: Record<string, string> = {};
  for (const item of rest) {
    const eq = item.indexOf("=");
    if (eq < 0) continue;
    let key = item.slice(0, eq).trim().toLowerCase();
    let val = item
      .slice(eq + 1)
      .trim()
      .replace(/^"(.*)"$/, "$1");
    if (key.endsWith("*")) {
      // RFC 2231 `filename*=utf-8''na%C3%AFve.pdf`
      key = key.slice(0, -1);
      const m = /^([^']*)'[^']*'(.*)$/.exec(val);
      if (m) val = bytesToText(percentDecode(m[2] ?? ""), m[1] || "utf-8");
    }
    params[key] = decodeEncodedWords(val);
  }
  return { value: first.trim().toLowerCase(), params };
}

function decodeBody(part: Part): Buffer {
  const cte = (part.headers.get("content-transfer-encoding") ?? "7bit").toLowerCase().trim();
  if (cte === "base64") return Buffer.from(part.body.replace(/\s+/g, ""), "base64");
  if (cte === "quoted-printable") return decodeQuotedPrintable(part.body);
  return Buffer.from(part.body, "latin1");
}

function splitMultipart(body: string, boundary: string): string[] {
  const delimiter = `--${boundary}`;
  const lines = body.split(/\r?\n/);
  const parts: string[] = [];
  let current: string[] | null = null;
  for (const line of lines) {
    if (line === `${delimiter}--` || line.trimEnd() === `${delimiter}--`) {
      if (current) parts.push(current.join("\r\n"));
      current = null;
      break;
    }
    if (line === delimiter || line.trimEnd() === delimiter) {
      if (current) parts.push(current.join("\r\n"));
      current = [];
      continue;
    }
    current?.push(line);
  }
  if (current) parts.push(current.join("\r\n"));
  return parts;
}

/** "Name <a@b>, \"Last, First\" <c@d>, e@f" → ["a@b", "c@d", "e@f"] */
export function parseAddressList(value: string | null | undefined): string[] {
  if (!value) return [];
  const out: string[] = [];
  let token = "";
  let quoted = false;
  let angle = 0;
  const flush = () => {
    const t = token.trim();
    token = "";
    if (!t) return;
    const inAngle = /<([^>]*)>/.exec(t);
    const address = (inAngle ? inAngle[1] : t.replace(/^.*:/, "").replace(/;$/, ""))?.trim();
    if (address && address.includes("@")) out.push(address);
  };
  for (const ch of value) {
    if (ch === '"') quoted = !quoted;
    else if (!quoted && ch === "<") angle++;
    else if (!quoted && ch === ">") angle = Math.max(0, angle - 1);
    if (ch === "," && !quoted && angle === 0) flush();
    else token += ch;
  }
  flush();
  return out;
}

export function parseMime(raw: Buffer | string): ParsedMail {
  const source =
    typeof raw === "string" ? Buffer.from(raw, "utf8").toString("latin1") : raw.toString("latin1");
  const { head, body } = splitHeadersAndBody(source);
  const topHeaders = parseHeaders(head);
  const result: ParsedMail = {
    headers: {},
    subject: null,
    from: null,
    to: [],
    cc: [],
    replyTo: [],
    messageId: null,
    text: null,
    html: null,
    attachments: [],
  };
  for (const [k, v] of topHeaders) result.headers[k] = decodeEncodedWords(v);
  result.subject = result.headers["subject"] ?? null;
  result.from = parseAddressList(result.headers["from"])[0] ?? null;
  result.to = parseAddressList(result.headers["to"]);
  result.cc = parseAddressList(result.headers["cc"]);
  result.replyTo = parseAddressList(result.headers["reply-to"]);
  result.messageId = result.headers["message-id"] ?? null;

  const visit = (part: Part, depth: number) => {
    const { value: type, params } = parseParams(
      part.headers.get("content-type") ?? "text/plain; charset=us-ascii",
    );
    if (type.startsWith("multipart/") && params["boundary"] && depth < 10) {
      for (const chunk of splitMultipart(part.body, params["boundary"])) {
        const split = splitHeadersAndBody(chunk);
        visit({ headers: parseHeaders(split.head), body: split.body }, depth + 1);
      }
      return;
    }
    const disposition = parseParams(part.headers.get("content-disposition") ?? "");
    const filename = disposition.params["filename"] ?? params["name"] ?? null;
    const isAttachment =
      disposition.value === "attachment" || (filename !== null && disposition.value !== "inline");
    const bytes = decodeBody(part);
    if (!isAttachment && type === "text/plain" && result.text === null) {
      result.text = normalizeNewlines(bytesToText(bytes, params["charset"]));
    } else if (!isAttachment && type === "text/html" && result.html === null) {
      result.html = normalizeNewlines(bytesToText(bytes, params["charset"]));
    } else {
      result.attachments.push({
        filename,
        contentType: type,
        size: bytes.length,
        contentId: part.headers.get("content-id")?.replace(/^<|>$/g, "") ?? null,
      });
    }
  };
  visit({ headers: topHeaders, body }, 0);
  return result;
}
