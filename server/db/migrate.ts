import { QueryTypes } from 'sequelize';
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
  const applied = await migrator(sequelize).up();
  return applied.map((m) => m.name);
}

/**
 * Applied and pending migration counts, for the health report: one plain read of the migrations
 * table against the list this version ships (umzug's own storage re-syncs its table on every call,
 * which is DDL on a hot path).
 */
export async function migrationState(sequelize: Sequelize): Promise<{ applied: number; pending: number }> {
  const rows = await sequelize.query<{ name: string }>('SELECT name FROM "SequelizeMeta"', { type: QueryTypes.SELECT });
  const applied = new Set(rows.map((r) => r.name));
  return { applied: applied.size, pending: migrations.filter((m) => !applied.has(m.name)).length };
}
