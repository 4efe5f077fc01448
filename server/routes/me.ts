import { Router } from 'express';
import type { MeResponse } from '../../src/contracts/api/account';
import { callerOf } from '../http/context';
import { issueCsrfToken } from '../http/csrf';
import { sessionUser } from '../repos/users';
import { listWorkspacesOf, membershipSummary } from '../repos/workspaces';
import type { ApiDeps } from './api-deps';

/** GET /api/me: who is signed in, their workspaces, and the CSRF token for writes. */
export function meRouter({ m, session }: ApiDeps): Router {
  const router = Router();
  router.get('/', async (req, res) => {
    const caller = callerOf(req);
    const csrfToken = issueCsrfToken(req, res, session.secret, session.secureCookies);
    res.set('Cache-Control', 'no-store');
    const body: MeResponse = caller
      ? { user: sessionUser(caller.user), memberships: (await listWorkspacesOf(m, caller.user.id)).map(membershipSummary), csrfToken }
      : { user: null, memberships: [], csrfToken };
    res.json(body);
  });
  return router;
}
