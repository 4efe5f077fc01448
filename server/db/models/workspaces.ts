import { DataTypes } from 'sequelize';
import type { Model, ModelStatic, Sequelize } from 'sequelize';
import type { Role, UnitSystem } from '../../../src/contracts/api/common';

/** A row of `workspaces`. */
export interface WorkspaceRow {
  id: string;
  name: string;
  currency: string;
  unitSystem: UnitSystem;
  createdAt: Date;
  updatedAt: Date;
}

/** A row of `memberships`. */
export interface MembershipRow {
  workspaceId: string;
  userId: string;
  role: Role;
  createdAt: Date;
  updatedAt: Date;
}

/** A row of `invitations`. */
export interface InvitationRow {
  id: string;
  workspaceId: string;
  email: string;
  role: Role;
  tokenHash: string;
  invitedBy: string;
  expiresAt: Date;
  acceptedAt: Date | null;
  acceptedBy: string | null;
  revokedAt: Date | null;
  createdAt: Date;
  updatedAt: Date;
}

export type WorkspaceModel = ModelStatic<Model<WorkspaceRow, Partial<WorkspaceRow>>>;
export type MembershipModel = ModelStatic<Model<MembershipRow, Partial<MembershipRow>>>;
export type InvitationModel = ModelStatic<Model<InvitationRow, Partial<InvitationRow>>>;

const id = { type: DataTypes.STRING(64), primaryKey: true };
const stamps = { createdAt: DataTypes.DATE, updatedAt: DataTypes.DATE };

export function defineWorkspaces(sequelize: Sequelize): {
  Workspace: WorkspaceModel;
  Membership: MembershipModel;
  Invitation: InvitationModel;
} {
  const Workspace: WorkspaceModel = sequelize.define(
    'Workspace',
    {
      id,
      name: { type: DataTypes.STRING(120), allowNull: false },
      currency: { type: DataTypes.STRING(3), allowNull: false },
      unitSystem: { type: DataTypes.STRING(10), allowNull: false },
      ...stamps,
    },
    { tableName: 'workspaces', underscored: true },
  );
  const Membership: MembershipModel = sequelize.define(
    'Membership',
    {
      workspaceId: { type: DataTypes.STRING(64), primaryKey: true },
      userId: { type: DataTypes.STRING(64), primaryKey: true },
      role: { type: DataTypes.STRING(10), allowNull: false },
      ...stamps,
    },
    { tableName: 'memberships', underscored: true },
  );
  const Invitation: InvitationModel = sequelize.define(
    'Invitation',
    {
      id,
      workspaceId: { type: DataTypes.STRING(64), allowNull: false },
      email: { type: DataTypes.STRING(254), allowNull: false },
      role: { type: DataTypes.STRING(10), allowNull: false },
      tokenHash: { type: DataTypes.STRING(64), allowNull: false },
      invitedBy: { type: DataTypes.STRING(64), allowNull: false },
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      acceptedAt: { type: DataTypes.DATE, allowNull: true },
      acceptedBy: { type: DataTypes.STRING(64), allowNull: true },
      revokedAt: { type: DataTypes.DATE, allowNull: true },
      ...stamps,
    },
    { tableName: 'invitations', underscored: true },
  );
  return { Workspace, Membership, Invitation };
}
