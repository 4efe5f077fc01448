import type { Server } from 'node:http';
import { join } from 'node:path';
import type { Logger } from 'pino';
import type { Sequelize } from 'sequelize';
import { createApp } from './app';
import type { Config } from './config';
import { openDatabase } from './db/connection';
import { loadDemoOnce } from './db/demo';
import { demoSteps } from './db/demo-steps';
import { migrateUp } from './db/migrate';
import { loadExamples } from './examples';

/** A running server and the way to stop it cleanly. */
export interface Running {
  server: Server;
  sequelize: Sequelize;
  port: number;
  close(): Promise<void>;
}

/** Opens and migrates the database, loads the demo once, and listens. Used by index.ts and by tests. */
export async function boot(config: Config, log: Logger, root = process.cwd()): Promise<Running> {
  const sequelize = await openDatabase(config.databasePath);
  const applied = await migrateUp(sequelize);
  if (applied.length) log.info({ applied }, 'migrations applied');
  const examples = loadExamples(join(root, 'scenarios'));
  if (config.loadDemo && (await loadDemoOnce(sequelize, demoSteps({ config, examples })))) log.info('demo data loaded');

  const app = createApp({ config, sequelize, log, examples, clientDir: join(root, 'dist') });
  const server = app.listen(config.port, config.host);
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
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await sequelize.close();
    })());
  return { server, sequelize, port, close };
}
