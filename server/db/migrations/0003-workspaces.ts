import { DataTypes } from 'sequelize';
import type { MigrationFn } from 'umzug';
import type { MigrationContext } from '../migrate';

const userRef = { type: DataTypes.STRING(64), allowNull: false, references: { model: 'users', key: 'id' } };
const workspaceRef = {
  type: DataTypes.STRING(64),
  allowNull: false,
  references: { model: 'workspaces', key: 'id' },
  onDelete: 'CASCADE',
};

/** Workspaces, who belongs to each with which role, and the invitations to join one. */
export const up: MigrationFn<MigrationContext> = async ({ context: { queryInterface } }) => {
  await queryInterface.createTable('workspaces', {
    id: { type: DataTypes.STRING(64), primaryKey: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    currency: { type: DataTypes.STRING(3), allowNull: false },
    unit_system: { type: DataTypes.STRING(10), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });

  await queryInterface.createTable('memberships', {
    workspace_id: { ...workspaceRef, primaryKey: true },
    user_id: { ...userRef, primaryKey: true, onDelete: 'CASCADE' },
    role: { type: DataTypes.STRING(10), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('memberships', ['user_id']);

  await queryInterface.createTable('invitations', {
    id: { type: DataTypes.STRING(64), primaryKey: true },
    workspace_id: workspaceRef,
    email: { type: DataTypes.STRING(254), allowNull: false },
    role: { type: DataTypes.STRING(10), allowNull: false },
    // SHA-256 of the link's secret; the secret itself is only in the e-mail.
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    invited_by: userRef,
    expires_at: { type: DataTypes.DATE, allowNull: false },
    accepted_at: { type: DataTypes.DATE, allowNull: true },
    accepted_by: { ...userRef, allowNull: true },
    revoked_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('invitations', ['workspace_id']);
};

export const down: MigrationFn<MigrationContext> = async ({ context: { queryInterface } }) => {
  for (const table of ['invitations', 'memberships', 'workspaces']) await queryInterface.dropTable(table);
};
