import type { InvitationPreview } from '../../../src/contracts/api/invitations';
import type { MembershipSummary } from '../../../src/contracts/api/account';
import type { Models } from '../../db/models';
import type { UserRow } from '../../db/models/users';
import type { InvitationRow } from '../../db/models/workspaces';
import { AppError } from '../../http/app-error';
import { recordAudit } from '../../repos/audit';
import { findInvitationByTokenHash, invitationStatus, useInvitation } from '../../repos/invitations';
import { addMember } from '../../repos/members';
import { findMembership, membershipSummary } from '../../repos/workspaces';
import { findUserById } from '../../repos/users';
import { hashInvitationToken } from './invitation-token';

async function byToken(m: Models, token: string): Promise<InvitationRow> {
  const found = await findInvitationByTokenHash(m, hashInvitationToken(token));
  if (!found) throw new AppError('not_found', 'This invitation link is not valid. Check that the whole link was copied.');
  return found;
}

/** What an invitation link offers, for whoever holds the link. */
export async function previewInvitation(m: Models, token: string): Promise<InvitationPreview> {
  const i = await byToken(m, token);
  const workspace = await m.Workspace.findByPk(i.workspaceId);
  const inviter = await findUserById(m, i.invitedBy);
  if (!workspace) throw new AppError('not_found', 'This invitation link is not valid.');
  return {
    workspaceName: workspace.get({ plain: true }).name,
    role: i.role,
    email: i.email,
    invitedByName: inviter?.name ?? '',
    status: invitationStatus(i),
    expiresAt: i.expiresAt.toISOString(),
  };
}

/**
 * Joins the workspace with the invited role. Only the invited address may accept; the link
 * works once and not after 7 days or after being revoked (410 gone).
 */
export async function acceptInvitation(m: Models, token: string, user: UserRow, ip: string | null): Promise<MembershipSummary> {
  const i = await byToken(m, token);
  const status = invitationStatus(i);
  if (status !== 'pending') {
    const why = { accepted: 'has already been used', revoked: 'was withdrawn', expired: 'has expired' }[status];
    throw new AppError('gone', `This invitation ${why}. Ask the workspace owner for a new one.`);
  }
  if (i.email !== user.email) {
    throw new AppError('forbidden', `This invitation was sent to another e-mail address. Sign in as ${i.email} to accept it.`);
  }
  if (await findMembership(m, i.workspaceId, user.id)) {
    throw new AppError('conflict', 'You are already a member of this workspace.');
  }
  return m.sequelize.transaction(async (t) => {
    if (!(await useInvitation(m, i.id, user.id, t))) throw new AppError('gone', 'This invitation has already been used.');
    await addMember(m, i.workspaceId, user.id, i.role, t);
    await recordAudit(m, { action: 'invitation_accepted', actorUserId: user.id, workspaceId: i.workspaceId, target: user.email, ip, details: { role: i.role, invitationId: i.id } }, t);
    const joined = await findMembership(m, i.workspaceId, user.id, t);
    if (!joined) throw new Error('membership missing after accepting');
    const w = joined.workspace;
    return membershipSummary({ id: w.id, name: w.name, role: joined.role, currency: w.currency, unitSystem: w.unitSystem });
  });
}
