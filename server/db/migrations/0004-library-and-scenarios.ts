import { DataTypes } from 'sequelize';
import type { MigrationFn } from 'umzug';
import type { MigrationContext } from '../migrate';
import { allowUpdates, refuseUpdates } from '../refuse-updates';

const userRef = { type: DataTypes.STRING(64), allowNull: false, references: { model: 'users', key: 'id' } };
const workspaceRef = {
  type: DataTypes.STRING(64),
  allowNull: false,
  references: { model: 'workspaces', key: 'id' },
  onDelete: 'CASCADE',
};
const money = (allowNull: boolean) => ({ type: DataTypes.STRING(40), allowNull });
const real = (allowNull: boolean) => ({ type: DataTypes.DOUBLE, allowNull });

/**
 * The fixture library of each workspace (money as decimal text), scenarios (the scenario file as
 * JSON text) and their append-only revisions. A trigger refuses any UPDATE of a revision.
 */
export const up: MigrationFn<MigrationContext> = async ({ context: { queryInterface, sequelize } }) => {
  await queryInterface.createTable('fixtures', {
    id: { type: DataTypes.STRING(64), primaryKey: true },
    workspace_id: workspaceRef,
    key: { type: DataTypes.STRING(40), allowNull: false },
    label: { type: DataTypes.STRING(120), allowNull: false },
    technology: { type: DataTypes.STRING(20), allowNull: false },
    wall_watts: real(false),
    photon_efficacy: real(true),
    ppf: real(true),
    owned: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    fixture_price: money(true),
    install_price: money(false),
    rebate: money(false),
    lamp_price: money(true),
    lamp_replace_every_hours: real(true),
    lamp_output_at_replacement_pct: real(true),
    output_at_horizon_pct: real(false),
    blue_pct: real(true),
    green_pct: real(true),
    red_pct: real(true),
    far_red_pct: real(true),
    cct_k: real(true),
    data_source: { type: DataTypes.STRING(20), allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    updated_by: userRef,
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('fixtures', ['workspace_id', 'key'], { unique: true });

  await queryInterface.createTable('scenarios', {
    id: { type: DataTypes.STRING(64), primaryKey: true },
    workspace_id: workspaceRef,
    title: { type: DataTypes.STRING(200), allowNull: false },
    document: { type: DataTypes.TEXT, allowNull: false },
    revision: { type: DataTypes.INTEGER, allowNull: false },
    updated_by: userRef,
    deleted_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('scenarios', ['workspace_id', 'updated_at']);

  await queryInterface.createTable('scenario_revisions', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    scenario_id: { type: DataTypes.STRING(64), allowNull: false, references: { model: 'scenarios', key: 'id' }, onDelete: 'CASCADE' },
    revision: { type: DataTypes.INTEGER, allowNull: false },
    title: { type: DataTypes.STRING(200), allowNull: false },
    document: { type: DataTypes.TEXT, allowNull: false },
    action: { type: DataTypes.STRING(20), allowNull: false },
    changed_paths: { type: DataTypes.TEXT, allowNull: false },
    from_revision: { type: DataTypes.INTEGER, allowNull: true },
    created_by: userRef,
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('scenario_revisions', ['scenario_id', 'revision'], { unique: true });
  await refuseUpdates(sequelize, 'scenario_revisions', 'scenario_revisions_append_only', 'scenario revisions are append-only');
};

export const down: MigrationFn<MigrationContext> = async ({ context: { queryInterface, sequelize } }) => {
  await allowUpdates(sequelize, 'scenario_revisions', 'scenario_revisions_append_only');
  for (const table of ['scenario_revisions', 'scenarios', 'fixtures']) await queryInterface.dropTable(table);
};
