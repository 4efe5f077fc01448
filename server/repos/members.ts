import { QueryTypes } from 'sequelize';
import type { Transaction } from 'sequelize';
import type { Role } from '../../src/contracts/api/common';
import type { Member } from '../../src/contracts/api/members';
import type { Models } from '../db/models';
import { orderNoCase } from './like';

interface MemberQueryRow {
  user_id: string;
  name: string;
  email: string;
  role: Role;
  created_at: string;
}

/** The members of a workspace, owners first, then by name. */
export async function listMembers(m: Models, workspaceId: string, transaction?: Transaction): Promise<Member[]> {
  const rows = await m.sequelize.query<MemberQueryRow>(
    `SELECT ms.user_id, u.name, u.email, ms.role, ms.created_at
       FROM memberships ms JOIN users u ON u.id = ms.user_id
      WHERE ms.workspace_id = :workspaceId
      ORDER BY CASE ms.role WHEN 'owner' THEN 0 WHEN 'editor' THEN 1 ELSE 2 END, ${orderNoCase(m.sequelize, 'u.name')}`,
    { replacements: { workspaceId }, type: QueryTypes.SELECT, transaction },
  );
  return rows.map((r) => ({ userId: r.user_id, name: r.name, email: r.email, role: r.role, joinedAt: new Date(r.created_at).toISOString() }));
}

export async function findMember(m: Models, workspaceId: string, userId: string, transaction?: Transaction): Promise<Member | null> {
  return (await listMembers(m, workspaceId, transaction)).find((x) => x.userId === userId) ?? null;
}

export async function countOwners(m: Models, workspaceId: string, transaction?: Transaction): Promise<number> {
  return m.Membership.count({ where: { workspaceId, role: 'owner' }, transaction });
}

export async function setMemberRole(m: Models, workspaceId: string, userId: string, role: Role, transaction?: Transaction): Promise<void> {
  await m.Membership.update({ role }, { where: { workspaceId, userId }, transaction });
}

export async function addMember(m: Models, workspaceId: string, userId: string, role: Role, transaction?: Transaction): Promise<void> {
  await m.Membership.create({ workspaceId, userId, role }, { transaction });
}

export async function removeMember(m: Models, workspaceId: string, userId: string, transaction?: Transaction): Promise<void> {
  await m.Membership.destroy({ where: { workspaceId, userId }, transaction });
}
