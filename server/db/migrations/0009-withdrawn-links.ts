import { DataTypes } from 'sequelize';
import type { MigrationFn } from 'umzug';
import type { MigrationContext } from '../migrate';

/**
 * Share ids whose snapshot went with its workspace (snapshots and links are deleted with it, by
 * ON DELETE CASCADE). Only the SHA-256 of the id is kept, nothing of the content, so that such a
 * link answers 410 "withdrawn" as a revoked one does, not 404 as an id never issued.
 */
export const up: MigrationFn<MigrationContext> = async ({ context: { queryInterface } }) => {
  await queryInterface.createTable('withdrawn_links', {
    id_hash: { type: DataTypes.STRING(64), primaryKey: true },
    withdrawn_at: { type: DataTypes.DATE, allowNull: false },
  });
};

export const down: MigrationFn<MigrationContext> = async ({ context: { queryInterface } }) => {
  await queryInterface.dropTable('withdrawn_links');
};
