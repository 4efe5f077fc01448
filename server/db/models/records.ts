import { DataTypes } from 'sequelize';
import type { Model, ModelStatic, Sequelize } from 'sequelize';

/** A row of `audit_events`. */
export interface AuditRow {
  id: number;
  at: Date;
  action: string;
  actorUserId: string | null;
  workspaceId: string | null;
  target: string | null;
  ip: string | null;
  /** JSON object */
  details: string;
}

/** A row of `caught_mail`. */
export interface CaughtMailRow {
  id: number;
  receivedAt: Date;
  mailFrom: string;
  /** JSON list of addresses */
  rcptTo: string;
  subject: string;
  text: string;
  raw: string;
}

export type AuditModel = ModelStatic<Model<AuditRow, Partial<AuditRow>>>;
export type CaughtMailModel = ModelStatic<Model<CaughtMailRow, Partial<CaughtMailRow>>>;

export function defineRecords(sequelize: Sequelize): { Audit: AuditModel; CaughtMail: CaughtMailModel } {
  const Audit: AuditModel = sequelize.define(
    'Audit',
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      at: { type: DataTypes.DATE, allowNull: false },
      action: { type: DataTypes.STRING(60), allowNull: false },
      actorUserId: { type: DataTypes.STRING(64), allowNull: true },
      workspaceId: { type: DataTypes.STRING(64), allowNull: true },
      target: { type: DataTypes.STRING(300), allowNull: true },
      ip: { type: DataTypes.STRING(64), allowNull: true },
      details: { type: DataTypes.TEXT, allowNull: false },
    },
    { tableName: 'audit_events', underscored: true, timestamps: false },
  );
  const CaughtMail: CaughtMailModel = sequelize.define(
    'CaughtMail',
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      receivedAt: { type: DataTypes.DATE, allowNull: false },
      mailFrom: { type: DataTypes.STRING(320), allowNull: false },
      rcptTo: { type: DataTypes.TEXT, allowNull: false },
      subject: { type: DataTypes.STRING(998), allowNull: false },
      text: { type: DataTypes.TEXT, allowNull: false },
      raw: { type: DataTypes.TEXT, allowNull: false },
    },
    { tableName: 'caught_mail', underscored: true, timestamps: false },
  );
  return { Audit, CaughtMail };
}
