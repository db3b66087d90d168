/** Error types the Stripe API uses in `error.type`; the SDK maps them to its error classes. */
export type StripeErrorType = 'invalid_request_error' | 'api_error' | 'card_error';

/** An error the fake answers in Stripe's shape: `{ error: { type, message, param?, code? } }`. */
export class StripeApiError extends Error {
  constructor(
    readonly statusCode: number,
    readonly type: StripeErrorType,
    message: string,
    readonly param?: string,
    readonly code?: string,
  ) {
    super(message);
  }

  toBody(): { error: Record<string, string> } {
    const error: Record<string, string> = { type: this.type, message: this.message };
    if (this.param) error.param = this.param;
    if (this.code) error.code = this.code;
    return { error };
  }
}

/** 400 for a parameter that is missing, malformed or out of range. */
export function badParam(param: string, message: string, code = 'parameter_invalid'): StripeApiError {
  return new StripeApiError(400, 'invalid_request_error', message, param, code);
}

/** 404 the way Stripe reports an unknown id on a path, e.g. "No such customer: 'cus_x'". */
export function noSuch(kind: string, id: string, param = 'id'): StripeApiError {
  return new StripeApiError(404, 'invalid_request_error', `No such ${kind}: '${id}'`, param, 'resource_missing');
}

/** 400 for an id given in the body that does not exist (Stripe answers 400, not 404, there). */
export function noSuchParam(kind: string, id: string, param: string): StripeApiError {
  return new StripeApiError(400, 'invalid_request_error', `No such ${kind}: '${id}'`, param, 'resource_missing');
}
