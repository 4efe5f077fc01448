import type { ErrorRequestHandler, RequestHandler } from 'express';
import type { Logger } from 'pino';
import { AppError } from './app-error';
import type { ErrorBody } from './app-error';

/** Maps body-parser, multer and other library errors to AppErrors; anything unknown becomes "internal". */
export function toAppError(error: unknown): AppError {
  if (error instanceof AppError) return error;
  const e = error as { type?: string; status?: number; code?: string; message?: string };
  if (e?.type === 'entity.parse.failed') return new AppError('malformed_json', 'The request body is not valid JSON.');
  if (e?.type === 'entity.too.large' || e?.code === 'LIMIT_FILE_SIZE') {
    return new AppError('payload_too_large', 'The request body is larger than this route accepts.');
  }
  if (e?.type === 'encoding.unsupported' || e?.type === 'charset.unsupported') {
    return new AppError('unsupported_media_type', 'The request body uses an encoding this server does not read.');
  }
  if (e?.status === 400) return new AppError('invalid_input', 'The request could not be read.');
  // A check-then-insert that lost a race with another request (or another app instance) on a unique key.
  if ((error as { name?: string })?.name === 'SequelizeUniqueConstraintError') {
    return new AppError('conflict', 'Another request saved the same thing a moment ago; reload and try again.');
  }
  return new AppError('internal', 'Something went wrong on the server. The error has been logged.');
}

/** The one error shape of every failure, for any error; unknown ones are logged and become "internal". */
export function describeError(error: unknown, requestId: string | undefined, log: Logger): { status: number; body: ErrorBody } {
  const appError = toAppError(error);
  if (appError.code === 'internal') log.error({ err: error, requestId }, 'unhandled error');
  return { status: appError.status, body: { error: { code: appError.code, message: appError.message, fields: appError.fields, requestId } } };
}

/** Express error middleware: every failure answers with the same JSON shape, never a stack trace or SQL. */
export function errorHandler(log: Logger): ErrorRequestHandler {
  return (error, req, res, _next) => {
    const { status, body } = describeError(error, (req as { id?: string }).id, log);
    if (res.headersSent) return;
    res.status(status).json(body);
  };
}

/** Final handler for API paths that match no route. */
export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new AppError('not_found', `No API route answers ${req.method} ${req.path}.`));
};
