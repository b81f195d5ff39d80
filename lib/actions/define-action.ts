import "server-only";
import type { ZodType } from "zod";
import { AccessError, authorize, type CurrentUser } from "@/lib/auth/guard";
import type { Permission } from "@/lib/auth/permissions";
import { throwIfNul } from "@/lib/http/body";
import { AppError } from "@/lib/http/errors";
import { knownError } from "@/lib/http/known-errors";
import { logger } from "@/lib/logger";
import { zodIssues } from "@/lib/validation";

export type ActionResult<T> =
  | { ok: true; data: T }
  | { ok: false; error: { code: string; message: string; fields?: Record<string, string> } };

/**
 * Builds a server action that checks the session and permission, validates its input with the
 * same schema the form uses, and returns `{ ok, data | error }` instead of throwing.
 */
export function defineAction<I, O>(
  permission: Permission,
  schema: ZodType<I>,
  run: (input: I, user: CurrentUser) => Promise<O>,
): (input: unknown) => Promise<ActionResult<O>> {
  return async (raw) => {
    try {
      const user = await authorize(permission);
      throwIfNul(raw); // PostgreSQL stores no NUL in text: named here, not a bare 422 from the database
      const parsed = schema.safeParse(raw);
      if (!parsed.success) {
        const issues = zodIssues(parsed.error);
        return {
          ok: false,
          error: {
            code: "invalid",
            message: "Check the highlighted fields.",
            fields: Object.fromEntries(issues.map((i) => [i.path, i.message])),
          },
        };
      }
      return { ok: true, data: await run(parsed.data, user) };
    } catch (error) {
      if (error instanceof AccessError) {
        return {
          ok: false,
          error: { code: error.status === 401 ? "unauthenticated" : "forbidden", message: error.message },
        };
      }
      // An unknown id is not_found, a lost race on a unique index conflict, never internal.
      const known = error instanceof AppError ? error : knownError(error);
      if (known) {
        return { ok: false, error: { code: known.code, message: known.message, fields: known.fields } };
      }
      logger.error({ err: error }, "unhandled error in server action");
      return { ok: false, error: { code: "internal", message: "Something went wrong on our side." } };
    }
  };
}
