import { Router } from 'express';
import type { Request, Response } from 'express';
import { forkSnapshotRequestSchema } from '../../src/contracts/api/snapshots';
import type { PublicSnapshot } from '../../src/contracts/api/snapshots';
import { clientIp, requireCaller } from '../http/context';
import { idParam, parseBody } from '../http/validate';
import { forkSnapshot } from '../services/snapshots/fork-snapshot';
import { snapshotReader } from '../services/snapshots/read-snapshot';
import { ledgerCsv, totalsCsv } from '../services/snapshots/results-csv';
import { snapshotReportPdf } from '../services/snapshots/snapshot-report';
import { publicOrigin } from './api-deps';
import type { ApiDeps } from './api-deps';

/** A file name made of the title's letters and digits. */
function fileStem(title: string): string {
  return title.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '').slice(0, 60) || 'snapshot';
}

function attachment(res: Response, type: string, name: string): Response {
  return res.type(type).set('Content-Disposition', `attachment; filename="${name}"`).set('Cache-Control', 'private, no-cache');
}

/**
 * /api/snapshots/:id/…: anyone holding the link downloads a live snapshot's files without signing
 * in; an unknown id is 404, a revoked or expired one 410. Forking needs a session. The snapshot's
 * data itself (GET /api/snapshots/:id) is answered earlier, by snapshotDataRoute.
 */
export function publicSnapshotsRouter({ m, config }: ApiDeps): Router {
  const router = Router();
  const reader = snapshotReader(m);
  const open = async (req: Request): Promise<PublicSnapshot> => JSON.parse((await reader.open(idParam(req, 'id'))).snapshotBytes.toString('utf8')) as PublicSnapshot;

  router.get('/:id/scenario.json', async (req, res) => {
    const s = await open(req);
    attachment(res, 'application/json', `${fileStem(s.title)}.scenario.json`).send(`${JSON.stringify(s.scenario, null, 2)}\n`);
  });
  router.get('/:id/totals.csv', async (req, res) => {
    const s = await open(req);
    attachment(res, 'text/csv; charset=utf-8', `${fileStem(s.title)}-totals.csv`).send(totalsCsv(s.scenario, s.result));
  });
  router.get('/:id/ledger.csv', async (req, res) => {
    const s = await open(req);
    attachment(res, 'text/csv; charset=utf-8', `${fileStem(s.title)}-ledger.csv`).send(ledgerCsv(s.scenario, s.result));
  });
  router.get('/:id/report.pdf', async (req, res) => {
    const s = await open(req);
    const pdf = await snapshotReportPdf(s, `${publicOrigin(req, config)}/s/${s.id}`);
    attachment(res, 'application/pdf', `${fileStem(s.title)}-report.pdf`).send(Buffer.from(pdf));
  });
  router.post('/:id/fork', async (req, res) => {
    const caller = requireCaller(req);
    const input = parseBody(forkSnapshotRequestSchema, req);
    const snapshot = await open(req);
    const scenario = await forkSnapshot(m, { snapshot, workspaceId: input.workspaceId, title: input.title, userId: caller.user.id, ip: clientIp(req) });
    res.status(201).json({ scenario });
  });
  return router;
}
