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

/** Applied and pending migration counts, for the health report. */
export async function migrationState(sequelize: Sequelize): Promise<{ applied: number; pending: number }> {
  const m = migrator(sequelize);
  const [applied, pending] = await Promise.all([m.executed(), m.pending()]);
  return { applied: applied.length, pending: pending.length };
}
