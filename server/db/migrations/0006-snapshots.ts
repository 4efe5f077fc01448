import { DataTypes } from 'sequelize';
import type { MigrationFn } from 'umzug';
import type { MigrationContext } from '../migrate';
import { allowUpdates, refuseUpdates } from '../refuse-updates';

const text = (allowNull = false) => ({ type: DataTypes.TEXT, allowNull });

/**
 * Shared snapshots. `snapshots` holds an immutable copy of a scenario at one moment: the canonical
 * input JSON, the fixture provenance and measurement summaries it used, notes, the server-computed
 * result, the engine version and the input hash. A trigger refuses every UPDATE of it. What may
 * change about a share link (revocation, expiry) lives in `snapshot_links`; which scenarios were
 * forked from a snapshot lives in `snapshot_forks`.
 */
export const up: MigrationFn<MigrationContext> = async ({ context: { queryInterface, sequelize } }) => {
  await queryInterface.createTable('snapshots', {
    id: { type: DataTypes.STRING(21), primaryKey: true },
    workspace_id: { type: DataTypes.STRING(64), allowNull: false, references: { model: 'workspaces', key: 'id' }, onDelete: 'CASCADE' },
    // Plain ids, not references: deleting the scenario or the author leaves the snapshot as it was.
    scenario_id: { type: DataTypes.STRING(64), allowNull: false },
    scenario_revision: { type: DataTypes.INTEGER, allowNull: false },
    title: { type: DataTypes.STRING(200), allowNull: false },
    canonical_input: text(),
    input_hash: { type: DataTypes.STRING(64), allowNull: false },
    engine_version: { type: DataTypes.STRING(20), allowNull: false },
    result: text(),
    fixtures: text(),
    measurements: text(),
    notes: text(),
    created_by: { type: DataTypes.STRING(64), allowNull: false },
    created_by_name: { type: DataTypes.STRING(80), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('snapshots', ['workspace_id', 'created_at']);
  await queryInterface.addIndex('snapshots', ['scenario_id']);
  await refuseUpdates(sequelize, 'snapshots', 'snapshots_immutable', 'snapshots are immutable');

  await queryInterface.createTable('snapshot_links', {
    snapshot_id: { type: DataTypes.STRING(21), primaryKey: true, references: { model: 'snapshots', key: 'id' }, onDelete: 'CASCADE' },
    // SHA-256 of the id: public lookups go through this, so index timing says nothing about the id.
    id_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: true },
    revoked_at: { type: DataTypes.DATE, allowNull: true },
    revoked_by: { type: DataTypes.STRING(64), allowNull: true },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });

  await queryInterface.createTable('snapshot_forks', {
    scenario_id: { type: DataTypes.STRING(64), primaryKey: true, references: { model: 'scenarios', key: 'id' }, onDelete: 'CASCADE' },
    snapshot_id: { type: DataTypes.STRING(21), allowNull: false },
    forked_by: { type: DataTypes.STRING(64), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
};

export const down: MigrationFn<MigrationContext> = async ({ context: { queryInterface, sequelize } }) => {
  await allowUpdates(sequelize, 'snapshots', 'snapshots_immutable');
  for (const table of ['snapshot_forks', 'snapshot_links', 'snapshots']) await queryInterface.dropTable(table);
};
