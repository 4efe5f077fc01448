import { DataTypes } from 'sequelize';
import type { MigrationFn } from 'umzug';
import type { MigrationContext } from '../migrate';

/** Key–value facts about this database itself, such as which demo data set it holds. */
export const up: MigrationFn<MigrationContext> = async ({ context: { queryInterface } }) => {
  await queryInterface.createTable('app_meta', {
    key: { type: DataTypes.STRING(80), primaryKey: true },
    value: { type: DataTypes.TEXT, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
};

export const down: MigrationFn<MigrationContext> = async ({ context: { queryInterface } }) => {
  await queryInterface.dropTable('app_meta');
};
