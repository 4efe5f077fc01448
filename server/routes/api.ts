import { Router } from 'express';
import { csrfGuard } from '../http/csrf';
import { identify } from '../http/identify';
import { accountRouter } from './account';
import { adminRouter } from './admin';
import type { ApiDeps } from './api-deps';
import { fixturesRouter } from './fixtures';
import { measurementsRouter } from './measurements';
import { invitationLinksRouter, workspaceInvitationsRouter } from './invitations';
import { meRouter } from './me';
import { membersRouter } from './members';
import { scenarioAnalysisRouter } from './scenario-analysis';
import { scenariosRouter } from './scenarios';
import { workspaceSnapshotsRouter } from './snapshots';
import { publicSnapshotsRouter } from './snapshots-public';
import { scenarioSnapshotsRouter } from './snapshots-scenario';
import { workspacesRouter } from './workspaces';

/**
 * The account and data API under /api: finds the caller from the session cookie, refuses writes
 * without the session's CSRF token, then routes. Each route checks the caller's role itself.
 */
export function dataApiRouter(deps: ApiDeps): Router {
  const router = Router();
  router.use(identify(deps.sequelize, deps.session));
  router.use(csrfGuard(deps.session.secret));
  router.use('/me', meRouter(deps));
  router.use('/account', accountRouter(deps));
  router.use('/workspaces/:wid/members', membersRouter(deps));
  router.use('/workspaces/:wid/invitations', workspaceInvitationsRouter(deps));
  router.use('/workspaces/:wid/fixtures', fixturesRouter(deps));
  router.use('/workspaces/:wid/measurements', measurementsRouter(deps));
  router.use('/workspaces/:wid/scenarios/:sid/snapshots', scenarioSnapshotsRouter(deps));
  router.use('/workspaces/:wid/scenarios/:sid/analysis', scenarioAnalysisRouter(deps));
  router.use('/workspaces/:wid/scenarios', scenariosRouter(deps));
  router.use('/workspaces/:wid/snapshots', workspaceSnapshotsRouter(deps));
  router.use('/workspaces', workspacesRouter(deps));
  router.use('/invitations', invitationLinksRouter(deps));
  router.use('/snapshots', publicSnapshotsRouter(deps));
  router.use('/admin', adminRouter(deps));
  return router;
}
