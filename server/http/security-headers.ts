import type { IncomingMessage, ServerResponse } from 'node:http';
import helmet from 'helmet';
import type { RequestHandler } from 'express';

/**
 * The security headers of every response (helmet), with a content security policy that allows
 * scripts only from this origin: no inline scripts, no eval.
 */
export function securityHeaders({ production }: { production: boolean }): RequestHandler {
  return helmet({
    contentSecurityPolicy: {
      directives: {
        defaultSrc: ["'self'"],
        scriptSrc: ["'self'"],
        workerSrc: ["'self'", 'blob:'],
        // Chart libraries set inline style attributes; scripts stay strictly same-origin.
        styleSrc: ["'self'", "'unsafe-inline'"],
        imgSrc: ["'self'", 'data:', 'blob:'],
        fontSrc: ["'self'", 'data:'],
        connectSrc: ["'self'"],
        objectSrc: ["'none'"],
        frameAncestors: ["'none'"],
        upgradeInsecureRequests: production ? [] : null,
      },
    },
  });
}

/**
 * The headers a middleware sets when it depends on nothing in the request (as helmet's do),
 * recorded once, so a route answered outside Express sends exactly the same ones.
 */
export function recordHeaders(middleware: RequestHandler): Array<[string, string]> {
  const headers = new Map<string, string>();
  const res = {
    setHeader(name: string, value: string | number | readonly string[]) {
      headers.set(name, Array.isArray(value) ? value.join(', ') : String(value));
    },
    removeHeader(name: string) {
      headers.delete(name);
    },
    getHeader(name: string) {
      return headers.get(name);
    },
  };
  let called = false;
  const req = { headers: {}, method: 'GET', url: '/' } as unknown as IncomingMessage;
  middleware(req as never, res as unknown as ServerResponse as never, () => void (called = true));
  if (!called) throw new Error('the security header middleware did not finish synchronously');
  return [...headers];
}
