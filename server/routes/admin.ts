import { Router } from 'express';
import { listQuerySchema } from '../../src/contracts/api/common';
import { updateAdminUserRequestSchema } from '../../src/contracts/api/admin';
import { siteAdminOnly } from '../http/access';
import { AppError } from '../http/app-error';
import { clientIp, requireCaller } from '../http/context';
import { idParam, parseBody, parseQuery } from '../http/validate';
import { recordAudit } from '../repos/audit';
import { listCaughtMail } from '../repos/mail';
import { adminUser, findUserById, listUsers, updateUser, workspaceCounts } from '../repos/users';
import type { ApiDeps } from './api-deps';

/** /api/admin: site admins manage accounts and, outside production, read the caught mail. */
export function adminRouter({ m, config }: ApiDeps): Router {
  const router = Router();
  router.use(siteAdminOnly);
  router.get('/users', async (req, res) => {
    const q = parseQuery(listQuerySchema, req);
    const page = await listUsers(m, q.q, q.page, q.pageSize);
    res.json({ ...page, page: q.page, pageSize: q.pageSize });
  });
  router.patch('/users/:uid', async (req, res) => {
    const actor = requireCaller(req).user;
    const input = parseBody(updateAdminUserRequestSchema, req);
    const target = await findUserById(m, idParam(req, 'uid'));
    if (!target) throw new AppError('not_found', 'There is no such account.');
    if (target.id === actor.id && (input.disabled === true || input.isSiteAdmin === false)) {
      throw new AppError('conflict', 'You cannot disable your own account or remove your own admin rights; ask another site admin.');
    }
    await m.sequelize.transaction(async (t) => {
      await updateUser(m, target.id, input, t);
      await recordAudit(m, { action: 'admin_user_updated', actorUserId: actor.id, target: target.id, ip: clientIp(req), details: { ...input } }, t);
    });
    const updated = await findUserById(m, target.id);
    if (!updated) throw new AppError('not_found', 'There is no such account.');
    const counts = await workspaceCounts(m, [updated.id]);
    res.json({ user: adminUser(updated, counts.get(updated.id) ?? 0) });
  });
  router.get('/mail', async (_req, res) => {
    if (config.production) throw new AppError('not_found', 'The caught-mail list exists only in development.');
    res.set('Cache-Control', 'no-store');
    res.json({ messages: await listCaughtMail(m) });
  });
  return router;
}
