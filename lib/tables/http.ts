import "server-only";
import type { ZodType } from "zod";
import { AppError } from "@/lib/http/errors";
import { parseTableQueryStrict, type RawParams } from "./params";

/** A table's query for a handler (CSV, JSON): any bad parameter is a 422 naming it. */
export function tableQueryOrThrow<T>(schema: ZodType<T>, raw: RawParams): T {
  const parsed = parseTableQueryStrict(schema, raw);
  if (parsed.ok) return parsed.query;
  throw new AppError(
    "invalid",
    Object.entries(parsed.fields)
      .map(([field, message]) => `${field}: ${message}`)
      .join("\n"),
    parsed.fields,
  );
}
