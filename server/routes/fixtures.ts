import express, { Router } from 'express';
import { createFixtureRequestSchema, updateFixtureRequestSchema } from '../../src/contracts/api/fixtures';
import { workspaceRole } from '../http/access';
import { AppError } from '../http/app-error';
import { accessOf, requireCaller } from '../http/context';
import { idParam, parseBody } from '../http/validate';
import { deleteFixtureRow, findFixtureRow, fixtureViews, listFixtureRows } from '../repos/fixtures';
import { fixturesToCsv } from '../services/fixtures/fixture-csv';
import { importFixtures } from '../services/fixtures/import-fixtures';
import { createFixture, updateFixture } from '../services/fixtures/save-fixture';
import { unflatten } from '../services/fixtures/flat-fixture';
import { fixtureFieldsSchema } from '../../src/contracts/api/fixtures';
import type { ApiDeps } from './api-deps';

/** Largest fixture CSV accepted. */
export const FIXTURE_CSV_LIMIT = '1mb';

/** /api/workspaces/:wid/fixtures: members read; editors and owners change, import and delete. */
export function fixturesRouter({ m, sequelize }: ApiDeps): Router {
  const router = Router({ mergeParams: true });
  const readers = workspaceRole(sequelize, 'viewer');
  const editors = workspaceRole(sequelize, 'editor');

  router.get('/', readers, async (req, res) => {
    res.json({ fixtures: await fixtureViews(m, await listFixtureRows(m, accessOf(req).workspace.id)) });
  });
  router.post('/', editors, async (req, res) => {
    const input = parseBody(createFixtureRequestSchema, req);
    res.status(201).json({ fixture: await createFixture(m, accessOf(req).workspace.id, input, requireCaller(req).user.id) });
  });
  router.get('/export', readers, async (req, res) => {
    const rows = await listFixtureRows(m, accessOf(req).workspace.id);
    const csv = fixturesToCsv(rows.map((r) => fixtureFieldsSchema.parse(unflatten(r))));
    res.type('text/csv; charset=utf-8').attachment('fixtures.csv').send(csv);
  });
  router.post('/import', editors, express.text({ type: ['text/csv', 'text/plain'], limit: FIXTURE_CSV_LIMIT }), async (req, res) => {
    if (typeof req.body !== 'string') throw new AppError('unsupported_media_type', 'Send the fixture list as CSV (Content-Type: text/csv).');
    res.json(await importFixtures(m, accessOf(req).workspace.id, req.body, requireCaller(req).user.id));
  });
  router.get('/:fid', readers, async (req, res) => {
    const row = await findFixtureRow(m, accessOf(req).workspace.id, idParam(req, 'fid'));
    if (!row) throw new AppError('not_found', 'There is no such fixture in this workspace.');
    const [fixture] = await fixtureViews(m, [row]);
    res.json({ fixture });
  });
  router.patch('/:fid', editors, async (req, res) => {
    const patch = parseBody(updateFixtureRequestSchema, req);
    res.json({ fixture: await updateFixture(m, accessOf(req).workspace.id, idParam(req, 'fid'), patch, requireCaller(req).user.id) });
  });
  // Deleting is the owners' (issue: "owners manage members, invitations and deletion").
  router.delete('/:fid', workspaceRole(sequelize, 'owner'), async (req, res) => {
    const row = await findFixtureRow(m, accessOf(req).workspace.id, idParam(req, 'fid'));
    if (!row) throw new AppError('not_found', 'There is no such fixture in this workspace.');
    await deleteFixtureRow(m, row.id);
    res.status(204).end();
  });
  return router;
}
