import { DataTypes } from 'sequelize';
import type { MigrationFn } from 'umzug';
import type { MigrationContext } from '../migrate';

/**
 * The sensitivity settings (uncertainty ranges, draws and seed among them) frozen with a snapshot,
 * as JSON text; null when the scenario kept none. A column of its own: the canonical input and its
 * hash keep covering the scenario alone, so existing snapshots keep their hashes.
 *
 * Adding a nullable column without a default rewrites no row, so the trigger that refuses UPDATE
 * does not fire and stays in place: SQLite's ALTER TABLE ADD COLUMN (SQLite documentation, "ALTER
 * TABLE") and PostgreSQL's (PostgreSQL documentation, "ALTER TABLE") both leave triggers as they
 * are, so one statement serves both. The way back uses ALTER TABLE DROP COLUMN (SQLite 3.35 and
 * later, and PostgreSQL) rather than queryInterface.removeColumn, which on SQLite copies the table
 * into a new one and would lose the trigger.
 */
export const up: MigrationFn<MigrationContext> = async ({ context: { queryInterface } }) => {
  await queryInterface.addColumn('snapshots', 'analysis', { type: DataTypes.TEXT, allowNull: true });
};

export const down: MigrationFn<MigrationContext> = async ({ context: { sequelize } }) => {
  await sequelize.query('ALTER TABLE snapshots DROP COLUMN analysis');
};
