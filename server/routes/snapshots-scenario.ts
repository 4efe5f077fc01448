import { Router } from 'express';
import type { Request } from 'express';
import { createSnapshotRequestSchema } from '../../src/contracts/api/snapshots';
import { workspaceRole } from '../http/access';
import { AppError } from '../http/app-error';
import { accessOf, clientIp, requireCaller } from '../http/context';
import { idParam, parseBody } from '../http/validate';
import { findScenarioRow } from '../repos/scenarios';
import { findFork, listSnapshotRows } from '../repos/snapshots';
import { createSnapshot } from '../services/snapshots/create-snapshot';
import { snapshotSummary } from '../services/snapshots/snapshot-views';
import type { ApiDeps } from './api-deps';

/** /api/workspaces/:wid/scenarios/:sid/snapshots (editors and owners): publish the stored revision, list its snapshots. */
export function scenarioSnapshotsRouter({ m, sequelize }: ApiDeps): Router {
  const router = Router({ mergeParams: true });
  const editors = workspaceRole(sequelize, 'editor');
  const wid = (req: Request) => accessOf(req).workspace.id;

  router.get('/', editors, async (req, res) => {
    const scenario = await findScenarioRow(m, wid(req), idParam(req, 'sid'));
    if (!scenario) throw new AppError('not_found', 'There is no such scenario in this workspace.');
    const rows = await listSnapshotRows(m, wid(req), scenario.id);
    const fork = await findFork(m, scenario.id);
    res.json({
      snapshots: rows.map((r) => snapshotSummary(r.snapshot, r.link)),
      forkedFrom: fork ? { snapshotId: fork.snapshotId, forkedAt: fork.createdAt.toISOString() } : null,
    });
  });
  router.post('/', editors, async (req, res) => {
    const input = parseBody(createSnapshotRequestSchema, req, { optional: true });
    const snapshot = await createSnapshot(m, {
      workspaceId: wid(req),
      scenarioId: idParam(req, 'sid'),
      notes: input.notes,
      expiresAt: input.expiresAt ? new Date(input.expiresAt) : null,
      author: requireCaller(req).user,
      ip: clientIp(req),
    });
    res.status(201).json({ snapshot });
  });
  return router;
}
