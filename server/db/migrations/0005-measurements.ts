import { DataTypes } from 'sequelize';
import type { MigrationFn } from 'umzug';
import type { MigrationContext } from '../migrate';

/**
 * Uploaded measurement files (PPFD grids and spectra): the raw bytes as a BLOB with their SHA-256,
 * so a backup of the database carries the files and several app instances need no shared disk;
 * the engine's summary as JSON text. A fixture may point at the measurement its figures came from.
 */
export const up: MigrationFn<MigrationContext> = async ({ context: { queryInterface } }) => {
  await queryInterface.createTable('measurements', {
    id: { type: DataTypes.STRING(64), primaryKey: true },
    workspace_id: { type: DataTypes.STRING(64), allowNull: false, references: { model: 'workspaces', key: 'id' }, onDelete: 'CASCADE' },
    fixture_id: { type: DataTypes.STRING(64), allowNull: true, references: { model: 'fixtures', key: 'id' }, onDelete: 'SET NULL' },
    kind: { type: DataTypes.STRING(10), allowNull: false },
    label: { type: DataTypes.STRING(120), allowNull: false },
    file_name: { type: DataTypes.STRING(255), allowNull: false },
    content_type: { type: DataTypes.STRING(100), allowNull: false },
    byte_size: { type: DataTypes.INTEGER, allowNull: false },
    sha256: { type: DataTypes.STRING(64), allowNull: false },
    content: { type: DataTypes.BLOB, allowNull: false },
    unit: { type: DataTypes.STRING(10), allowNull: true },
    area_m2: { type: DataTypes.DOUBLE, allowNull: true },
    wall_watts: { type: DataTypes.DOUBLE, allowNull: true },
    summary: { type: DataTypes.TEXT, allowNull: false },
    engine_version: { type: DataTypes.STRING(20), allowNull: false },
    created_by: { type: DataTypes.STRING(64), allowNull: false, references: { model: 'users', key: 'id' } },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('measurements', ['workspace_id', 'created_at']);
  await queryInterface.addColumn('fixtures', 'measurement_id', {
    type: DataTypes.STRING(64),
    allowNull: true,
    references: { model: 'measurements', key: 'id' },
    onDelete: 'SET NULL',
  });
};

export const down: MigrationFn<MigrationContext> = async ({ context: { queryInterface } }) => {
  await queryInterface.removeColumn('fixtures', 'measurement_id');
  await queryInterface.dropTable('measurements');
};
