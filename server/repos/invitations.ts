import { nanoid } from 'nanoid';
import { QueryTypes } from 'sequelize';
import type { Transaction } from 'sequelize';
import type { Invitation, InvitationStatus } from '../../src/contracts/api/invitations';
import type { Models } from '../db/models';
import type { InvitationRow } from '../db/models/workspaces';

/** Where an invitation stands at `now`. */
export function invitationStatus(i: Pick<InvitationRow, 'acceptedAt' | 'revokedAt' | 'expiresAt'>, now = new Date()): InvitationStatus {
  if (i.acceptedAt) return 'accepted';
  if (i.revokedAt) return 'revoked';
  return i.expiresAt.getTime() <= now.getTime() ? 'expired' : 'pending';
}

export type NewInvitation = Pick<InvitationRow, 'workspaceId' | 'email' | 'role' | 'tokenHash' | 'invitedBy' | 'expiresAt'>;

export async function insertInvitation(m: Models, i: NewInvitation, transaction?: Transaction): Promise<InvitationRow> {
  const row = await m.Invitation.create({ id: nanoid(), ...i }, { transaction });
  return row.get({ plain: true });
}

export async function findInvitation(m: Models, workspaceId: string, id: string, transaction?: Transaction): Promise<InvitationRow | null> {
  const row = await m.Invitation.findOne({ where: { workspaceId, id }, transaction });
  return row ? row.get({ plain: true }) : null;
}

export async function findInvitationByTokenHash(m: Models, tokenHash: string, transaction?: Transaction): Promise<InvitationRow | null> {
  const row = await m.Invitation.findOne({ where: { tokenHash }, transaction });
  return row ? row.get({ plain: true }) : null;
}

interface InvitationQueryRow {
  id: string;
  inviter_name: string;
}

/** Every invitation of a workspace, newest first, with the inviter's name. */
export async function listInvitations(m: Models, workspaceId: string): Promise<Invitation[]> {
  const rows = await m.Invitation.findAll({ where: { workspaceId }, order: [['createdAt', 'DESC'], ['id', 'ASC']] });
  const names = await m.sequelize.query<InvitationQueryRow>(
    'SELECT i.id, u.name AS inviter_name FROM invitations i JOIN users u ON u.id = i.invited_by WHERE i.workspace_id = :workspaceId',
    { replacements: { workspaceId }, type: QueryTypes.SELECT },
  );
  const byId = new Map(names.map((n) => [n.id, n.inviter_name]));
  return rows.map((r) => {
    const i = r.get({ plain: true });
    return invitationView(i, byId.get(i.id) ?? '');
  });
}

export function invitationView(i: InvitationRow, inviterName: string): Invitation {
  return {
    id: i.id,
    workspaceId: i.workspaceId,
    email: i.email,
    role: i.role,
    status: invitationStatus(i),
    invitedBy: { id: i.invitedBy, name: inviterName },
    createdAt: i.createdAt.toISOString(),
    expiresAt: i.expiresAt.toISOString(),
    acceptedAt: i.acceptedAt ? i.acceptedAt.toISOString() : null,
  };
}

export async function revokeInvitation(m: Models, id: string, transaction?: Transaction): Promise<void> {
  await m.Invitation.update({ revokedAt: new Date() }, { where: { id, acceptedAt: null, revokedAt: null }, transaction });
}

/**
 * Marks a pending invitation used. The condition is part of the UPDATE, so of two accepts racing
 * for one link only one changes the row.
 * @returns true when this call used it
 */
export async function useInvitation(m: Models, id: string, userId: string, transaction: Transaction): Promise<boolean> {
  const [changed] = await m.Invitation.update(
    { acceptedAt: new Date(), acceptedBy: userId },
    { where: { id, acceptedAt: null, revokedAt: null }, transaction },
  );
  return changed === 1;
}
