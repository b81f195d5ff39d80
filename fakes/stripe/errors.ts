/** An error answered in Stripe's shape, `{ error: { type, message, code?, param? } }`. */
export type StripeErrorType =
  "invalid_request_error" | "card_error" | "idempotency_error" | "api_error" | "authentication_error";

export interface StripeErrorExtra {
  code?: string;
  param?: string;
  decline_code?: string;
  doc_url?: string;
  payment_intent?: unknown;
}

export class StripeApiError extends Error {
  constructor(
    readonly status: number,
    readonly type: StripeErrorType,
    message: string,
    readonly extra: StripeErrorExtra = {},
  ) {
    super(message);
  }

  toBody(): { error: Record<string, unknown> } {
    return { error: { type: this.type, message: this.message, ...this.extra } };
  }
}

export function invalidRequest(message: string, extra: StripeErrorExtra = {}): StripeApiError {
  return new StripeApiError(400, "invalid_request_error", message, extra);
}

export function missingParam(param: string): StripeApiError {
  return invalidRequest(`Missing required param: ${param}.`, { code: "parameter_missing", param });
}

export function invalidParam(param: string, message: string, code = "parameter_invalid"): StripeApiError {
  return invalidRequest(message, { code, param });
}

export function noSuchResource(kind: string, id: string, param?: string): StripeApiError {
  return new StripeApiError(404, "invalid_request_error", `No such ${kind}: '${id}'`, {
    code: "resource_missing",
    ...(param ? { param } : {}),
  });
}
