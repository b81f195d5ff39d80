/** An error the caller can act on, with the HTTP status it maps to. */
export class AppError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
  }
}

export type ErrorCode =
  | "unauthenticated"
  | "forbidden"
  | "not_found"
  | "conflict"
  | "invalid"
  | "too_large"
  | "rate_limited"
  | "unavailable";

/** The one map from error code to HTTP status. */
export const STATUS_OF: Record<ErrorCode, number> = {
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  too_large: 413,
  invalid: 422,
  rate_limited: 429,
  // An outside service (the database, the payment provider) cannot be reached; nothing was changed.
  unavailable: 503,
};

export interface ErrorBody {
  error: { code: ErrorCode | "internal"; message: string; fields?: Record<string, string> };
}

/** Turns zod-style issues ({ path, message }) into one field → message map. */
export function fieldsFromIssues(issues: { path: string; message: string }[]): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of issues) fields[issue.path || "(root)"] ??= issue.message;
  return fields;
}
