import { DataTypes } from 'sequelize';
import type { Model, ModelStatic, Sequelize } from 'sequelize';

/**
 * A row of `measurements`: the raw file as uploaded (bytes and SHA-256), what it was read as, and
 * the engine's summary as JSON text. The bytes live in the database so that a backup holds them.
 */
export interface MeasurementRow {
  id: string;
  workspaceId: string;
  fixtureId: string | null;
  kind: 'grid' | 'spectrum';
  label: string;
  fileName: string;
  contentType: string;
  byteSize: number;
  sha256: string;
  content: Buffer;
  unit: 'w' | 'umol' | 'relative' | null;
  areaM2: number | null;
  wallWatts: number | null;
  /** JSON of StoredSummary (server/services/measurements/stored-summary.ts) */
  summary: string;
  engineVersion: string;
  createdBy: string;
  createdAt: Date;
  updatedAt: Date;
}

export type MeasurementModel = ModelStatic<Model<MeasurementRow, Partial<MeasurementRow>>>;

export function defineMeasurements(sequelize: Sequelize): { Measurement: MeasurementModel } {
  const Measurement: MeasurementModel = sequelize.define(
    'Measurement',
    {
      id: { type: DataTypes.STRING(64), primaryKey: true },
      workspaceId: { type: DataTypes.STRING(64), allowNull: false },
      fixtureId: { type: DataTypes.STRING(64), allowNull: true },
      kind: { type: DataTypes.STRING(10), allowNull: false },
      label: { type: DataTypes.STRING(120), allowNull: false },
      fileName: { type: DataTypes.STRING(255), allowNull: false },
      contentType: { type: DataTypes.STRING(100), allowNull: false },
      byteSize: { type: DataTypes.INTEGER, allowNull: false },
      sha256: { type: DataTypes.STRING(64), allowNull: false },
      content: { type: DataTypes.BLOB, allowNull: false },
      unit: { type: DataTypes.STRING(10), allowNull: true },
      areaM2: { type: DataTypes.DOUBLE, allowNull: true },
      wallWatts: { type: DataTypes.DOUBLE, allowNull: true },
      summary: { type: DataTypes.TEXT, allowNull: false },
      engineVersion: { type: DataTypes.STRING(20), allowNull: false },
      createdBy: { type: DataTypes.STRING(64), allowNull: false },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { tableName: 'measurements', underscored: true },
  );
  return { Measurement };
}
