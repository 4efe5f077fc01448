import type { IncomingMessage } from 'node:http';
import type { Sequelize } from 'sequelize';
import { createApp } from '../../server/app';
import { readConfig } from '../../server/config';
import { createLogger } from '../../server/logger';
import { createMailer } from '../../server/mail/mailer';
import { snapshotDataId } from '../../server/routes/snapshot-data';

/** A route as "METHOD /path/:param", the way Express was told it (e.g. "PATCH /api/workspaces/:wid"). */
export type RouteKey = `${'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE'} /${string}`;

/** What a router-stack layer exposes in Express 5 (package `router` 2.x: lib/layer.js and lib/route.js). */
interface Layer {
  rawPath?: string | string[];
  route?: { path: string | string[]; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
}

const join = (prefix: string, path: string) => `${prefix}${path === '/' ? '' : path}` || '/';

function walk(stack: Layer[], prefix: string, out: Set<RouteKey>): void {
  for (const layer of stack) {
    if (layer.route) {
      const paths = Array.isArray(layer.route.path) ? layer.route.path : [layer.route.path];
      for (const method of Object.keys(layer.route.methods)) {
        if (method === '_all') continue;
        for (const p of paths) out.add(`${method.toUpperCase()} ${join(prefix, p)}` as RouteKey);
      }
    } else if (layer.handle?.stack) {
      const mount = typeof layer.rawPath === 'string' ? layer.rawPath : '/';
      walk(layer.handle.stack, join(prefix, mount), out);
    }
  }
}

/**
 * Routes answered before the Express router sees the request (server/http/front-door.ts and
 * server/routes/snapshot-data.ts): they are middleware, not router layers, so the walk cannot
 * see them. Each is checked against the code's own matcher by `answeredOutsideRouter`.
 */
export const OUTSIDE_ROUTER: RouteKey[] = ['GET /api/snapshots/:id'];

/** True when the shared-snapshot read middleware takes GET on this path (its own matcher decides). */
export function answeredOutsideRouter(path: string): boolean {
  return snapshotDataId({ method: 'GET', url: path } as IncomingMessage) !== undefined;
}

/**
 * Routes the walk finds that are not API routes: the single-page web app's files for any other
 * GET path (server/app.ts, serveClient). They answer the same for everyone.
 */
export const NOT_API: RouteKey[] = ['GET /{*splat}'];

/** Every route of the app that createApp builds (server/app.ts), by walking Express's router stack. */
export function appRoutes(sequelize: Sequelize): RouteKey[] {
  const mailer = createMailer('smtp://127.0.0.1:9');
  try {
    const app = createApp({
      config: readConfig({ NODE_ENV: 'test', PORT: '0', HOST: '127.0.0.1' }),
      sequelize,
      log: createLogger('silent'),
      examples: [],
      clientDir: 'dist',
      mailer,
    });
    const out = new Set<RouteKey>(OUTSIDE_ROUTER);
    walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '', out);
    return [...out].sort();
  } finally {
    mailer.close();
  }
}

/** The request path of a route with each `:param` replaced by its value (a missing one stays visible). */
export function fillRoute(route: RouteKey, params: Record<string, string>): string {
  return route.slice(route.indexOf(' ') + 1).replace(/:(\w+)/g, (_, name: string) => params[name] ?? `missing-${name}`);
}

/** The routes that write (every method but GET), for the fuzz tests. */
export function writeRoutes(routes: RouteKey[]): RouteKey[] {
  return routes.filter((r) => !r.startsWith('GET '));
}
