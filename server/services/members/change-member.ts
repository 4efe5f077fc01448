import type { Role } from '../../../src/contracts/api/common';
import type { Member } from '../../../src/contracts/api/members';
import type { Models } from '../../db/models';
import { AppError } from '../../http/app-error';
import { recordAudit } from '../../repos/audit';
import { countOwners, findMember, removeMember, setMemberRole } from '../../repos/members';

export interface MemberChange {
  workspaceId: string;
  actorId: string;
  userId: string;
  ip: string | null;
}

function lastOwner(): AppError {
  return new AppError('conflict', 'A workspace needs at least one owner: make someone else an owner first.', [{ path: 'role', message: 'the last owner must stay an owner' }]);
}

/** Gives a member another role; the last owner cannot be demoted. */
export async function changeMemberRole(m: Models, c: MemberChange, role: Role): Promise<Member> {
  return m.sequelize.transaction(async (t) => {
    const member = await findMember(m, c.workspaceId, c.userId, t);
    if (!member) throw new AppError('not_found', 'That person is not a member of this workspace.');
    if (member.role === 'owner' && role !== 'owner' && (await countOwners(m, c.workspaceId, t)) <= 1) throw lastOwner();
    await setMemberRole(m, c.workspaceId, c.userId, role, t);
    await recordAudit(m, { action: 'member_role_changed', actorUserId: c.actorId, workspaceId: c.workspaceId, target: c.userId, ip: c.ip, details: { from: member.role, to: role } }, t);
    return { ...member, role };
  });
}

/** Removes a member (owners remove anyone; anyone may leave); the last owner cannot go. */
export async function removeWorkspaceMember(m: Models, c: MemberChange): Promise<void> {
  await m.sequelize.transaction(async (t) => {
    const member = await findMember(m, c.workspaceId, c.userId, t);
    if (!member) throw new AppError('not_found', 'That person is not a member of this workspace.');
    if (member.role === 'owner' && (await countOwners(m, c.workspaceId, t)) <= 1) throw lastOwner();
    await removeMember(m, c.workspaceId, c.userId, t);
    await recordAudit(m, { action: c.actorId === c.userId ? 'member_left' : 'member_removed', actorUserId: c.actorId, workspaceId: c.workspaceId, target: c.userId, ip: c.ip, details: { role: member.role } }, t);
  });
}
