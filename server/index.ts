import { boot } from './boot';
import { buildClientIfNeeded } from './build-client';
import { ConfigError, describeDatabase, readConfig } from './config';
import { checkDatabasePlace } from './db/connection';
import { createLogger } from './logger';

const log = createLogger();

async function start(): Promise<void> {
  const config = readConfig();
  checkDatabasePlace(config);
  if (process.env.SKIP_CLIENT_BUILD !== '1' && (await buildClientIfNeeded(process.cwd()))) log.info('client built');
  const running = await boot(config, log);
  log.info({ port: running.port, database: describeDatabase(config) }, `Photon Parity is serving on http://localhost:${running.port}`);
  for (const signal of ['SIGTERM', 'SIGINT'] as const) {
    process.once(signal, () => {
      log.info({ signal }, 'shutting down');
      running.close().then(
        () => process.exit(0),
        (error: unknown) => {
          log.error({ err: error }, 'shutdown failed');
          process.exit(1);
        },
      );
    });
  }
}

start().catch((error: unknown) => {
  if (error instanceof ConfigError) process.stderr.write(`Photon Parity cannot start: ${error.message}\n`);
  else process.stderr.write(`Photon Parity cannot start: ${error instanceof Error ? error.message : String(error)}\n`);
  process.exit(1);
});
