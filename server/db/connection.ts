import { accessSync, constants, mkdirSync } from 'node:fs';
import { dirname } from 'node:path';
import { Sequelize } from 'sequelize';
import { ConfigError } from '../config';
import type { Config } from '../config';
import { openPostgres } from './postgres';
import { serialiseTransactions } from './write-queue';

/**
 * PRAGMAs set on every SQLite connection. WAL lets readers run while one writer commits;
 * synchronous=FULL makes each commit durable before it is acknowledged, so an answered save
 * survives a killed process or a power cut (SQLite documentation, "Write-Ahead Logging" and
 * "PRAGMA synchronous"); busy_timeout waits for a lock instead of failing at once.
 */
export const SQLITE_PRAGMAS = [
  'PRAGMA journal_mode = WAL',
  'PRAGMA synchronous = FULL',
  'PRAGMA busy_timeout = 10000',
  'PRAGMA foreign_keys = ON',
];

interface SqliteConnection {
  exec(sql: string, cb: (err: Error | null) => void): void;
}

/** Opens the database the configuration names: PostgreSQL when DATABASE_URL is set, else the SQLite file. */
export function openConfiguredDatabase(config: Pick<Config, 'databasePath' | 'databaseUrl'>): Promise<Sequelize> {
  return config.databaseUrl ? openPostgres(config.databaseUrl) : openDatabase(config.databasePath);
}

const unwritable = (storage: string, error: unknown) =>
  new ConfigError(
    `the database file ${storage} cannot be created or written (${(error as NodeJS.ErrnoException).code ?? (error as Error).message}); set DATABASE_PATH to a writable place`,
  );

/**
 * Creates the SQLite file's folder and checks that it can be written, so that a bad DATABASE_PATH
 * stops the start at once, before anything slow (such as building the client) runs.
 */
export function checkDatabasePlace(config: Pick<Config, 'databasePath' | 'databaseUrl'>): void {
  const storage = config.databasePath;
  if (config.databaseUrl || storage === ':memory:') return;
  try {
    mkdirSync(dirname(storage), { recursive: true });
    accessSync(dirname(storage), constants.W_OK);
  } catch (error) {
    throw unwritable(storage, error);
  }
}

/** Opens the embedded SQLite database (creating its folder) with the product's PRAGMAs. */
export async function openDatabase(storage: string): Promise<Sequelize> {
  checkDatabasePlace({ databasePath: storage, databaseUrl: undefined });
  try {
    const sequelize = new Sequelize({ dialect: 'sqlite', storage, logging: false });
    configureEachConnection(sequelize);
    closeOneAtATime(sequelize);
    serialiseTransactions(sequelize);
    await sequelize.authenticate();
    return sequelize;
  } catch (error) {
    throw unwritable(storage, error);
  }
}

/**
 * Sequelize's SQLite dialect opens one connection per transaction and runs no connect hooks, so the
 * PRAGMAs are applied by wrapping its connection manager: every connection is configured once,
 * before its first use.
 */
function configureEachConnection(sequelize: Sequelize): void {
  const manager = sequelize.connectionManager as unknown as { getConnection(options?: unknown): Promise<SqliteConnection> };
  const original = manager.getConnection.bind(manager);
  const configured = new WeakSet<SqliteConnection>();
  manager.getConnection = async (options?: unknown) => {
    const connection = await original(options);
    if (!configured.has(connection)) {
      configured.add(connection);
      await new Promise<void>((resolve, reject) =>
        connection.exec(`${SQLITE_PRAGMAS.join(';\n')};`, (err) => (err ? reject(err) : resolve())),
      );
    }
    return connection;
  };
}

interface OpenConnections {
  connections: Record<string, { close(cb: (err: Error | null) => void): void }>;
}

/**
 * Closes the SQLite connections one after another before Sequelize's own close. The last
 * connection to close checkpoints the write-ahead log and deletes it (SQLite documentation,
 * "Write-Ahead Logging"). Sequelize closes them all at once, each on its own libuv thread, and
 * then each can still see the others open, so none is the last one and the log stays behind.
 */
function closeOneAtATime(sequelize: Sequelize): void {
  const manager = sequelize.connectionManager as unknown as OpenConnections;
  const close = sequelize.close.bind(sequelize);
  sequelize.close = async () => {
    for (const [name, connection] of Object.entries(manager.connections)) {
      delete manager.connections[name];
      await new Promise<void>((resolve, reject) => connection.close((err) => (err ? reject(err) : resolve())));
    }
    return close();
  };
}

/** What /api/health reports about the database. */
export interface DatabaseState {
  ok: boolean;
  dialect: string;
  journalMode?: string;
  migrations: { applied: number; pending: number };
}
