import { Router } from 'express';
import type { Request } from 'express';
import { emptyBodySchema } from '../../src/contracts/api/common';
import { createInvitationRequestSchema, invitationTokenSchema } from '../../src/contracts/api/invitations';
import { workspaceRole } from '../http/access';
import { AppError } from '../http/app-error';
import { accessOf, clientIp, requireCaller } from '../http/context';
import { idParam, parseBody } from '../http/validate';
import { recordAudit } from '../repos/audit';
import { findInvitation, listInvitations, revokeInvitation } from '../repos/invitations';
import { acceptInvitation, previewInvitation } from '../services/invitations/accept-invitation';
import { sendInvitation } from '../services/invitations/send-invitation';
import { publicOrigin } from './api-deps';
import type { ApiDeps } from './api-deps';

/** /api/workspaces/:wid/invitations (owners): list, send by e-mail, revoke. */
export function workspaceInvitationsRouter({ m, sequelize, mailer, config, limits }: ApiDeps): Router {
  const router = Router({ mergeParams: true });
  const owners = workspaceRole(sequelize, 'owner');
  router.get('/', owners, async (req, res) => {
    res.json({ invitations: await listInvitations(m, accessOf(req).workspace.id) });
  });
  router.post('/', owners, limits.inviting, async (req, res) => {
    const input = parseBody(createInvitationRequestSchema, req);
    const invitation = await sendInvitation(m, mailer, {
      workspace: accessOf(req).workspace,
      inviter: requireCaller(req).user,
      email: input.email,
      role: input.role,
      origin: publicOrigin(req, config),
      ip: clientIp(req),
    });
    res.status(201).json({ invitation });
  });
  router.delete('/:iid', owners, async (req, res) => {
    const workspaceId = accessOf(req).workspace.id;
    const found = await findInvitation(m, workspaceId, idParam(req, 'iid'));
    if (!found) throw new AppError('not_found', 'There is no such invitation in this workspace.');
    await revokeInvitation(m, found.id);
    await recordAudit(m, { action: 'invitation_revoked', actorUserId: requireCaller(req).user.id, workspaceId, target: found.email, ip: clientIp(req) });
    res.status(204).end();
  });
  return router;
}

function tokenParam(req: Request): string {
  const parsed = invitationTokenSchema.safeParse(req.params.token);
  if (!parsed.success) throw new AppError('not_found', 'This invitation link is not valid. Check that the whole link was copied.');
  return parsed.data;
}

/** /api/invitations/:token: preview (anyone holding the link) and accept (signed in as the invited address). */
export function invitationLinksRouter({ m, limits }: ApiDeps): Router {
  const router = Router();
  router.use(limits.invitationLinks);
  router.get('/:token', async (req, res) => {
    res.set('Cache-Control', 'no-store');
    res.json(await previewInvitation(m, tokenParam(req)));
  });
  router.post('/:token/accept', async (req, res) => {
    const caller = requireCaller(req);
    parseBody(emptyBodySchema, req, { optional: true });
    const membership = await acceptInvitation(m, tokenParam(req), caller.user, clientIp(req));
    res.json({ membership });
  });
  return router;
}
