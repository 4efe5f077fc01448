import { DataTypes } from 'sequelize';
import type { Model, ModelStatic, Sequelize } from 'sequelize';

/** A row of `snapshots`; written once, never updated (a trigger refuses it). JSON columns are text. */
export interface SnapshotRow {
  id: string;
  workspaceId: string;
  scenarioId: string;
  scenarioRevision: number;
  title: string;
  /** the canonical JSON of the validated scenario (RFC 8785) */
  canonicalInput: string;
  inputHash: string;
  engineVersion: string;
  /** JSON: the engine's result computed by the server */
  result: string;
  /** JSON: SnapshotFixture[] */
  fixtures: string;
  /** JSON: SnapshotMeasurement[] */
  measurements: string;
  /** JSON: the AnalysisSettings kept with the scenario when the snapshot was made, or null (migration 0008) */
  analysis: string | null;
  notes: string;
  createdBy: string;
  createdByName: string;
  createdAt: Date;
}

/** A row of `snapshot_links`: what may change about a share link. */
export interface SnapshotLinkRow {
  snapshotId: string;
  idHash: string;
  expiresAt: Date | null;
  revokedAt: Date | null;
  revokedBy: string | null;
  updatedAt: Date;
}

/** A row of `snapshot_forks`: a scenario copied from a snapshot. */
export interface SnapshotForkRow {
  scenarioId: string;
  snapshotId: string;
  forkedBy: string;
  createdAt: Date;
}

export type SnapshotModel = ModelStatic<Model<SnapshotRow, Partial<SnapshotRow>>>;
export type SnapshotLinkModel = ModelStatic<Model<SnapshotLinkRow, Partial<SnapshotLinkRow>>>;
export type SnapshotForkModel = ModelStatic<Model<SnapshotForkRow, Partial<SnapshotForkRow>>>;

const text = () => ({ type: DataTypes.TEXT, allowNull: false });

export function defineSnapshots(sequelize: Sequelize): { Snapshot: SnapshotModel; SnapshotLink: SnapshotLinkModel; SnapshotFork: SnapshotForkModel } {
  const Snapshot: SnapshotModel = sequelize.define(
    'Snapshot',
    {
      id: { type: DataTypes.STRING(21), primaryKey: true },
      workspaceId: { type: DataTypes.STRING(64), allowNull: false },
      scenarioId: { type: DataTypes.STRING(64), allowNull: false },
      scenarioRevision: { type: DataTypes.INTEGER, allowNull: false },
      title: { type: DataTypes.STRING(200), allowNull: false },
      canonicalInput: text(),
      inputHash: { type: DataTypes.STRING(64), allowNull: false },
      engineVersion: { type: DataTypes.STRING(20), allowNull: false },
      result: text(),
      fixtures: text(),
      measurements: text(),
      analysis: { type: DataTypes.TEXT, allowNull: true },
      notes: text(),
      createdBy: { type: DataTypes.STRING(64), allowNull: false },
      createdByName: { type: DataTypes.STRING(80), allowNull: false },
      createdAt: DataTypes.DATE,
    },
    { tableName: 'snapshots', underscored: true, updatedAt: false },
  );
  const SnapshotLink: SnapshotLinkModel = sequelize.define(
    'SnapshotLink',
    {
      snapshotId: { type: DataTypes.STRING(21), primaryKey: true },
      idHash: { type: DataTypes.STRING(64), allowNull: false },
      expiresAt: { type: DataTypes.DATE, allowNull: true },
      revokedAt: { type: DataTypes.DATE, allowNull: true },
      revokedBy: { type: DataTypes.STRING(64), allowNull: true },
      updatedAt: DataTypes.DATE,
    },
    { tableName: 'snapshot_links', underscored: true, createdAt: false },
  );
  const SnapshotFork: SnapshotForkModel = sequelize.define(
    'SnapshotFork',
    {
      scenarioId: { type: DataTypes.STRING(64), primaryKey: true },
      snapshotId: { type: DataTypes.STRING(21), allowNull: false },
      forkedBy: { type: DataTypes.STRING(64), allowNull: false },
      createdAt: DataTypes.DATE,
    },
    { tableName: 'snapshot_forks', underscored: true, updatedAt: false },
  );
  return { Snapshot, SnapshotLink, SnapshotFork };
}
