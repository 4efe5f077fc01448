import type { IncomingMessage, ServerResponse } from 'node:http';
import type { RequestHandler } from 'express';
import { randomUUID } from 'node:crypto';
import type { Logger } from 'pino';

/** The path without its query (sign-in link tokens) and with invitation secrets masked: links are bearer credentials. */
export function loggedPath(url: string): string {
  return (url.split('?')[0] ?? '').replace(/^(\/api\/invitations\/)[^/]+/, '$1[redacted]');
}

/**
 * Gives a request an id (echoed in the X-Request-Id header, unless the caller writes it itself, and
 * in error bodies) and logs one line when it finishes, with method, path, status and duration;
 * never headers or bodies.
 */
export function trackRequest(log: Logger, req: IncomingMessage, res: ServerResponse, url: string, { setHeader = true } = {}): string {
  const id = randomUUID();
  (req as { id?: string }).id = id;
  if (setHeader) res.setHeader('X-Request-Id', id);
  if (!log.isLevelEnabled('info')) return id;
  const start = process.hrtime.bigint();
  res.on('finish', () => {
    const ms = Number(process.hrtime.bigint() - start) / 1e6;
    log.info({ requestId: id, method: req.method, path: loggedPath(url), status: res.statusCode, ms: Math.round(ms * 10) / 10 }, 'request');
  });
  return id;
}

/** Express middleware form of trackRequest. */
export function requestIds(log: Logger): RequestHandler {
  return (req, res, next) => {
    trackRequest(log, req, res, req.originalUrl);
    next();
  };
}
