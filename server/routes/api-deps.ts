import type { Request } from 'express';
import type { Logger } from 'pino';
import type { Sequelize } from 'sequelize';
import type { SessionSettings } from '../auth/session-token';
import type { Config } from '../config';
import type { Models } from '../db/models';
import type { rateLimits } from '../http/rate-limits';
import type { Mailer } from '../mail/mailer';

/** What the account and data routes need. */
export interface ApiDeps {
  config: Config;
  sequelize: Sequelize;
  m: Models;
  log: Logger;
  mailer: Mailer;
  session: SessionSettings;
  limits: ReturnType<typeof rateLimits>;
}

/**
 * Where the web app is reached, for links in e-mails: PUBLIC_URL in production; otherwise the
 * address this request came to, as Auth.js does with trustHost.
 */
export function publicOrigin(req: Request, config: Config): string {
  return config.production ? config.publicUrl : `${req.protocol}://${req.get('host') ?? 'localhost'}`;
}
