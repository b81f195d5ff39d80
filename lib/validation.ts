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
