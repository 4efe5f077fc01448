import { z } from '../zod-messages';

/** Stable error codes of the API and the HTTP status each one answers with. */
export const API_ERROR_STATUS = {
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

/** One of the API's stable error codes. */
export type ApiErrorCode = keyof typeof API_ERROR_STATUS;

export const problemSchema = z.object({ path: z.string(), message: z.string() });

/**
 * The one JSON shape of every error reply of `/api`: a stable code, a message for people, the
 * failing fields (or CSV lines) as Problem lines, and the request id that the server log carries.
 * The code is read as plain text so that a client keeps working when a new code is added.
 */
export const errorBodySchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    fields: z.array(problemSchema),
    requestId: z.string().optional(),
  }),
});
export type ErrorBodyWire = z.infer<typeof errorBodySchema>;
