import type { RequestHandler } from 'express';
import { AppError } from './app-error';

/**
 * The API routes that read a query string (each checks it with its shared schema). Matched against
 * the path below /api.
 */
const TAKES_QUERY: ReadonlyArray<{ method: string; path: RegExp }> = [
  { method: 'GET', path: /^\/workspaces\/[^/]+\/scenarios\/?$/ },
  { method: 'GET', path: /^\/admin\/users\/?$/ },
];

/**
 * Refuses a query string on every API route that reads none, naming each parameter, as the routes
 * with a query schema do for unknown ones: a misspelt `?pageSize` or a filter the route does not
 * have would otherwise be ignored without a word, and the caller would trust an answer it did not ask for.
 */
export const refuseUnreadQuery: RequestHandler = (req, _res, next) => {
  const keys = Object.keys(req.query);
  if (keys.length === 0 || TAKES_QUERY.some((r) => r.method === req.method && r.path.test(req.path))) return next();
  next(
    new AppError(
      'invalid_input',
      'This address takes no query parameters.',
      keys.map((key) => ({ path: key, message: 'is not a known field (check its spelling)' })),
    ),
  );
};
