import type { Request, RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import { AppError } from '../http/app-error';
import { callerOf } from '../http/context';

const MINUTE = 60_000;

/** Share e-mails per account (or address) and hour; each may go to up to 10 people. */
export const SNAPSHOT_MAILS_PER_HOUR = 20;

const key = (req: Request) => callerOf(req)?.user.id ?? ipKeyGenerator(req.ip ?? 'unknown');

/** Rate limit for sending share links by e-mail; each app gets its own counter. */
export function snapshotMailLimit(): RequestHandler {
  return rateLimit({
    windowMs: 60 * MINUTE,
    limit: SNAPSHOT_MAILS_PER_HOUR,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: key,
    handler: (_req, _res, next) => next(new AppError('rate_limited', 'Too many share e-mails sent; wait an hour and try again.')),
  });
}
