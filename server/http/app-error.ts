import type { Problem } from '../../src/contracts/problems';

/** Stable error codes of the API and the HTTP status each one answers with. */
export const ERROR_STATUS = {
  invalid_input: 400,
  malformed_json: 400,
  unauthenticated: 401,
  forbidden: 403,
  csrf_failed: 403,
  not_found: 404,
  method_not_allowed: 405,
  conflict: 409,
  gone: 410,
  payload_too_large: 413,
  unsupported_media_type: 415,
  rate_limited: 429,
  internal: 500,
  unavailable: 503,
} as const;

export type ErrorCode = keyof typeof ERROR_STATUS;

/** The one JSON shape of every error reply. */
export interface ErrorBody {
  error: { code: ErrorCode; message: string; fields: Problem[]; requestId?: string };
}

/** An expected failure with a stable code; the error handler turns it into an ErrorBody. */
export class AppError extends Error {
  readonly code: ErrorCode;
  readonly fields: Problem[];
  constructor(code: ErrorCode, message: string, fields: Problem[] = []) {
    super(message);
    this.code = code;
    this.fields = fields;
  }
  get status(): number {
    return ERROR_STATUS[this.code];
  }
}
