import { Router } from 'express';
import { emptyBodySchema, listQuerySchema } from '../../src/contracts/api/common';
import {
  createScenarioRequestSchema,
  duplicateScenarioRequestSchema,
  ifMatchSchema,
  revisionParamSchema,
  updateScenarioRequestSchema,
} from '../../src/contracts/api/scenarios';
import { workspaceRole } from '../http/access';
import { AppError } from '../http/app-error';
import { accessOf, requireCaller } from '../http/context';
import { idParam, parseBody, parseHeader, parseQuery } from '../http/validate';
import { findRevision, findScenarioRow, listRevisions, listScenarios, scenarioRecord, softDeleteScenario } from '../repos/scenarios';
import { computeStoredScenario } from '../services/scenarios/compute-result';
import { createScenario, duplicateScenario, restoreRevision, updateScenario } from '../services/scenarios/save-scenario';
import type { ApiDeps } from './api-deps';
import type { Request } from 'express';

function revisionParam(req: Request): number {
  const parsed = revisionParamSchema.safeParse(req.params.rev);
  if (!parsed.success) throw new AppError('not_found', 'There is no such revision.');
  return parsed.data;
}

/** /api/workspaces/:wid/scenarios: members read, compute and browse history; editors and owners change. */
export function scenariosRouter({ m, sequelize }: ApiDeps): Router {
  const router = Router({ mergeParams: true });
  const readers = workspaceRole(sequelize, 'viewer');
  const editors = workspaceRole(sequelize, 'editor');
  const wid = (req: Request) => accessOf(req).workspace.id;
  const userId = (req: Request) => requireCaller(req).user.id;
  const existing = async (req: Request) => {
    const row = await findScenarioRow(m, wid(req), idParam(req, 'sid'));
    if (!row) throw new AppError('not_found', 'There is no such scenario in this workspace.');
    return row;
  };

  router.get('/', readers, async (req, res) => {
    const q = parseQuery(listQuerySchema, req);
    const page = await listScenarios(m, wid(req), q.q, q.page, q.pageSize);
    res.json({ ...page, page: q.page, pageSize: q.pageSize });
  });
  router.post('/', editors, async (req, res) => {
    const input = parseBody(createScenarioRequestSchema, req);
    res.status(201).json({ scenario: await createScenario(m, wid(req), input.document, userId(req)) });
  });
  router.get('/:sid', readers, async (req, res) => {
    const record = await scenarioRecord(m, await existing(req));
    res.set('ETag', `"${record.revision}"`).json({ scenario: record });
  });
  router.put('/:sid', editors, async (req, res) => {
    const ifMatch = parseHeader(ifMatchSchema, req, 'If-Match');
    const input = parseBody(updateScenarioRequestSchema, req);
    const record = await updateScenario(m, wid(req), idParam(req, 'sid'), ifMatch, input.document, userId(req));
    res.set('ETag', `"${record.revision}"`).json({ scenario: record });
  });
  // Deleting is the owners' (issue: "owners manage members, invitations and deletion").
  router.delete('/:sid', workspaceRole(sequelize, 'owner'), async (req, res) => {
    await softDeleteScenario(m, (await existing(req)).id);
    res.status(204).end();
  });
  router.post('/:sid/duplicate', editors, async (req, res) => {
    const input = parseBody(duplicateScenarioRequestSchema, req, { optional: true });
    res.status(201).json({ scenario: await duplicateScenario(m, wid(req), idParam(req, 'sid'), input.title, userId(req)) });
  });
  router.get('/:sid/result', readers, async (req, res) => {
    res.json(await computeStoredScenario(m, wid(req), idParam(req, 'sid')));
  });
  router.get('/:sid/revisions', readers, async (req, res) => {
    res.json({ revisions: await listRevisions(m, (await existing(req)).id) });
  });
  router.get('/:sid/revisions/:rev', readers, async (req, res) => {
    const found = await findRevision(m, (await existing(req)).id, revisionParam(req));
    if (!found) throw new AppError('not_found', 'This scenario has no such revision.');
    res.json({ revision: found });
  });
  router.post('/:sid/revisions/:rev/restore', editors, async (req, res) => {
    parseBody(emptyBodySchema, req, { optional: true });
    const record = await restoreRevision(m, wid(req), idParam(req, 'sid'), revisionParam(req), userId(req));
    res.set('ETag', `"${record.revision}"`).json({ scenario: record });
  });
  return router;
}
