import { Router } from 'express';
import { updateMemberRequestSchema } from '../../src/contracts/api/members';
import { roleAtLeast, workspaceRole } from '../http/access';
import { AppError } from '../http/app-error';
import { accessOf, clientIp, requireCaller } from '../http/context';
import { idParam, parseBody } from '../http/validate';
import { listMembers } from '../repos/members';
import { changeMemberRole, removeWorkspaceMember } from '../services/members/change-member';
import type { ApiDeps } from './api-deps';

/** /api/workspaces/:wid/members: members read the list; owners change roles and remove; anyone may leave. */
export function membersRouter({ m, sequelize }: ApiDeps): Router {
  const router = Router({ mergeParams: true });
  router.get('/', workspaceRole(sequelize, 'viewer'), async (req, res) => {
    res.json({ members: await listMembers(m, accessOf(req).workspace.id) });
  });
  router.patch('/:userId', workspaceRole(sequelize, 'owner'), async (req, res) => {
    const input = parseBody(updateMemberRequestSchema, req);
    const change = { workspaceId: accessOf(req).workspace.id, actorId: requireCaller(req).user.id, userId: idParam(req, 'userId'), ip: clientIp(req) };
    res.json({ member: await changeMemberRole(m, change, input.role) });
  });
  router.delete('/:userId', workspaceRole(sequelize, 'viewer'), async (req, res) => {
    const actorId = requireCaller(req).user.id;
    const userId = idParam(req, 'userId');
    if (userId !== actorId && !roleAtLeast(accessOf(req).role, 'owner')) {
      throw new AppError('forbidden', 'Only owners may remove other members.');
    }
    await removeWorkspaceMember(m, { workspaceId: accessOf(req).workspace.id, actorId, userId, ip: clientIp(req) });
    res.status(204).end();
  });
  return router;
}
