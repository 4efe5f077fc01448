import { existsSync } from 'node:fs';
import { join } from 'node:path';
import express from 'express';
import type { Logger } from 'pino';
import type { Sequelize } from 'sequelize';
import type { Config } from './config';
import type { Example } from './examples';
import { apiNotFound, errorHandler } from './http/error-handler';
import { frontDoor } from './http/front-door';
import type { DrainableListener } from './http/front-door';
import { requestIds } from './http/request-id';
import { recordHeaders, securityHeaders } from './http/security-headers';
import { rateLimits } from './http/rate-limits';
import { refuseUnreadQuery } from './http/query-guard';
import { createMailer } from './mail/mailer';
import type { Mailer } from './mail/mailer';
import { models } from './db/models';
import { dataApiRouter } from './routes/api';
import { authRouter } from './routes/auth';
import { examplesRouter } from './routes/examples';
import { healthRouter } from './routes/health';
import { snapshotDataRoute } from './routes/snapshot-data';
import { snapshotPageRouter } from './routes/snapshots-page';

/** Everything the app needs from outside; built by server/index.ts or by a test. */
export interface AppDeps {
  config: Config;
  sequelize: Sequelize;
  log: Logger;
  examples: Example[];
  /** Folder of the built client; when it holds no index.html only the API is served. */
  clientDir: string;
  /** How mail leaves (boot passes one for the local fake server or SMTP_URL); defaults to SMTP_URL. */
  mailer?: Mailer;
}

/** Builds the Express app without listening, so tests can start it on any port. */
export function createApp(deps: AppDeps): express.Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 1);
  app.use(requestIds(deps.log));
  app.use(securityHeaders(deps.config));
  const m = models(deps.sequelize);
  app.use(snapshotDataRoute(m));
  app.use('/api', express.json({ limit: '256kb' }));
  app.use('/api', refuseUnreadQuery);

  const api = {
    config: deps.config,
    sequelize: deps.sequelize,
    m,
    log: deps.log,
    mailer: deps.mailer ?? createMailer(deps.config.smtpUrl ?? 'smtp://127.0.0.1:25'),
    session: { secret: deps.config.authSecret, secureCookies: deps.config.publicUrl.startsWith('https://') },
    limits: rateLimits(),
  };
  app.use('/auth', authRouter(api));

  app.use('/api/health', healthRouter(deps));
  app.use('/api/examples', examplesRouter(deps.examples));
  app.use('/api', dataApiRouter(api));
  app.use('/api', apiNotFound);
  app.use('/s', snapshotPageRouter(api.m, deps.clientDir));

  serveClient(app, deps.clientDir);
  app.use(errorHandler(deps.log));
  return app;
}

/**
 * The app as the server's request listener: createApp behind the front door that answers shared
 * snapshot reads directly (server/http/front-door.ts).
 */
export function createRequestListener(deps: AppDeps): DrainableListener {
  return frontDoor(createApp(deps), { m: models(deps.sequelize), log: deps.log, headers: recordHeaders(securityHeaders(deps.config)) });
}

function serveClient(app: express.Express, clientDir: string): void {
  const index = join(clientDir, 'index.html');
  app.use('/assets', express.static(join(clientDir, 'assets'), { immutable: true, maxAge: '1y', fallthrough: false }));
  app.use(express.static(clientDir, { index: false }));
  app.get('/{*splat}', (_req, res, next) => {
    if (!existsSync(index)) return next();
    res.sendFile(index);
  });
}
