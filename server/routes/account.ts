import { Router } from 'express';
import { passwordChangeRequestSchema, signUpRequestSchema } from '../../src/contracts/api/account';
import { writeSession } from '../auth/session-token';
import { clientIp, requireCaller } from '../http/context';
import { parseBody } from '../http/validate';
import { sessionUser } from '../repos/users';
import { changePassword } from '../services/account/change-password';
import { signUp } from '../services/account/sign-up';
import type { ApiDeps } from './api-deps';

/** POST /api/account/sign-up and POST /api/account/password. */
export function accountRouter({ m, session, limits }: ApiDeps): Router {
  const router = Router();
  router.post('/sign-up', limits.signUp, async (req, res) => {
    const input = parseBody(signUpRequestSchema, req);
    res.status(201).json({ user: await signUp(m, input, clientIp(req)) });
  });
  router.post('/password', limits.passwordChanges, async (req, res) => {
    const caller = requireCaller(req);
    const input = parseBody(passwordChangeRequestSchema, req);
    const updated = await changePassword(m, caller.user, input.currentPassword, input.newPassword, clientIp(req));
    // Other sessions end with the old session version; this one carries on under the new one.
    await writeSession(res, { ...caller.session, ver: updated.sessionVersion, name: updated.name, email: updated.email }, session);
    res.json({ user: sessionUser(updated) });
  });
  return router;
}
