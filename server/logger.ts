import pino from 'pino';
import type { Logger } from 'pino';

/**
 * The server's structured logger. Secrets never reach the log: these paths are censored wherever
 * a request, a body or a header is logged.
 */
export function createLogger(level = process.env.LOG_LEVEL ?? (process.env.NODE_ENV === 'test' ? 'silent' : 'info')): Logger {
  return pino({
    level,
    redact: {
      paths: [
        'req.headers.cookie',
        'req.headers.authorization',
        'req.headers["x-csrf-token"]',
        'res.headers["set-cookie"]',
        '*.password',
        '*.newPassword',
        '*.currentPassword',
        '*.token',
        '*.secret',
      ],
      censor: '[redacted]',
    },
  });
}
