import { API_ERROR_STATUS } from '../../src/contracts/api/errors';
import type { ApiErrorCode } from '../../src/contracts/api/errors';
import type { Problem } from '../../src/contracts/problems';

/** Stable error codes of the API and the HTTP status each one answers with (defined with the shared contracts). */
export const ERROR_STATUS = API_ERROR_STATUS;

export type ErrorCode = ApiErrorCode;

/** The one JSON shape of every error reply. */
export interface ErrorBody {
  error: { code: ErrorCode; message: string; fields: Problem[]; requestId?: string };
}

/** An expected failure with a stable code; the error handler turns it into an ErrorBody. */
export class AppError extends Error {
  readonly code: ErrorCode;
  readonly fields: Problem[];
  constructor(code: ErrorCode, message: string, fields: Problem[] = [], options?: { cause?: unknown }) {
    super(message, options);
    this.code = code;
    this.fields = fields;
  }
  get status(): number {
    return ERROR_STATUS[this.code];
  }
}
