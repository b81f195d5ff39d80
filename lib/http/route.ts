import "server-only";
import type { NextRequest } from "next/server";
import { ZodError, type ZodType } from "zod";
import { AccessError, authorize, type CurrentUser } from "@/lib/auth/guard";
import type { Permission } from "@/lib/auth/permissions";
import { logger } from "@/lib/logger";
import { AppError, STATUS_OF, type ErrorBody } from "./errors";
import { zodIssues } from "@/lib/validation";
import { JSON_BODY_LIMIT_BYTES, readJson } from "./body";
import { knownError } from "./known-errors";

type Access = { permission: Permission } | { permission: null } | "public";

interface HandlerContext<P> {
  req: NextRequest;
  params: P;
  /** The caller; always null on public routes. */
  user: CurrentUser | null;
}

/**
 * Wraps every route handler once: checks the session and permission, and turns errors into
 * `{ error: { code, message, fields? } }` with the status from one map.
 */
export function route<P = Record<string, string>>(
  access: Access,
  handler: (ctx: HandlerContext<P>) => Promise<Response>,
) {
  return async (req: NextRequest, context: { params: Promise<P> }): Promise<Response> => {
    try {
      // Public routes never read the session: they answer the same to everyone.
      const user = access === "public" ? null : await authorize(access.permission, req.headers);
      return await handler({ req, params: await (context?.params ?? ({} as P)), user });
    } catch (error) {
      return errorResponse(error);
    }
  };
}

export function errorResponse(error: unknown): Response {
  if (error instanceof AccessError) {
    const code = error.status === 401 ? "unauthenticated" : "forbidden";
    return json<ErrorBody>({ error: { code, message: error.message } }, error.status);
  }
  if (error instanceof AppError) {
    return json<ErrorBody>(
      { error: { code: error.code, message: error.message, fields: error.fields } },
      STATUS_OF[error.code],
    );
  }
  if (error instanceof ZodError) {
    const issues = zodIssues(error);
    return json<ErrorBody>(
      {
        error: {
          code: "invalid",
          message: issues.map((i) => `${i.path || "body"}: ${i.message}`).join("\n"),
          // An issue on the whole body (not an object at all) is reported on "body".
          fields: Object.fromEntries(issues.map((i) => [i.path || "body", i.message])),
        },
      },
      422,
    );
  }
  const known = knownError(error);
  if (known) return errorResponse(known);
  logger.error({ err: error }, "unhandled error in route handler");
  return json<ErrorBody>({ error: { code: "internal", message: "Something went wrong on our side." } }, 500);
}

/** A JSON response (a plain Response: NextResponse.json builds a second one around the first). */
export function json<T>(body: T, status = 200, headers?: HeadersInit): Response {
  const h = new Headers(headers);
  if (!h.has("content-type")) h.set("content-type", "application/json");
  return new Response(JSON.stringify(body), { status, headers: h });
}

/**
 * Parses a JSON body with a schema. The body is read capped (413 past `limitBytes`, about 1 MB);
 * a form, text that is not JSON or JSON nested too deeply is a 422 too.
 */
export async function parseJson<T>(
  req: Request,
  schema: ZodType<T>,
  limitBytes = JSON_BODY_LIMIT_BYTES,
): Promise<T> {
  return schema.parse(await readJson(req, limitBytes));
}
