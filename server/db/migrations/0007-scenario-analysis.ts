import { DataTypes } from 'sequelize';
import type { MigrationFn } from 'umzug';
import type { MigrationContext } from '../migrate';

/**
 * Sensitivity settings kept with a scenario (ranges and the uncertainty seed). A table of its own,
 * so saving them neither bumps the scenario's revision nor touches its append-only history.
 */
export const up: MigrationFn<MigrationContext> = async ({ context: { queryInterface } }) => {
  await queryInterface.createTable('scenario_analysis', {
    scenario_id: { type: DataTypes.STRING(64), primaryKey: true, references: { model: 'scenarios', key: 'id' }, onDelete: 'CASCADE' },
    settings: { type: DataTypes.TEXT, allowNull: false },
    updated_by: { type: DataTypes.STRING(64), allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
};

export const down: MigrationFn<MigrationContext> = async ({ context: { queryInterface } }) => {
  await queryInterface.dropTable('scenario_analysis');
};
