import type { ZodError } from "zod";

/** zod's issues as `{ path: "a.b[0].c", message }`, the form every screen and API reports. */
export function zodIssues(error: ZodError): { path: string; message: string }[] {
  return error.issues.map((issue) => ({
    path: issue.path
      .map((p, i) => (typeof p === "number" ? `[${p}]` : i === 0 ? String(p) : `.${String(p)}`))
      .join(""),
    message: issue.message,
  }));
}

/**
 * PostgreSQL stores no NUL character in text, so free text carrying one is refused before it gets
 * there: the query-string schemas refine with this; bodies and action inputs go through
 * `throwIfNul` (lib/http/body.ts), which names the field.
 */
export const hasNoNul = (text: string): boolean => !text.includes("\u0000");
