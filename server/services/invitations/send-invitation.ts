import { INVITATION_VALID_DAYS } from '../../../src/contracts/api/invitations';
import type { Invitation } from '../../../src/contracts/api/invitations';
import type { Role } from '../../../src/contracts/api/common';
import type { Models } from '../../db/models';
import type { UserRow } from '../../db/models/users';
import type { WorkspaceRow } from '../../db/models/workspaces';
import { AppError } from '../../http/app-error';
import type { Mailer } from '../../mail/mailer';
import { recordAudit } from '../../repos/audit';
import { insertInvitation, invitationView, listInvitations, revokeInvitation } from '../../repos/invitations';
import { listMembers } from '../../repos/members';
import { hashInvitationToken, newInvitationToken } from './invitation-token';

const DAY_MS = 24 * 60 * 60 * 1000;

export interface SendInvitation {
  workspace: WorkspaceRow;
  inviter: UserRow;
  email: string;
  role: Role;
  /** Where the web app is reached, e.g. https://parity.example.org */
  origin: string;
  ip: string | null;
}

/**
 * Invites an address to a workspace: stores the hash of a new secret, valid 7 days for one use,
 * and e-mails the link. A newer invitation to the same address replaces a pending one.
 */
export async function sendInvitation(m: Models, mailer: Mailer, s: SendInvitation): Promise<Invitation> {
  const members = await listMembers(m, s.workspace.id);
  if (members.some((x) => x.email === s.email)) {
    throw new AppError('conflict', `${s.email} is already a member of this workspace.`, [{ path: 'email', message: 'is already a member' }]);
  }
  const token = newInvitationToken();
  const expiresAt = new Date(Date.now() + INVITATION_VALID_DAYS * DAY_MS);
  const row = await m.sequelize.transaction(async (t) => {
    for (const old of (await listInvitations(m, s.workspace.id)).filter((i) => i.email === s.email && i.status === 'pending')) {
      await revokeInvitation(m, old.id, t);
    }
    const created = await insertInvitation(
      m,
      { workspaceId: s.workspace.id, email: s.email, role: s.role, tokenHash: hashInvitationToken(token), invitedBy: s.inviter.id, expiresAt },
      t,
    );
    await recordAudit(m, { action: 'invitation_sent', actorUserId: s.inviter.id, workspaceId: s.workspace.id, target: s.email, ip: s.ip, details: { role: s.role, invitationId: created.id } }, t);
    return created;
  });
  try {
    await mailer.send({
      to: s.email,
      subject: `${s.inviter.name} invites you to "${s.workspace.name}" on Photon Parity`,
      text: [
        `${s.inviter.name} (${s.inviter.email}) invites you to join the workspace "${s.workspace.name}" as ${s.role === 'owner' ? 'an owner' : `an ${s.role}`}.`,
        '',
        'Open this link to see the invitation and accept it. It works once, until',
        `${expiresAt.toUTCString()}:`,
        '',
        `${s.origin}/invitations/${token}`,
        '',
        'If you do not have an account yet, you can make one on that page with this e-mail address.',
        'If you did not expect this message, ignore it.',
      ].join('\n'),
    });
  } catch (error) {
    await revokeInvitation(m, row.id);
    throw new AppError('unavailable', 'The invitation could not be e-mailed; nothing was sent. Try again later.', [], { cause: error });
  }
  return invitationView(row, s.inviter.name);
}
