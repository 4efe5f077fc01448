import { DataTypes } from 'sequelize';
import type { MigrationFn } from 'umzug';
import type { MigrationContext } from '../migrate';

/**
 * People, the one-time tokens of e-mailed sign-in links (the table @auth/sequelize-adapter reads),
 * the audit log of security events, and the messages the local fake mail server catches.
 * Auth.js runs with JWT sessions here, so the adapter's session and account tables are not needed.
 */
export const up: MigrationFn<MigrationContext> = async ({ context: { queryInterface } }) => {
  await queryInterface.createTable('users', {
    id: { type: DataTypes.STRING(64), primaryKey: true },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(80), allowNull: false },
    email_verified: { type: DataTypes.DATE, allowNull: true },
    image: { type: DataTypes.STRING(500), allowNull: true },
    // scrypt$N$r$p$salt$key; null for an account that only signs in by e-mailed link.
    password_hash: { type: DataTypes.STRING(300), allowNull: true },
    is_site_admin: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    disabled_at: { type: DataTypes.DATE, allowNull: true },
    // Raised on password change or disabling; a session made under an older value is refused.
    session_version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });

  await queryInterface.createTable('verification_tokens', {
    token: { type: DataTypes.STRING(128), primaryKey: true },
    identifier: { type: DataTypes.STRING(254), allowNull: false },
    expires: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('verification_tokens', ['identifier']);

  await queryInterface.createTable('audit_events', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    at: { type: DataTypes.DATE, allowNull: false },
    action: { type: DataTypes.STRING(60), allowNull: false },
    // No foreign keys: the log outlives the rows it mentions.
    actor_user_id: { type: DataTypes.STRING(64), allowNull: true },
    workspace_id: { type: DataTypes.STRING(64), allowNull: true },
    target: { type: DataTypes.STRING(300), allowNull: true },
    ip: { type: DataTypes.STRING(64), allowNull: true },
    details: { type: DataTypes.TEXT, allowNull: false, defaultValue: '{}' },
  });
  await queryInterface.addIndex('audit_events', ['at']);

  await queryInterface.createTable('caught_mail', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    received_at: { type: DataTypes.DATE, allowNull: false },
    mail_from: { type: DataTypes.STRING(320), allowNull: false },
    rcpt_to: { type: DataTypes.TEXT, allowNull: false },
    subject: { type: DataTypes.STRING(998), allowNull: false },
    text: { type: DataTypes.TEXT, allowNull: false },
    raw: { type: DataTypes.TEXT, allowNull: false },
  });
};

export const down: MigrationFn<MigrationContext> = async ({ context: { queryInterface } }) => {
  for (const table of ['caught_mail', 'audit_events', 'verification_tokens', 'users']) await queryInterface.dropTable(table);
};
