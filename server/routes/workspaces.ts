import { Router } from 'express';
import { createWorkspaceRequestSchema, updateWorkspaceRequestSchema } from '../../src/contracts/api/workspaces';
import { workspaceRole } from '../http/access';
import { accessOf, clientIp, requireCaller } from '../http/context';
import { parseBody } from '../http/validate';
import { listWorkspacesOf, workspaceView } from '../repos/workspaces';
import { createWorkspace, deleteWorkspace, updateWorkspace } from '../services/workspaces/manage-workspace';
import type { ApiDeps } from './api-deps';

/** /api/workspaces: list and create (anyone signed in); read (members), change and delete (owners). */
export function workspacesRouter({ m, sequelize }: ApiDeps): Router {
  const router = Router();
  router.get('/', async (req, res) => {
    const caller = requireCaller(req);
    res.json({ workspaces: await listWorkspacesOf(m, caller.user.id) });
  });
  router.post('/', async (req, res) => {
    const caller = requireCaller(req);
    const input = parseBody(createWorkspaceRequestSchema, req);
    res.status(201).json({ workspace: await createWorkspace(m, input, caller.user.id, clientIp(req)) });
  });
  router.get('/:wid', workspaceRole(sequelize, 'viewer'), async (req, res) => {
    const a = accessOf(req);
    res.json({ workspace: await workspaceView(m, a.workspace, a.role) });
  });
  router.patch('/:wid', workspaceRole(sequelize, 'owner'), async (req, res) => {
    const input = parseBody(updateWorkspaceRequestSchema, req);
    res.json({ workspace: await updateWorkspace(m, accessOf(req), input) });
  });
  router.delete('/:wid', workspaceRole(sequelize, 'owner'), async (req, res) => {
    await deleteWorkspace(m, accessOf(req), requireCaller(req).user.id, clientIp(req));
    res.status(204).end();
  });
  return router;
}
