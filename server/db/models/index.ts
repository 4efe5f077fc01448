import type { Sequelize } from 'sequelize';
import { defineLibrary } from './library';
import { defineMeasurements } from './measurements';
import { defineRecords } from './records';
import { defineSnapshots } from './snapshots';
import { defineUsers } from './users';
import { defineWorkspaces } from './workspaces';

/** Every model of the product, bound to one database. */
export type Models = ReturnType<typeof defineUsers> &
  ReturnType<typeof defineWorkspaces> &
  ReturnType<typeof defineLibrary> &
  ReturnType<typeof defineRecords> &
  ReturnType<typeof defineSnapshots> &
  ReturnType<typeof defineMeasurements> & { sequelize: Sequelize };

const cache = new WeakMap<Sequelize, Models>();

/**
 * The models of one Sequelize instance, defined once. Tables come from the migrations only;
 * nothing here calls sync().
 */
export function models(sequelize: Sequelize): Models {
  let m = cache.get(sequelize);
  if (!m) {
    m = { ...defineUsers(sequelize), ...defineWorkspaces(sequelize), ...defineLibrary(sequelize), ...defineRecords(sequelize), ...defineSnapshots(sequelize), ...defineMeasurements(sequelize), sequelize };
    cache.set(sequelize, m);
  }
  return m;
}
