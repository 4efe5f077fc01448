import { createServer } from 'node:http';
import type { Server } from 'node:http';
import { join } from 'node:path';
import type { Logger } from 'pino';
import type { Sequelize } from 'sequelize';
import { createRequestListener } from './app';
import { ConfigError } from './config';
import type { Config } from './config';
import { publishedDemoPasswordsInUse } from './db/demo-accounts';
import { openConfiguredDatabase } from './db/connection';
import { loadDemoOnce } from './db/demo';
import { demoSteps } from './db/demo-steps';
import { migrateUp } from './db/migrate';
import { loadExamples } from './examples';
import { startFakeSmtp } from './mail/fake-smtp-server';
import { createMailer } from './mail/mailer';

/** A running server and the way to stop it cleanly. */
export interface Running {
  server: Server;
  sequelize: Sequelize;
  port: number;
  /** Where mail goes: SMTP_URL, or the local fake server that boot started. */
  smtpUrl: string;
  close(): Promise<void>;
}

/** Opens and migrates the database, loads the demo once, and listens. Used by index.ts and by tests. */
export async function boot(config: Config, log: Logger, root = process.cwd()): Promise<Running> {
  const sequelize = await openConfiguredDatabase(config);
  const applied = await migrateUp(sequelize);
  if (applied.length) log.info({ applied }, 'migrations applied');
  const examples = loadExamples(join(root, 'scenarios'));
  if (config.loadDemo && (await loadDemoOnce(sequelize, demoSteps({ config, examples })))) log.info('demo data loaded');
  if (config.production) {
    const published = await publishedDemoPasswordsInUse(sequelize);
    if (published.length) {
      await sequelize.close();
      throw new ConfigError(`demo accounts still have their published passwords (${published.join(', ')}); change them or start with LOAD_DEMO=0 on a fresh database`);
    }
  }

  // Without SMTP_URL, mail goes to the local fake server, which keeps it in the database.
  const fakeSmtp = config.smtpUrl ? undefined : await startFakeSmtp(sequelize, log);
  if (fakeSmtp && config.production) log.warn('SMTP_URL is not set: e-mail is caught by the local fake server and never delivered');
  const mailer = createMailer(config.smtpUrl ?? fakeSmtp?.url ?? '');
  const listener = createRequestListener({ config, sequelize, log, examples, clientDir: join(root, 'dist'), mailer });
  const server = createServer(listener);
  server.listen(config.port, config.host);
  await new Promise<void>((resolve, reject) => {
    server.once('listening', resolve);
    server.once('error', reject);
  });
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : config.port;

  let closing: Promise<void> | undefined;
  const close = () =>
    (closing ??= (async () => {
      // Finish requests already in flight, refuse new ones, then close the database.
      listener.drain();
      await new Promise<void>((resolve) => server.close(() => resolve()));
      mailer.close();
      await fakeSmtp?.close();
      await sequelize.close();
    })());
  return { server, sequelize, port, smtpUrl: mailer.smtpUrl, close };
}
