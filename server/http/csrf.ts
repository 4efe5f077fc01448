import { createHmac, randomBytes, timingSafeEqual } from 'node:crypto';
import type { Request, RequestHandler, Response } from 'express';
import { AppError } from './app-error';
import { callerOf } from './context';

/** Cookie that gives a visitor without a session something to bind a CSRF token to. */
export const ANON_COOKIE = 'pp.visitor';
export const CSRF_HEADER = 'x-csrf-token';
const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

function readCookie(req: Request, name: string): string | undefined {
  for (const part of (req.headers.cookie ?? '').split(';')) {
    const eq = part.indexOf('=');
    if (eq > 0 && part.slice(0, eq).trim() === name) return part.slice(eq + 1).trim();
  }
  return undefined;
}

/**
 * A token bound to the session (or to the visitor cookie when nobody is signed in): an HMAC of
 * the session's random id under AUTH_SECRET, so another site can neither read nor forge it.
 * This is the "signed double-submit" pattern of the OWASP Cross-Site Request Forgery Prevention
 * Cheat Sheet.
 */
function tokenFor(secret: string, binding: string): string {
  return createHmac('sha256', secret).update(`csrf\n${binding}`).digest('base64url');
}

function binding(req: Request): string | null {
  const caller = callerOf(req);
  if (caller) return `session:${caller.user.id}:${caller.session.sid}`;
  const visitor = readCookie(req, ANON_COOKIE);
  return visitor && /^[A-Za-z0-9_-]{43}$/.test(visitor) ? `visitor:${visitor}` : null;
}

/** The token for this request's session, setting a visitor cookie first when there is no session. */
export function issueCsrfToken(req: Request, res: Response, secret: string, secureCookies: boolean): string {
  let bound = binding(req);
  if (!bound) {
    const visitor = randomBytes(32).toString('base64url');
    res.cookie(ANON_COOKIE, visitor, { httpOnly: true, sameSite: 'lax', path: '/', secure: secureCookies });
    bound = `visitor:${visitor}`;
  }
  return tokenFor(secret, bound);
}

/** Refuses every non-GET /api request whose X-CSRF-Token does not match its session (403 csrf_failed). */
export function csrfGuard(secret: string): RequestHandler {
  return (req, _res, next) => {
    if (SAFE.has(req.method)) return next();
    const bound = binding(req);
    const sent = req.get(CSRF_HEADER) ?? '';
    const expected = bound ? tokenFor(secret, bound) : '';
    const ok = expected !== '' && sent.length === expected.length && timingSafeEqual(Buffer.from(sent), Buffer.from(expected));
    if (!ok) return next(new AppError('csrf_failed', 'This request lacks a valid X-CSRF-Token header; read csrfToken from GET /api/me and send it.'));
    next();
  };
}
