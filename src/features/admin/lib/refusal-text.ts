import { errorMessage, isApiError } from '../../../lib/api-client';

/** The server's refusal as one line: its field problems (`name: must not be empty`) when it names any, else its message. */
export function refusalText(error: unknown): string {
  if (isApiError(error) && error.fields.length > 0) return error.fields.map((f) => `${f.path}: ${f.message}`).join('; ');
  return errorMessage(error);
}
