import { nanoid } from 'nanoid';
import { QueryTypes } from 'sequelize';
import type { Transaction } from 'sequelize';
import type { MembershipSummary } from '../../src/contracts/api/account';
import type { Role, UnitSystem } from '../../src/contracts/api/common';
import type { Workspace } from '../../src/contracts/api/workspaces';
import { modelReader, readRow } from '../db/direct-read';
import type { Models } from '../db/models';
import { orderNoCase } from './like';
import type { WorkspaceRow } from '../db/models/workspaces';

/** A workspace and the caller's role in it. */
export interface MembershipWithWorkspace {
  workspace: WorkspaceRow;
  role: Role;
}

export async function findMembership(m: Models, workspaceId: string, userId: string, transaction?: Transaction): Promise<MembershipWithWorkspace | null> {
  if (!transaction) {
    // Every workspace route checks its caller's role: one plain-SQL read (see server/db/direct-read.ts).
    const workspaces = modelReader(m.Workspace, 'w');
    const raw = await readRow<Record<string, unknown>>(
      m.sequelize,
      `SELECT ${workspaces.columns}, me.role AS "memberRole" FROM workspaces w JOIN memberships me ON me.workspace_id = w.id WHERE w.id = ? AND me.user_id = ?`,
      [workspaceId, userId],
    );
    return raw ? { workspace: workspaces.toRow(raw), role: raw.memberRole as Role } : null;
  }
  const membership = await m.Membership.findOne({ where: { workspaceId, userId }, transaction });
  if (!membership) return null;
  const workspace = await m.Workspace.findByPk(workspaceId, { transaction });
  if (!workspace) return null;
  return { workspace: workspace.get({ plain: true }), role: membership.get({ plain: true }).role };
}

interface WorkspaceListRow {
  id: string;
  name: string;
  currency: string;
  unit_system: UnitSystem;
  role: Role;
  created_at: string;
  updated_at: string;
  member_count: number;
}

const iso = (sqliteDate: string) => new Date(sqliteDate).toISOString();

/** The workspaces a person belongs to, by name, with their role and member counts. */
export async function listWorkspacesOf(m: Models, userId: string): Promise<Workspace[]> {
  const rows = await m.sequelize.query<WorkspaceListRow>(
    `SELECT w.id, w.name, w.currency, w.unit_system, me.role, w.created_at, w.updated_at,
            (SELECT COUNT(*) FROM memberships x WHERE x.workspace_id = w.id) AS member_count
       FROM workspaces w JOIN memberships me ON me.workspace_id = w.id AND me.user_id = :userId
      ORDER BY ${orderNoCase(m.sequelize, 'w.name')}, w.id`,
    { replacements: { userId }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({
    id: r.id,
    name: r.name,
    currency: r.currency,
    unitSystem: r.unit_system,
    role: r.role,
    memberCount: Number(r.member_count),
    createdAt: iso(r.created_at),
    updatedAt: iso(r.updated_at),
  }));
}

/** The short form used by GET /api/me. */
export function membershipSummary(w: Pick<Workspace, 'id' | 'name' | 'role' | 'currency' | 'unitSystem'>): MembershipSummary {
  return { workspaceId: w.id, name: w.name, role: w.role, currency: w.currency, unitSystem: w.unitSystem };
}

export async function workspaceView(m: Models, w: WorkspaceRow, role: Role, transaction?: Transaction): Promise<Workspace> {
  const memberCount = await m.Membership.count({ where: { workspaceId: w.id }, transaction });
  return {
    id: w.id,
    name: w.name,
    currency: w.currency,
    unitSystem: w.unitSystem,
    role,
    memberCount,
    createdAt: w.createdAt.toISOString(),
    updatedAt: w.updatedAt.toISOString(),
  };
}

export interface NewWorkspace {
  name: string;
  currency: string;
  unitSystem: UnitSystem;
}

/** Creates a workspace with `ownerId` as its owner. */
export async function insertWorkspace(m: Models, w: NewWorkspace, ownerId: string, transaction: Transaction): Promise<WorkspaceRow> {
  const row = await m.Workspace.create({ id: nanoid(), ...w }, { transaction });
  await m.Membership.create({ workspaceId: row.get({ plain: true }).id, userId: ownerId, role: 'owner' }, { transaction });
  return row.get({ plain: true });
}

export async function updateWorkspaceRow(m: Models, id: string, patch: Partial<NewWorkspace>, transaction?: Transaction): Promise<WorkspaceRow> {
  await m.Workspace.update(patch, { where: { id }, transaction });
  const row = await m.Workspace.findByPk(id, { transaction });
  if (!row) throw new Error('workspace vanished while updating');
  return row.get({ plain: true });
}

/** Deletes a workspace; memberships, invitations, fixtures, scenarios and revisions go with it (ON DELETE CASCADE). */
export async function deleteWorkspaceRow(m: Models, id: string, transaction?: Transaction): Promise<void> {
  await m.Workspace.destroy({ where: { id }, transaction });
}
