import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { boot } from '../../server/boot';
import type { Running } from '../../server/boot';
import { readConfig } from '../../server/config';
import { DEMO_ACCOUNTS } from '../../server/db/demo-accounts';
import type { DemoAccount } from '../../server/db/demo-accounts';
import { models } from '../../server/db/models';
import type { Models } from '../../server/db/models';
import { createLogger } from '../../server/logger';
import { ApiClient } from './api-client';
import { MailReader } from './caught-mail';
import { createTestDatabase, dropTestDatabase, onPostgres } from './test-database';

/** Who the demo's people are, by their part. */
export type DemoPart = 'owner' | 'editor' | 'viewer' | 'admin';

/** The demo account playing a part (see docs/demo-accounts.md). */
export function demoAccount(part: DemoPart): DemoAccount {
  const found = DEMO_ACCOUNTS.find((a) => (part === 'admin' ? a.isSiteAdmin : a.role === part));
  if (!found) throw new Error(`no demo account is the ${part}`);
  return found;
}

/**
 * A real server on a random port over a real SQLite file in a temp folder (or, with
 * TEST_DATABASE_URL, a fresh PostgreSQL database of its own), with the real fake SMTP server.
 */
export interface TestApp {
  base: string;
  dir: string;
  /** The SQLite file; unused on PostgreSQL. */
  databasePath: string;
  /** The settings that point another server at this app's database (DATABASE_PATH or DATABASE_URL). */
  databaseEnv: Record<string, string>;
  running: Running;
  m: Models;
  mail: MailReader;
  /** A new browser-like client with no cookies. */
  client(): ApiClient;
  /** A client signed in as a demo account through Auth.js, with its /api CSRF token. */
  signInAs(part: DemoPart): Promise<ApiClient>;
  /** A client signed in as a new account made through POST /api/account/sign-up. */
  signUpAndIn(email: string, name?: string, password?: string): Promise<ApiClient>;
  /** Stops and boots again on the same database file (a new port); clients keep their cookies. */
  restart(...clients: ApiClient[]): Promise<void>;
  close(): Promise<void>;
}

/** Password used by accounts that tests make for themselves. */
export const TEST_PASSWORD = 'a-test-password-of-length';

/**
 * Boots the server as `npm start` would (migrations, demo, fake mail), but on 127.0.0.1:0 and a
 * temp database. `env` adds or overrides settings.
 */
export async function startTestApp(env: Record<string, string> = {}): Promise<TestApp> {
  const dir = mkdtempSync(join(tmpdir(), 'pp-api-'));
  const databasePath = join(dir, 'test.sqlite');
  const pg = onPostgres ? await createTestDatabase() : undefined;
  const databaseEnv: Record<string, string> = pg ? { DATABASE_URL: pg.url } : { DATABASE_PATH: databasePath };
  const config = () => readConfig({ NODE_ENV: 'test', PORT: '0', HOST: '127.0.0.1', DATABASE_PATH: databasePath, ...databaseEnv, ...env });
  const log = createLogger(process.env.TEST_LOG_LEVEL ?? 'silent');
  let running: Running;
  try {
    running = await boot(config(), log);
  } catch (error) {
    if (pg) await dropTestDatabase(pg.name);
    throw error;
  }
  const app: TestApp = {
    base: `http://127.0.0.1:${running.port}`,
    dir,
    databasePath,
    databaseEnv,
    running,
    m: models(running.sequelize),
    mail: new MailReader(running.sequelize),
    client: () => new ApiClient(app.base),
    async signInAs(part) {
      const account = demoAccount(part);
      const c = app.client();
      const reply = await c.signIn(account.email, account.password);
      if (reply.status !== 200 || reply.body.url.includes('error=')) throw new Error(`sign-in as ${part} failed: ${reply.status} ${reply.text}`);
      return c;
    },
    async signUpAndIn(email, name = 'Test Person', password = TEST_PASSWORD) {
      const c = app.client();
      const made = await c.post('/api/account/sign-up', { email, name, password });
      if (made.status !== 201) throw new Error(`sign-up failed: ${made.status} ${made.text}`);
      const reply = await c.signIn(email, password);
      if (reply.body.url.includes('error=')) throw new Error(`sign-in after sign-up failed: ${reply.text}`);
      return c;
    },
    async restart(...clients) {
      await running.close();
      running = await boot(config(), log);
      app.running = running;
      app.base = `http://127.0.0.1:${running.port}`;
      app.m = models(running.sequelize);
      app.mail = new MailReader(running.sequelize);
      for (const c of clients) c.base = app.base;
    },
    async close() {
      await running.close();
      if (pg) await dropTestDatabase(pg.name);
    },
  };
  return app;
}
