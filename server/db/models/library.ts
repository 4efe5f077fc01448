import { DataTypes } from 'sequelize';
import type { Model, ModelStatic, Sequelize } from 'sequelize';
import type { FixtureCsvColumn } from '../../../src/contracts/api/fixtures';

/**
 * A fixture's option fields flattened to one value per column, with the same names as the CSV
 * columns; money as decimal text, a missing value as null.
 */
export type FlatFixture = Record<FixtureCsvColumn, string | number | boolean | null>;

/** A row of `fixtures`. */
export interface FixtureRow extends FlatFixture {
  id: string;
  workspaceId: string;
  /** the measurement the figures came from (dataSource `measured`), if any */
  measurementId: string | null;
  updatedBy: string;
  createdAt: Date;
  updatedAt: Date;
}

/** A row of `scenarios`; the document is the scenario file as JSON text. */
export interface ScenarioRow {
  id: string;
  workspaceId: string;
  title: string;
  document: string;
  revision: number;
  updatedBy: string;
  deletedAt: Date | null;
  createdAt: Date;
  updatedAt: Date;
}

/** A row of `scenario_revisions`; never updated once written. */
export interface RevisionRow {
  id: number;
  scenarioId: string;
  revision: number;
  title: string;
  document: string;
  action: string;
  /** JSON list of field paths */
  changedPaths: string;
  fromRevision: number | null;
  createdBy: string;
  createdAt: Date;
}

export type FixtureModel = ModelStatic<Model<FixtureRow, Partial<FixtureRow>>>;
export type ScenarioModel = ModelStatic<Model<ScenarioRow, Partial<ScenarioRow>>>;
export type RevisionModel = ModelStatic<Model<RevisionRow, Partial<RevisionRow>>>;

const text = (allowNull: boolean) => ({ type: DataTypes.STRING(120), allowNull });
const real = (allowNull: boolean) => ({ type: DataTypes.DOUBLE, allowNull });

export function defineLibrary(sequelize: Sequelize): { Fixture: FixtureModel; Scenario: ScenarioModel; Revision: RevisionModel } {
  const Fixture: FixtureModel = sequelize.define(
    'Fixture',
    {
      id: { type: DataTypes.STRING(64), primaryKey: true },
      workspaceId: { type: DataTypes.STRING(64), allowNull: false },
      key: text(false),
      label: text(false),
      technology: text(false),
      wallWatts: real(false),
      photonEfficacy: real(true),
      ppf: real(true),
      owned: { type: DataTypes.BOOLEAN, allowNull: false },
      fixturePrice: text(true),
      installPrice: text(false),
      rebate: text(false),
      lampPrice: text(true),
      lampReplaceEveryHours: real(true),
      lampOutputAtReplacementPct: real(true),
      outputAtHorizonPct: real(false),
      bluePct: real(true),
      greenPct: real(true),
      redPct: real(true),
      farRedPct: real(true),
      cctK: real(true),
      dataSource: text(false),
      notes: { type: DataTypes.TEXT, allowNull: false },
      measurementId: { type: DataTypes.STRING(64), allowNull: true },
      updatedBy: { type: DataTypes.STRING(64), allowNull: false },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { tableName: 'fixtures', underscored: true },
  );
  const Scenario: ScenarioModel = sequelize.define(
    'Scenario',
    {
      id: { type: DataTypes.STRING(64), primaryKey: true },
      workspaceId: { type: DataTypes.STRING(64), allowNull: false },
      title: { type: DataTypes.STRING(200), allowNull: false },
      document: { type: DataTypes.TEXT, allowNull: false },
      revision: { type: DataTypes.INTEGER, allowNull: false },
      updatedBy: { type: DataTypes.STRING(64), allowNull: false },
      deletedAt: { type: DataTypes.DATE, allowNull: true },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { tableName: 'scenarios', underscored: true },
  );
  const Revision: RevisionModel = sequelize.define(
    'Revision',
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      scenarioId: { type: DataTypes.STRING(64), allowNull: false },
      revision: { type: DataTypes.INTEGER, allowNull: false },
      title: { type: DataTypes.STRING(200), allowNull: false },
      document: { type: DataTypes.TEXT, allowNull: false },
      action: { type: DataTypes.STRING(20), allowNull: false },
      changedPaths: { type: DataTypes.TEXT, allowNull: false },
      fromRevision: { type: DataTypes.INTEGER, allowNull: true },
      createdBy: { type: DataTypes.STRING(64), allowNull: false },
      createdAt: DataTypes.DATE,
    },
    { tableName: 'scenario_revisions', underscored: true, updatedAt: false },
  );
  return { Fixture, Scenario, Revision };
}
