import { z } from '../../../contracts/zod-messages';
import { authRedirectResponseSchema } from '../../../contracts/api/account';
import { ApiError } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';

const csrfSchema = z.object({ csrfToken: z.string() });

/** Messages for the error codes Auth.js puts in its redirect URL. */
const AUTH_ERRORS: Record<string, string> = {
  CredentialsSignin: 'That e-mail address and password do not match an account.',
  EmailSignin: 'The sign-in link could not be sent. Check the address and try again.',
  AccessDenied: 'This account may not sign in. Ask the site administrator.',
  Verification: 'The sign-in link has expired or was already used. Ask for a new one.',
};

/**
 * Posts a form to an Auth.js endpoint the way its own pages do: a fresh CSRF token from
 * GET /auth/csrf, form encoding, and `X-Auth-Return-Redirect: 1` so the reply is JSON `{ url }`.
 * An `error` in that URL becomes an ApiError with a plain message.
 */
export async function postAuthForm(path: string, fields: Record<string, string>): Promise<string> {
  let res = await fetch(apiPaths.authCsrf(), { credentials: 'same-origin' });
  if (!res.ok) throw new ApiError(res.status, 'unavailable', 'Sign-in is not available right now. Try again in a moment.');
  const { csrfToken } = csrfSchema.parse(await res.json());
  res = await fetch(path, {
    method: 'POST',
    credentials: 'same-origin',
    headers: { 'content-type': 'application/x-www-form-urlencoded', 'x-auth-return-redirect': '1' },
    body: new URLSearchParams({ ...fields, csrfToken }).toString(),
  });
  if (res.status === 429) throw new ApiError(429, 'rate_limited', 'Too many attempts. Wait a minute and try again.');
  const body = authRedirectResponseSchema.safeParse(await res.json().catch(() => null));
  if (!body.success) throw new ApiError(res.status, 'unexpected_reply', 'The sign-in service gave an answer this page cannot read.');
  const error = new URL(body.data.url, window.location.origin).searchParams.get('error');
  if (error) throw new ApiError(401, 'unauthenticated', AUTH_ERRORS[error] ?? 'Signing in did not work. Try again.');
  return body.data.url;
}
