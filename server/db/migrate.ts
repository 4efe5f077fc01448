import { readRows } from './direct-read';
import type { QueryInterface, Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';
import { migrations } from './migrations';

/** Context every migration receives. */
export interface MigrationContext {
  queryInterface: QueryInterface;
  sequelize: Sequelize;
}

/** The product's migrator: the listed migrations, recorded in the SequelizeMeta table. */
export function migrator(sequelize: Sequelize): Umzug<MigrationContext> {
  return new Umzug<MigrationContext>({
    migrations: migrations.map((m) => ({ name: m.name, up: m.up, down: m.down })),
    context: { queryInterface: sequelize.getQueryInterface(), sequelize },
    storage: new SequelizeStorage({ sequelize }),
    logger: undefined,
  });
}

/** Applies every pending migration; returns the names applied. */
export async function migrateUp(sequelize: Sequelize): Promise<string[]> {
  const applied = await oneMigratorAtATime(sequelize, () => migrator(sequelize).up());
  return applied.map((m) => m.name);
}

/** Any fixed number names the lock; this one spells "PP" and a version in hex. */
const MIGRATION_LOCK = 0x5050_0001;

interface PgClient {
  query(sql: string): Promise<unknown>;
}

/**
 * On PostgreSQL, several app instances may start at once against one database: a session-level
 * advisory lock, held on a connection of its own, lets one migrate while the others wait and then
 * find nothing pending (PostgreSQL documentation, "Advisory Locks"). SQLite has one writer anyway.
 */
async function oneMigratorAtATime<T>(sequelize: Sequelize, run: () => Promise<T>): Promise<T> {
  if (sequelize.getDialect() !== 'postgres') return run();
  const manager = sequelize.connectionManager as unknown as { getConnection(o?: object): Promise<PgClient>; releaseConnection(c: PgClient): Promise<void> };
  const holder = await manager.getConnection();
  try {
    await holder.query(`SELECT pg_advisory_lock(${MIGRATION_LOCK})`);
    try {
      return await run();
    } finally {
      await holder.query(`SELECT pg_advisory_unlock(${MIGRATION_LOCK})`);
    }
  } finally {
    await manager.releaseConnection(holder);
  }
}

/**
 * Applied and pending migration counts, for the health report: one plain read of the migrations
 * table against the list this version ships (umzug's own storage re-syncs its table on every call,
 * which is DDL on a hot path).
 */
export async function migrationState(sequelize: Sequelize): Promise<{ applied: number; pending: number }> {
  const rows = await readRows<{ name: string }>(sequelize, 'SELECT name FROM "SequelizeMeta"', []);
  const applied = new Set(rows.map((r) => r.name));
  return { applied: applied.size, pending: migrations.filter((m) => !applied.has(m.name)).length };
}
