import { ZodError } from "zod";
import { zodIssues } from "@/lib/validation";
import { AppError, STATUS_OF, type ErrorBody } from "./errors";

/**
 * The answer to an error the caller can act on (an AppError, or a zod error naming each field), or
 * null for anything else. Pure, so the design worker answers exactly as a route handler does.
 */
export function errorAnswer(error: unknown): { status: number; body: ErrorBody } | null {
  if (error instanceof AppError) {
    return {
      status: STATUS_OF[error.code],
      body: { error: { code: error.code, message: error.message, fields: error.fields } },
    };
  }
  if (error instanceof ZodError) {
    const issues = zodIssues(error);
    return {
      status: 422,
      body: {
        error: {
          code: "invalid",
          message: issues.map((i) => `${i.path || "body"}: ${i.message}`).join("\n"),
          // An issue on the whole body (not an object at all) is reported on "body".
          fields: Object.fromEntries(issues.map((i) => [i.path || "body", i.message])),
        },
      },
    };
  }
  return null;
}
