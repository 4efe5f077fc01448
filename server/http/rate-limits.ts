import type { Request, RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import { AppError } from './app-error';
import { callerOf } from './context';

const MINUTE = 60_000;

function limiter(windowMs: number, limit: number, what: string, key?: (req: Request) => string): RequestHandler {
  return rateLimit({
    windowMs,
    limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    ...(key ? { keyGenerator: key } : {}),
    handler: (_req, _res, next) => next(new AppError('rate_limited', `Too many ${what}; wait a few minutes and try again.`)),
  });
}

const ipKey = (req: Request) => ipKeyGenerator(req.ip ?? 'unknown');
const emailOf = (req: Request) => {
  const body = req.body as { email?: unknown } | undefined;
  return typeof body?.email === 'string' ? body.email.trim().toLowerCase() : '';
};

/** The product's rate limits; each app gets its own counters. Counts are per client address unless said otherwise. */
export function rateLimits(): {
  signInPerAccount: RequestHandler;
  signInPerAddress: RequestHandler;
  signUp: RequestHandler;
  inviting: RequestHandler;
  invitationLinks: RequestHandler;
  passwordChanges: RequestHandler;
} {
  return {
    // Password guessing against one account from one address.
    signInPerAccount: limiter(15 * MINUTE, 10, 'sign-in attempts for this account', (req) => `${ipKey(req)}|${emailOf(req)}`),
    signInPerAddress: limiter(15 * MINUTE, 100, 'sign-in attempts from this address'),
    signUp: limiter(60 * MINUTE, 20, 'new accounts from this address'),
    // Keyed by the inviting account, so one owner cannot flood inboxes.
    inviting: limiter(60 * MINUTE, 50, 'invitations sent', (req) => callerOf(req)?.user.id ?? ipKey(req)),
    // Guessing invitation links.
    invitationLinks: limiter(15 * MINUTE, 60, 'invitation link lookups'),
    // Guessing the current password from a session left open; each try also costs a scrypt hash.
    passwordChanges: limiter(15 * MINUTE, 10, 'password change attempts', (req) => callerOf(req)?.user.id ?? ipKey(req)),
  };
}
