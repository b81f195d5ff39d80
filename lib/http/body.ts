import { hasNoNul } from "@/lib/validation";
import { AppError } from "./errors";

/** JSON endpoints: a design file with its application text is a few kB; 1 MB is ample. */
export const JSON_BODY_LIMIT_BYTES = 1024 * 1024;
/** Small forms and the auth library's JSON (e-mail, password, name). */
export const FORM_BODY_LIMIT_BYTES = 16 * 1024;
/** Payment provider events are a few kB each. */
export const WEBHOOK_BODY_LIMIT_BYTES = 256 * 1024;
/** Deeper JSON than this is refused before parsing (no design file nests more than 4 levels). */
export const MAX_JSON_DEPTH = 32;

function formatLimit(bytes: number): string {
  return bytes >= 1024 * 1024 ? `${bytes / (1024 * 1024)} MB` : `${Math.round(bytes / 1024)} kB`;
}

function tooLarge(limitBytes: number, field: string, message?: string): AppError {
  const text = message ?? `The request body is larger than ${formatLimit(limitBytes)}.`;
  return new AppError("too_large", text, { [field]: text });
}

/**
 * Reads a request body counting bytes as they arrive and cancels the stream once it passes
 * `limitBytes` (413), so a body without a length (chunked) is refused early, never buffered whole.
 * A declared Content-Length over the limit is refused before reading anything.
 */
export async function readBody(
  req: Request,
  limitBytes: number,
  options: { field?: string; message?: string } = {},
): Promise<Uint8Array<ArrayBuffer>> {
  const field = options.field ?? "body";
  const declared = Number(req.headers.get("content-length") ?? "");
  if (Number.isFinite(declared) && declared > limitBytes) throw tooLarge(limitBytes, field, options.message);
  if (!req.body) return new Uint8Array(0);
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  try {
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      total += value.byteLength;
      if (total > limitBytes) {
        await reader.cancel().catch(() => undefined);
        throw tooLarge(limitBytes, field, options.message);
      }
      chunks.push(value);
    }
  } catch (error) {
    if (error instanceof AppError) throw error;
    throw new AppError("invalid", "The request body could not be read.", {
      [field]: "The request body could not be read.",
    });
  } finally {
    reader.releaseLock();
  }
  const bytes = new Uint8Array(total);
  let at = 0;
  for (const chunk of chunks) {
    bytes.set(chunk, at);
    at += chunk.byteLength;
  }
  return bytes;
}

/** The body as UTF-8 text, capped like readBody. */
export async function readText(req: Request, limitBytes: number): Promise<string> {
  return new TextDecoder().decode(await readBody(req, limitBytes));
}

/** How deeply a JSON text nests arrays and objects (strings skipped); a linear scan, no recursion. */
export function jsonDepth(text: string): number {
  let depth = 0;
  let max = 0;
  let inString = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (inString) {
      if (c === 0x5c)
        i++; // backslash: skip the escaped character
      else if (c === 0x22) inString = false;
    } else if (c === 0x22) inString = true;
    else if (c === 0x5b || c === 0x7b) max = Math.max(max, ++depth);
    else if (c === 0x5d || c === 0x7d) depth--;
  }
  return max;
}

const FORM_TYPES = /^\s*(application\/x-www-form-urlencoded|multipart\/form-data)\b/i;

/**
 * Reads a JSON body capped at `limitBytes` (413) and `MAX_JSON_DEPTH` levels; a form, text that is
 * not JSON or JSON nested too deeply is a 422 on the field "body".
 */
export async function readJson(req: Request, limitBytes = JSON_BODY_LIMIT_BYTES): Promise<unknown> {
  const invalid = (message: string) => new AppError("invalid", message, { body: message });
  if (FORM_TYPES.test(req.headers.get("content-type") ?? "")) {
    await req.body?.cancel().catch(() => undefined);
    throw invalid("Send the body as JSON (application/json), not as a form.");
  }
  const text = await readText(req, limitBytes);
  if (jsonDepth(text) > MAX_JSON_DEPTH)
    throw invalid(`The request body nests more than ${MAX_JSON_DEPTH} levels deep.`);
  let value: unknown;
  try {
    value = JSON.parse(text) as unknown;
  } catch {
    throw invalid("The request body is not valid JSON.");
  }
  // PostgreSQL stores no NUL character in text; refused here, where the field can still be named.
  // (A raw NUL is not valid JSON, so only its escape can bring one; the walk runs only then.)
  if (text.includes("\\u0000")) throwIfNul(value);
  return value;
}

const NUL_MESSAGE = "must not contain a NUL character (\\u0000)";

/**
 * Refuses input holding a NUL character anywhere (PostgreSQL stores none in text) with a 422 that
 * names the field, as the validation messages write it (`a.b[2].c`; `body` for the whole input).
 */
export function throwIfNul(value: unknown): void {
  const field = nulPath(value, "");
  if (field === null) return;
  const name = field || "body";
  throw new AppError("invalid", `${name}: ${NUL_MESSAGE}`, { [name]: NUL_MESSAGE });
}

/** The path of the first string (value or key) holding a NUL, "" for the input itself. */
function nulPath(value: unknown, path: string): string | null {
  if (typeof value === "string") return hasNoNul(value) ? null : path;
  if (typeof value !== "object" || value === null) return null;
  for (const [key, item] of Object.entries(value)) {
    const at = nulPath(item, Array.isArray(value) ? `${path}[${key}]` : path ? `${path}.${key}` : key);
    if (at !== null) return at;
  }
  // A key may hold one too.
  for (const key of Object.keys(value)) if (!hasNoNul(key)) return path;
  return null;
}

/** A form's fields (names, text values and file names) as one object, for throwIfNul. */
function formFields(form: FormData): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const [name, value] of form.entries()) fields[name] = typeof value === "string" ? value : value.name;
  return fields;
}

/**
 * Reads a form (urlencoded or multipart) capped at `limitBytes`; anything else — JSON where a
 * form is expected, a broken multipart envelope — is a 422 on `field`.
 */
export async function readForm(
  req: Request,
  limitBytes: number,
  options: { field?: string; message?: string; sizeMessage?: string } = {},
): Promise<FormData> {
  const field = options.field ?? "body";
  const message = options.message ?? "Send the body as a form (multipart/form-data or urlencoded).";
  const contentType = req.headers.get("content-type") ?? "";
  if (!FORM_TYPES.test(contentType)) {
    await req.body?.cancel().catch(() => undefined);
    throw new AppError("invalid", message, { [field]: message });
  }
  const bytes = await readBody(req, limitBytes, { field, message: options.sizeMessage });
  let form: FormData;
  try {
    form = await new Response(bytes, { headers: { "content-type": contentType } }).formData();
  } catch {
    throw new AppError("invalid", message, { [field]: message });
  }
  throwIfNul(formFields(form));
  return form;
}

/**
 * Wraps a handler that reads the body itself (the auth library's): the body is read with the cap
 * first and handed on as a fresh request, so an oversized one never reaches it.
 */
export function withBodyLimit<A extends unknown[]>(
  limitBytes: number,
  handler: (req: Request, ...rest: A) => Promise<Response>,
  onError: (error: unknown) => Response,
): (req: Request, ...rest: A) => Promise<Response> {
  return async (req, ...rest) => {
    let bytes: Uint8Array<ArrayBuffer>;
    try {
      bytes = await readBody(req, limitBytes);
      await refuseNul(bytes, req.headers.get("content-type") ?? "");
    } catch (error) {
      return onError(error);
    }
    const headers = new Headers(req.headers);
    headers.delete("transfer-encoding");
    headers.set("content-length", String(bytes.byteLength));
    const init: RequestInit = { method: req.method, headers, signal: req.signal };
    if (req.method !== "GET" && req.method !== "HEAD") init.body = bytes;
    return handler(new Request(req.url, init), ...rest);
  };
}

/**
 * A JSON or form body (read whole, capped) holding a NUL anywhere is refused naming the field,
 * before a library that would pass it to the database sees it. Only bodies that can hold one
 * (an escaped `\u0000`, a raw 0 byte, a `%00`) are parsed here.
 */
async function refuseNul(bytes: Uint8Array<ArrayBuffer>, contentType: string): Promise<void> {
  const text = new TextDecoder().decode(bytes);
  if (!/\\u0000|\u0000|%00/i.test(text)) return;
  if (FORM_TYPES.test(contentType)) {
    const form = await new Response(bytes, { headers: { "content-type": contentType } })
      .formData()
      .catch(() => null);
    if (form) throwIfNul(formFields(form));
    return;
  }
  let value: unknown;
  try {
    value = JSON.parse(text) as unknown;
  } catch {
    return; // not JSON: the library answers it
  }
  throwIfNul(value);
}
